import { ErrorNotice } from '../../../components/errors/error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { formatDateTime } from '../../../lib/format-date-time';
import { useOutbox } from '../api/get-outbox';

const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const bodyCell = 'px-3 py-1.5 align-top';

function When({ iso }: { iso: string | null }) {
  return iso ? <time dateTime={iso}>{formatDateTime(iso)}</time> : <>—</>;
}

/** Every e-mail Ionfolio queued, with its delivery attempts and the last error. */
export function OutboxTable() {
  const outbox = useOutbox();
  if (outbox.isPending) return <LoadingState label="Loading the outbox…" />;
  if (outbox.isError) {
    return <ErrorNotice title="The outbox could not be loaded" error={outbox.error} onRetry={() => void outbox.refetch()} />;
  }
  if (outbox.data.length === 0) {
    return <EmptyState title="No e-mail yet">Mails appear here when revisions are sent, decided or commented on.</EmptyState>;
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
      <table className="w-full border-collapse text-sm leading-7">
        <caption className="sr-only">Outbox</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>Created</th>
            <th scope="col" className={headCell}>To</th>
            <th scope="col" className={headCell}>Subject</th>
            <th scope="col" className={headCell}>Status</th>
            <th scope="col" className={`${headCell} text-right`}>Attempts</th>
            <th scope="col" className={headCell}>Last error</th>
            <th scope="col" className={headCell}>Sent</th>
          </tr>
        </thead>
        <tbody>
          {outbox.data.map((message) => (
            <tr key={message.id} data-status={message.status} className="border-b border-rule-faint last:border-b-0">
              <td className={`${bodyCell} whitespace-nowrap tabular-nums text-ink-soft`}>
                <When iso={message.createdAt} />
              </td>
              <td className={`${bodyCell} break-all`}>{message.toAddress}</td>
              <td className={`${bodyCell} break-words`}>{message.subject}</td>
              <td className={`${bodyCell} ${message.status === 'failed' ? 'font-bold text-copper' : 'text-ink'}`}>{message.status}</td>
              <td className={`${bodyCell} text-right tabular-nums`}>{message.attempts}</td>
              <td className={`${bodyCell} max-w-xs break-words text-ink-soft`}>{message.lastError ?? '—'}</td>
              <td className={`${bodyCell} whitespace-nowrap tabular-nums text-ink-soft`}>
                <When iso={message.sentAt} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
