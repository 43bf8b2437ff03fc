import type { ReactNode } from 'react';
import { columnClasses, identifyMethods, type ColumnClass, type IdentifyMethod } from '../api/identify-schemas';
import type { SearchOptions } from '../utils/search-options';
import { fieldClass } from './table-styles';

/** One line on what each similarity method rewards (SCIENCE.md §3). */
export const methodExplanations: Record<IdentifyMethod, string> = {
  composite:
    'Weighted dot product combined with the intensity ratios of neighbouring matched peaks (Stein & Scott 1994). The default.',
  cosine: 'Plain cosine of the two intensity lists: every peak counts alike, heavy ions get no extra weight.',
  weighted: 'Dot product with each peak weighted by (m/z)³ · intensity^0.6, so the informative heavy ions count more (Stein & Scott 1994).',
  entropy: 'Spectral entropy similarity (Li et al. 2021): forgiving of noise peaks; published on tandem spectra, so judge it on EI with care.',
};

const methodNames: Record<IdentifyMethod, string> = {
  composite: 'Composite',
  cosine: 'Cosine',
  weighted: 'Weighted dot product',
  entropy: 'Spectral entropy',
};

type SearchOptionsFieldsProps = {
  value: SearchOptions;
  onChange: (value: SearchOptions) => void;
  /** Labels of the frozen editions; the current published library is always offered first. */
  editions: readonly string[];
  /** Leave out the retention-index window and the mass range (batch runs search many unknowns alike). */
  compact?: boolean;
  disabled?: boolean;
};

function Labelled({ label, children, hint }: { label: string; children: ReactNode; hint?: string }) {
  return (
    <label className="grid gap-1 text-sm">
      <span className="font-bold text-ink">{label}</span>
      {children}
      {hint ? <span className="text-xs text-ink-soft">{hint}</span> : null}
    </label>
  );
}

/** The options of a search: method (with what it rewards), reverse search, limit, edition, RI window, mass range. */
export function SearchOptionsFields({ value, onChange, editions, compact = false, disabled = false }: SearchOptionsFieldsProps) {
  const set = <K extends keyof SearchOptions>(key: K, next: SearchOptions[K]) => onChange({ ...value, [key]: next });
  return (
    <fieldset className="grid gap-4 rounded-lg border border-rule-faint bg-paper-raised p-4" disabled={disabled}>
      <legend className="px-1 text-sm font-bold uppercase tracking-wider text-ink-soft">Options</legend>
      <div role="radiogroup" aria-label="Similarity method" className="grid gap-1.5">
        <span className="text-sm font-bold text-ink">Similarity method</span>
        {identifyMethods.map((method) => (
          <label key={method} className="flex items-start gap-2 text-sm">
            <input
              type="radio"
              name="identify-method"
              className="mt-1.5"
              checked={value.method === method}
              onChange={() => set('method', method)}
            />
            <span>
              <span className="font-bold">{methodNames[method]}</span>
              <span className="text-ink-soft"> — {methodExplanations[method]}</span>
            </span>
          </label>
        ))}
      </div>
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" className="mt-1.5" checked={value.reverse} onChange={(e) => set('reverse', e.target.checked)} />
        <span>
          <span className="font-bold">Reverse search</span>
          <span className="text-ink-soft">
            {' '}
            — rank by the query peaks found in each candidate only (forgives co-eluting peaks; flatters candidates with few peaks).
          </span>
        </span>
      </label>
      <div className="flex flex-wrap gap-4">
        <Labelled label="Candidates">
          <input type="number" min={1} max={100} className={`${fieldClass} w-24`} value={value.limit} onChange={(e) => set('limit', e.target.value)} />
        </Labelled>
        <Labelled label="Edition">
          <select className={fieldClass} value={value.edition} onChange={(e) => set('edition', e.target.value)}>
            <option value="">Current published library</option>
            {editions.map((label) => (
              <option key={label} value={label}>
                Edition {label}
              </option>
            ))}
          </select>
        </Labelled>
      </div>
      {compact ? null : (
        <>
          <div className="flex flex-wrap items-start gap-4">
            <Labelled label="Retention index" hint="Leave empty to search without an RI window.">
              <input inputMode="decimal" className={`${fieldClass} w-28`} value={value.riValue} onChange={(e) => set('riValue', e.target.value)} />
            </Labelled>
            <Labelled label="Column class">
              <select className={fieldClass} value={value.riColumn} onChange={(e) => set('riColumn', e.target.value as ColumnClass)}>
                {columnClasses.map((column) => (
                  <option key={column} value={column}>
                    {column}
                  </option>
                ))}
              </select>
            </Labelled>
            <Labelled label="RI tolerance (±)" hint="Index units; 15–22 suit non-polar columns.">
              <input inputMode="decimal" className={`${fieldClass} w-24`} value={value.riTolerance} onChange={(e) => set('riTolerance', e.target.value)} />
            </Labelled>
          </div>
          <div className="flex flex-wrap gap-4">
            <Labelled label="Lowest nominal mass (Da)">
              <input inputMode="numeric" className={`${fieldClass} w-28`} value={value.minMassDa} onChange={(e) => set('minMassDa', e.target.value)} />
            </Labelled>
            <Labelled label="Highest nominal mass (Da)">
              <input inputMode="numeric" className={`${fieldClass} w-28`} value={value.maxMassDa} onChange={(e) => set('maxMassDa', e.target.value)} />
            </Labelled>
          </div>
        </>
      )}
    </fieldset>
  );
}
