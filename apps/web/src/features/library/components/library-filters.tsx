import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { emptyFilter, isFiltered, type LibraryFilter } from '../utils/library-filter';

const inputClasses = 'w-full rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink';

function Field({ label, hint, children }: { label: string; hint?: string; children: (id: string) => ReactNode }) {
  const id = useId();
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-bold text-ink-soft">
        {label}
        {hint ? <span className="font-normal"> · {hint}</span> : null}
      </label>
      {children(id)}
    </div>
  );
}

/**
 * The server-side filters of the library. They apply on Enter or "Filter" and then live in the
 * address, so a filtered view can be shared; the sort stays as it was.
 */
export function LibraryFilters({ filter, onApply }: { filter: LibraryFilter; onApply: (filter: LibraryFilter) => void }) {
  const [draft, setDraft] = useState(filter);
  const set = <K extends keyof LibraryFilter>(key: K, value: LibraryFilter[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const text = (key: 'q' | 'formula' | 'minMass' | 'maxMass' | 'elements' | 'contributor' | 'edition', placeholder: string, inputMode?: 'numeric') => (id: string) => (
    <input
      id={id}
      value={draft[key]}
      placeholder={placeholder}
      inputMode={inputMode}
      onChange={(event) => set(key, event.target.value)}
      className={inputClasses}
    />
  );
  const choice =
    <K extends 'hasRetentionIndex' | 'status'>(key: K, options: [LibraryFilter[K], string][]) =>
    (id: string) => (
      <select id={id} value={draft[key]} onChange={(event) => set(key, event.target.value as LibraryFilter[K])} className={inputClasses}>
        {options.map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </select>
    );
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onApply(draft);
  };
  return (
    <form
      role="search"
      aria-label="Filter the library"
      onSubmit={submit}
      className="grid grid-cols-2 gap-3 rounded-lg border border-rule-faint bg-paper-raised p-3 md:grid-cols-4 xl:grid-cols-8"
    >
      <div className="col-span-2">
        <Field label="Name or synonym" hint="typos allowed">
          {text('q', 'e.g. linalool')}
        </Field>
      </div>
      <Field label="Formula" hint="or ranges">
        {text('formula', 'C10H18O or C6-8 Cl1-3')}
      </Field>
      <Field label="Contains elements">{text('elements', 'Cl, Br')}</Field>
      <div className="grid grid-cols-2 gap-2">
        <Field label="Mass from">{text('minMass', 'Da', 'numeric')}</Field>
        <Field label="to">{text('maxMass', 'Da', 'numeric')}</Field>
      </div>
      <Field label="Retention index">
        {choice('hasRetentionIndex', [
          ['', 'either'],
          ['true', 'has one'],
          ['false', 'has none'],
        ])}
      </Field>
      <Field label="State">
        {choice('status', [
          ['published', 'published'],
          ['withdrawn', 'withdrawn'],
          ['any', 'published or withdrawn'],
        ])}
      </Field>
      <Field label="Contributor" hint="login">
        {text('contributor', 'e.g. dokafor')}
      </Field>
      <Field label="Edition">{text('edition', 'e.g. 2026.12')}</Field>
      <div className="col-span-2 flex items-end gap-2 md:col-span-4 xl:col-span-6">
        <Button type="submit" variant="secondary">
          Filter
        </Button>
        {isFiltered(filter) ? (
          <Button
            variant="quiet"
            onClick={() => {
              const cleared = { ...emptyFilter, sort: filter.sort, order: filter.order };
              setDraft(cleared);
              onApply(cleared);
            }}
          >
            Clear filters
          </Button>
        ) : null}
      </div>
    </form>
  );
}
