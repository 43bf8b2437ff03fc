import { Link } from 'react-router-dom';
import { editionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import type { EntryEdition } from '../api/entry-view';

/** The frozen editions that hold one of this entry's revisions, each linking to its edition page. */
export function EntryEditions({ editions, shownNumber }: { editions: EntryEdition[] | undefined; shownNumber: number }) {
  if (editions === undefined) return <p className="text-sm text-ink-soft">This server does not list the editions of an entry.</p>;
  if (editions.length === 0) return <p className="text-sm text-ink-soft">No frozen edition holds this entry yet.</p>;
  return (
    <ul aria-label="Editions that contain this entry" className="grid gap-1 text-sm leading-6">
      {editions.map((edition) => (
        <li key={edition.label} className="flex flex-wrap items-baseline gap-x-3">
          <Link className="font-bold tabular-nums text-ink underline" to={editionHref(edition.label)}>
            {edition.label}
          </Link>
          <span className={edition.revision === shownNumber ? 'font-bold text-copper' : 'text-ink'}>r{edition.revision}</span>
          <span className="tabular-nums text-ink-soft">
            frozen <time dateTime={edition.createdAt}>{formatDateTime(edition.createdAt)}</time>
          </span>
        </li>
      ))}
    </ul>
  );
}
