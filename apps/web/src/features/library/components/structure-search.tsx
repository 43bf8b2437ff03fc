import { useId, useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { Button } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/loading-state';
import { entryHref } from '../../../config/paths';
import { useStructureSearch, type StructureMode } from '../api/search-structures';

const inputClasses = 'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink';

type StructureSearchProps = {
  smiles: string;
  mode: StructureMode;
  onSearch: (smiles: string, mode: StructureMode) => void;
};

/** A SMILES box: entries whose structure contains the fragment, or is the same molecule. */
export function StructureSearch({ smiles, mode, onSearch }: StructureSearchProps) {
  const [text, setText] = useState(smiles);
  const [how, setHow] = useState<StructureMode>(mode);
  const inputId = useId();
  const modeId = useId();
  const search = useStructureSearch(smiles, mode);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(text.trim(), how);
  };
  return (
    <section aria-label="Structure search" className="rounded-lg border border-rule-faint bg-paper-raised p-3">
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <div className="flex min-w-64 flex-1 flex-col gap-1">
          <label htmlFor={inputId} className="text-xs font-bold text-ink-soft">
            Structure (SMILES)
          </label>
          <input id={inputId} value={text} placeholder="e.g. c1ccccc1 for a benzene ring" onChange={(e) => setText(e.target.value)} className={`${inputClasses} font-mono`} />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={modeId} className="text-xs font-bold text-ink-soft">
            Match
          </label>
          <select id={modeId} value={how} onChange={(e) => setHow(e.target.value as StructureMode)} className={inputClasses}>
            <option value="substructure">contains this fragment</option>
            <option value="exact">is this molecule</option>
          </select>
        </div>
        <Button type="submit" variant="secondary" disabled={text.trim() === ''}>
          Search structures
        </Button>
        {smiles ? (
          <Button
            variant="quiet"
            onClick={() => {
              setText('');
              onSearch('', how);
            }}
          >
            Clear
          </Button>
        ) : null}
      </form>
      {smiles === '' ? null : search.isPending ? (
        <LoadingState label="Searching the structures…" />
      ) : search.isError ? (
        <div className="mt-3">
          <ErrorNotice title="The structure search failed" error={search.error} />
        </div>
      ) : (
        <div className="mt-3" aria-live="polite">
          <p className="text-sm text-ink-soft">
            {search.data.entries.length === 0
              ? `No published entry ${mode === 'exact' ? 'is' : 'contains'} ${smiles}.`
              : `${search.data.entries.length}${search.data.truncated ? '+' : ''} published ${search.data.entries.length === 1 ? 'entry' : 'entries'} ${mode === 'exact' ? 'with this structure' : `containing ${smiles}`} (${search.data.tookMs} ms).`}
          </p>
          {search.data.entries.length ? (
            <ul aria-label="Structure matches" className="mt-2 grid max-h-56 grid-cols-1 gap-x-6 overflow-y-auto text-sm md:grid-cols-2 xl:grid-cols-3">
              {search.data.entries.map((hit) => (
                <li key={hit.accession} className="flex min-w-0 gap-2 py-0.5">
                  <Link to={entryHref(hit.accession)} className="font-bold text-ink hover:underline">
                    {hit.accession}
                  </Link>
                  <span className="truncate">{hit.name}</span>
                  <span className="shrink-0 text-ink-soft">{hit.formula}</span>
                  {hit.simulated ? <span className="shrink-0 text-xs text-copper">simulated</span> : null}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      )}
    </section>
  );
}
