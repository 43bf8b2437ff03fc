import { Link } from 'react-router-dom';
import { reviewRevisionHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import type { QueueItem } from '../api/get-review-queue';
import { CheckStatusMark } from './check-status-mark';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

/** The open revisions of one state: each row opens the revision beside its published one. */
export function QueueTable({ items, caption }: { items: QueueItem[]; caption: string }) {
  return (
    <div className={tableFrame}>
      <table className={tableBase}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>Revision</th>
            <th scope="col" className={headCell}>Name</th>
            <th scope="col" className={headCell}>Formula</th>
            <th scope="col" className={headCell}>Checks</th>
            <th scope="col" className={headCell}>Author</th>
            <th scope="col" className={headCell}>Submitted</th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={item.revisionId} className={`${rowBase} hover:bg-paper-sunk/60`}>
              <th scope="row" className={`${bodyCell} whitespace-nowrap text-left font-bold`}>
                <Link to={reviewRevisionHref(item.revisionId)} className="text-ink underline decoration-rule underline-offset-4 hover:decoration-ink">
                  {item.label}
                </Link>
                {item.hasPublished ? null : <span className="ml-2 text-xs font-normal text-ink-soft">new entry</span>}
              </th>
              <td className={bodyCell}>
                {item.name}
                {item.simulated ? <span className="ml-2 text-xs text-ink-soft">simulated — demo only</span> : null}
              </td>
              <td className={`${bodyCell} font-mono text-[0.8125rem]`}>{item.formula}</td>
              <td className={bodyCell}>
                <CheckStatusMark status={item.checksWorst} />
              </td>
              <td className={bodyCell}>{item.author ?? '—'}</td>
              <td className={`${bodyCell} whitespace-nowrap tabular-nums text-ink-soft`}>
                {item.submittedAt ? <time dateTime={item.submittedAt}>{formatDateTime(item.submittedAt)}</time> : 'not sent'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
