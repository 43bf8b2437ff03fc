import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { entryRevisionHref, submitRevisionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import { useMyRevisions } from '../api/get-my-revisions';
import { isEditable } from '../api/revision-draft';

const headerCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';

/** The signed-in contributor's open revisions (draft, in review, needs changes), with a way back in. */
export function MyRevisions() {
  const mine = useMyRevisions();
  if (mine.isPending) return <LoadingState label="Loading your revisions…" />;
  if (mine.isError) return <ErrorNotice title="Your revisions could not be loaded" error={mine.error} onRetry={() => void mine.refetch()} />;
  if (mine.data.length === 0) {
    return <EmptyState title="No open revisions">Drafts you save and revisions you send for review are listed here.</EmptyState>;
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
      <table className="w-full border-collapse text-sm leading-7">
        <caption className="sr-only">My open revisions</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headerCell}>Revision</th>
            <th scope="col" className={headerCell}>Name</th>
            <th scope="col" className={headerCell}>Formula</th>
            <th scope="col" className={headerCell}>State</th>
            <th scope="col" className={headerCell}>Updated</th>
            <th scope="col" className={headerCell}>
              <span className="sr-only">Action</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {mine.data.map((item) => (
            <tr key={item.revisionId} className="border-b border-rule-faint last:border-b-0">
              <th scope="row" className="px-3 py-1.5 text-left font-bold tabular-nums">
                {item.label}
              </th>
              <td className="px-3 py-1.5">{item.name}</td>
              <td className="px-3 py-1.5 font-mono">{item.formula}</td>
              <td className="px-3 py-1.5">
                <RevisionStateBadge state={item.state} />
              </td>
              <td className="px-3 py-1.5 tabular-nums text-ink-soft">
                <time dateTime={item.updatedAt}>{formatDateTime(item.updatedAt)}</time>
              </td>
              <td className="px-3 py-1.5 text-right">
                {isEditable(item.state) ? (
                  <Link className="font-bold text-ink underline" to={submitRevisionHref(item.revisionId)}>
                    {item.state === 'needs_changes' ? 'Answer and fix' : 'Continue editing'}
                  </Link>
                ) : (
                  <Link className="text-ink-soft underline" to={entryRevisionHref(item.accession, item.number)}>
                    View
                  </Link>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
