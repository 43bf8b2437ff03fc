import { Link } from 'react-router-dom';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { editionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import { editionAuthorName } from '../api/edition-schema';
import { useEditions } from '../api/get-editions';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

/** Every frozen edition, newest first. */
export function EditionsTable() {
  const editions = useEditions();
  if (editions.isPending) return <LoadingState label="Loading editions…" />;
  if (editions.isError) {
    return <ErrorNotice title="The editions could not be loaded" error={editions.error} onRetry={() => void editions.refetch()} />;
  }
  if (editions.data.length === 0) {
    return <EmptyState title="No edition has been frozen yet">A curator freezes the published revisions as an edition.</EmptyState>;
  }
  return (
    <div className={tableFrame}>
      <table className={tableBase}>
        <caption className="sr-only">Editions</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>Edition</th>
            <th scope="col" className={headCell}>Notes</th>
            <th scope="col" className={`${headCell} text-right`}>Revisions</th>
            <th scope="col" className={headCell}>Frozen</th>
            <th scope="col" className={headCell}>By</th>
          </tr>
        </thead>
        <tbody>
          {editions.data.map((edition) => (
            <tr key={edition.label} className={`${rowBase} hover:bg-paper-sunk/60`}>
              <th scope="row" className={`${bodyCell} text-left font-bold`}>
                <Link to={editionHref(edition.label)} className="text-ink underline decoration-rule underline-offset-4 hover:decoration-ink">
                  {edition.label}
                </Link>
              </th>
              <td className={`${bodyCell} max-w-md whitespace-pre-wrap break-words text-ink`}>{edition.notes || '—'}</td>
              <td className={`${bodyCell} text-right tabular-nums`}>{edition.revisionCount}</td>
              <td className={`${bodyCell} whitespace-nowrap tabular-nums text-ink-soft`}>
                <time dateTime={edition.createdAt}>{formatDateTime(edition.createdAt)}</time>
              </td>
              <td className={bodyCell}>{editionAuthorName(edition.createdBy)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
