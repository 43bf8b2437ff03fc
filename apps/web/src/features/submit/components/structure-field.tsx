import { useDebouncedValue } from '../hooks/use-debounced-value';
import { useStructurePreview } from '../api/preview-structure';
import { describeError } from '../../../lib/describe-error';
import { describeFormula } from './formula-masses';
import { Field, inputClass } from './form-field';

type StructureFieldProps = {
  format: 'smiles' | 'molfile';
  structure: string;
  typedFormula: string;
  errors: readonly string[];
  onChange: (next: { format: 'smiles' | 'molfile'; structure: string }) => void;
};

/** An SVG string shown as an image, so nothing in it can run or reach the page (never innerHTML). */
function svgDataUrl(svg: string): string {
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}

/** SMILES typed or a molfile uploaded, its drawing, and whether its formula is the typed one. */
export function StructureField({ format, structure, typedFormula, errors, onChange }: StructureFieldProps) {
  const settled = useDebouncedValue(structure, 600);
  const preview = useStructurePreview(settled, format);
  const typed = describeFormula(typedFormula);
  const drawn = preview.data ? describeFormula(preview.data.formula) : null;

  return (
    <div className="md:col-span-2 grid gap-4 md:grid-cols-[1fr_16rem]">
      <div className="grid gap-3">
        <div role="radiogroup" aria-label="Structure given as" className="flex gap-4 text-sm">
          {(['smiles', 'molfile'] as const).map((value) => (
            <label key={value} className="inline-flex items-center gap-1.5">
              <input type="radio" name="structure-format" checked={format === value} onChange={() => onChange({ format: value, structure })} />
              {value === 'smiles' ? 'SMILES' : 'Molfile'}
            </label>
          ))}
        </div>
        <Field
          label={format === 'smiles' ? 'Structure (SMILES)' : 'Structure (molfile)'}
          hint="Optional. The drawing and its formula come from the server."
          errors={errors}
        >
          {(control) =>
            format === 'smiles' ? (
              <input
                {...control}
                className={`${inputClass} font-mono`}
                value={structure}
                placeholder="Clc1ccccc1"
                onChange={(e) => onChange({ format, structure: e.target.value })}
              />
            ) : (
              <textarea
                {...control}
                rows={6}
                className={`${inputClass} font-mono text-xs`}
                value={structure}
                onChange={(e) => onChange({ format, structure: e.target.value })}
              />
            )
          }
        </Field>
        {format === 'molfile' ? (
          <label className="text-sm text-ink-soft">
            Upload a molfile{' '}
            <input
              type="file"
              accept=".mol,.sdf,.mdl"
              aria-label="Upload a molfile"
              onChange={async (e) => {
                const file = e.target.files?.[0];
                if (file) onChange({ format: 'molfile', structure: await file.text() });
              }}
            />
          </label>
        ) : null}
      </div>
      <div aria-live="polite" className="flex min-h-40 flex-col items-center justify-center rounded-md border border-rule-faint bg-paper-raised p-2 text-sm">
        {settled.trim() === '' ? (
          <span className="text-ink-soft">No structure yet.</span>
        ) : preview.isPending ? (
          <span className="text-ink-soft">Drawing…</span>
        ) : preview.isError ? (
          <span role="alert" className="text-copper">
            {describeError(preview.error)}
          </span>
        ) : (
          <>
            <img src={svgDataUrl(preview.data.svg)} alt={`Structure drawing, ${preview.data.formula}`} className="max-h-48 w-full object-contain" />
            <span className="mt-1 tabular-nums">
              {drawn && typed ? (
                drawn.formula === typed.formula ? (
                  <span data-testid="structure-match">Structure formula {drawn.formula} matches the typed formula.</span>
                ) : (
                  <span data-testid="structure-match" className="font-bold text-copper">
                    Structure formula {drawn.formula} differs from the typed {typed.formula}.
                  </span>
                )
              ) : (
                <span>Structure formula {preview.data.formula}</span>
              )}
            </span>
          </>
        )}
      </div>
    </div>
  );
}
