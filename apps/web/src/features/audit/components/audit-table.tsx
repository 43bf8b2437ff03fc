import { ErrorNotice } from '../../../components/errors/error-notice';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { describeError } from '../../../lib/describe-error';
import { formatDateTime } from '../../../lib/format-date-time';
import { useAuditEvents, type AuditFilter } from '../api/get-audit-events';
import { formatAuditData } from '../utils/format-audit-data';

const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const bodyCell = 'px-3 py-1.5 align-top';

/** The audit events matching the filter, newest first, with "Load more" for older pages. */
export function AuditTable({ filter }: { filter: AuditFilter }) {
  const audit = useAuditEvents(filter);
  if (audit.isPending) return <LoadingState label="Loading the audit log…" />;
  // A failed "Load more" keeps the pages already shown; only a failed first page replaces the table.
  const data = audit.data;
  if (audit.isError && (!audit.isFetchNextPageError || data === undefined)) {
    return <ErrorNotice title="The audit log could not be loaded" error={audit.error} onRetry={() => void audit.refetch()} />;
  }
  if (data === undefined) return null;
  const events = data.pages.flatMap((page) => page.events);
  if (events.length === 0) {
    return (
      <EmptyState title={filter.action || filter.subject ? 'No event matches these filters' : 'Nothing has been recorded yet'}>
        Every state change, role change, access-key change and export is recorded here.
      </EmptyState>
    );
  }
  return (
    <div className="space-y-3">
      <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
        <table className="w-full border-collapse text-sm leading-7">
          <caption className="sr-only">Audit events</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className={headCell}>When</th>
              <th scope="col" className={headCell}>Who</th>
              <th scope="col" className={headCell}>Action</th>
              <th scope="col" className={headCell}>Subject</th>
              <th scope="col" className={headCell}>Details</th>
            </tr>
          </thead>
          <tbody>
            {events.map((event) => (
              <tr key={event.id} className="border-b border-rule-faint last:border-b-0">
                <td className={`${bodyCell} whitespace-nowrap tabular-nums text-ink-soft`}>
                  <time dateTime={event.occurredAt}>{formatDateTime(event.occurredAt)}</time>
                </td>
                <td className={bodyCell}>
                  {event.actor ? (
                    <span title={event.actor.login}>{event.actor.displayName}</span>
                  ) : (
                    <span className="text-ink-soft">system</span>
                  )}
                </td>
                <td className={`${bodyCell} whitespace-nowrap font-mono text-[0.8125rem]`}>{event.action}</td>
                <td className={`${bodyCell} whitespace-nowrap`}>
                  <span className="text-ink-soft">{event.subjectType}</span> {event.subjectId ?? ''}
                </td>
                <td className={`${bodyCell} max-w-md break-words font-mono text-xs leading-6 text-ink-soft`}>
                  {formatAuditData(event.data) || '—'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {audit.isFetchNextPageError ? (
        <p role="alert" className="text-sm text-copper">
          Older events could not be loaded: {describeError(audit.error)}
        </p>
      ) : null}
      {audit.hasNextPage ? (
        <Button variant="secondary" onClick={() => void audit.fetchNextPage()} disabled={audit.isFetchingNextPage}>
          {audit.isFetchingNextPage ? 'Loading…' : 'Load more'}
        </Button>
      ) : (
        <p className="text-xs text-ink-soft">{events.length} events — the beginning of the log.</p>
      )}
    </div>
  );
}
