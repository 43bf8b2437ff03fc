import { Link } from 'react-router-dom';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { entryRevisionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import type { TimelineItem } from '../api/entry-view';

/** Every revision of the entry, newest first; each opens at `?revision=N`; the one shown is marked. */
export function RevisionTimeline({ accession, items, shownNumber }: { accession: string; items: TimelineItem[]; shownNumber: number }) {
  const newestFirst = [...items].sort((a, b) => b.number - a.number);
  return (
    <ol aria-label="Revision timeline" className="relative grid gap-0 border-l border-rule pl-5">
      {newestFirst.map((item) => {
        const shown = item.number === shownNumber;
        const when = item.publishedAt ?? item.submittedAt ?? item.createdAt;
        return (
          <li
            key={item.id}
            aria-current={shown ? 'true' : undefined}
            className={`relative py-2 ${shown ? 'rounded-r-md bg-copper-soft/70 pl-2' : ''}`}
          >
            <span
              aria-hidden="true"
              className={`absolute top-4 -left-[1.55rem] h-2.5 w-2.5 rounded-full border ${shown ? 'border-copper bg-copper' : 'border-rule bg-paper-raised'}`}
            />
            <p className="flex flex-wrap items-center gap-2">
              <Link className={`tabular-nums underline ${shown ? 'font-bold text-ink' : 'text-ink'}`} to={entryRevisionHref(accession, item.number)}>
                {item.label}
              </Link>
              <RevisionStateBadge state={item.state} />
              <span className="text-sm tabular-nums text-ink-soft">
                <time dateTime={when}>{formatDateTime(when)}</time> · {item.author?.displayName ?? 'unknown author'}
              </span>
              {shown ? <span className="text-sm font-bold text-copper">shown</span> : null}
            </p>
            <p className="text-sm leading-relaxed text-ink-soft">{item.changeNote || 'No change note.'}</p>
          </li>
        );
      })}
    </ol>
  );
}
