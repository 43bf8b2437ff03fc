import { useId, type ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { LoadingState } from '../../../components/ui/loading-state';
import type { EntryRevision, EntryView } from '../api/entry-view';
import { useEntryView } from '../api/get-entry';
import { RevisionDiffView } from './revision-diff-view';

const selectClass = 'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink';

/** The pair compared when the address names none: the revision before the one shown, against it. */
export function defaultPair(numbers: number[], shown: number): { from: number; to: number } | null {
  const sorted = [...new Set(numbers)].sort((a, b) => a - b);
  if (sorted.length < 2) return null;
  const earlier = sorted.filter((n) => n < shown).at(-1);
  if (earlier !== undefined) return { from: earlier, to: shown };
  const later = sorted.find((n) => n > shown);
  return later === undefined ? null : { from: shown, to: later };
}

function wholeNumber(text: string | null, allowed: number[]): number | undefined {
  const n = Number(text);
  return text !== null && allowed.includes(n) ? n : undefined;
}

/** One side of the comparison: the revision on the page as it is, any other one fetched with `?revision=N`. */
function useRevision(entry: EntryView, number: number) {
  const onPage = number === entry.revision.number;
  const query = useEntryView(entry.accession, number, { enabled: !onPage });
  if (onPage) return { revision: entry.revision, query: null };
  return { revision: query.data?.revision, query };
}

function Side({ side, number, children }: { side: ReturnType<typeof useRevision>; number: number; children: (r: EntryRevision) => ReactNode }) {
  if (side.revision) return <>{children(side.revision)}</>;
  if (side.query?.isError) return <ErrorNotice title={`r${number} could not be loaded`} error={side.query.error} onRetry={() => void side.query?.refetch()} />;
  return <LoadingState label={`Loading r${number}…`} />;
}

/**
 * Any two revisions of the entry compared: chosen with two selects (kept in `?compare=N&to=M`, so a
 * comparison can be shared), by default the revision before the one shown against the one shown.
 */
export function RevisionCompare({ entry }: { entry: EntryView }) {
  const [search, setSearch] = useSearchParams();
  const id = useId();
  const numbers = entry.revisions.map((r) => r.number).sort((a, b) => b - a);
  const fallback = defaultPair(numbers, entry.revision.number);
  const from = wholeNumber(search.get('compare'), numbers) ?? fallback?.from;
  const to = wholeNumber(search.get('to'), numbers) ?? fallback?.to;
  const left = useRevision(entry, from ?? entry.revision.number);
  const right = useRevision(entry, to ?? entry.revision.number);
  if (fallback === null || from === undefined || to === undefined) {
    return <p className="text-sm text-ink-soft">This entry has one revision so far: there is nothing to compare it with.</p>;
  }
  const choose = (key: 'compare' | 'to', value: string) => {
    const next = new URLSearchParams(search);
    next.set('compare', String(key === 'compare' ? value : from));
    next.set('to', String(key === 'to' ? value : to));
    setSearch(next, { replace: true, preventScrollReset: true });
  };
  const select = (key: 'compare' | 'to', value: number, label: string) => (
    <span className="inline-flex items-center gap-2">
      <label htmlFor={`${id}-${key}`} className="text-sm font-bold text-ink">
        {label}
      </label>
      <select id={`${id}-${key}`} className={selectClass} value={value} onChange={(e) => choose(key, e.target.value)}>
        {numbers.map((n) => (
          <option key={n} value={n}>
            r{n}
            {n === entry.revision.number ? ' (shown)' : ''}
          </option>
        ))}
      </select>
    </span>
  );
  return (
    <div className="grid gap-4">
      <div className="flex flex-wrap items-center gap-4">
        {select('compare', from, 'Compare')}
        {select('to', to, 'with')}
      </div>
      {from === to ? (
        <p className="text-sm text-ink-soft">Choose two different revisions to see what changed.</p>
      ) : (
        <Side side={left} number={from}>
          {(before) => (
            <Side side={right} number={to}>
              {(after) => <RevisionDiffView before={before} after={after} />}
            </Side>
          )}
        </Side>
      )}
    </div>
  );
}
