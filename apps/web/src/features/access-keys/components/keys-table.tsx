import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { formatDateTime } from '../../../lib/format-date-time';
import { useAccessKeys } from '../api/get-access-keys';
import { useRevokeAccessKey } from '../api/revoke-access-key';
import type { AccessKey } from '../api/access-key-schema';

const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const cell = 'px-3 py-1.5 align-top';

function When({ iso, otherwise }: { iso: string | null; otherwise: string }) {
  return iso ? <time dateTime={iso}>{formatDateTime(iso)}</time> : <span>{otherwise}</span>;
}

function RevokeCell({ accessKey }: { accessKey: AccessKey }) {
  const revoke = useRevokeAccessKey();
  const [asking, setAsking] = useState(false);
  if (accessKey.revokedAt) return <span className="text-ink-soft">revoked</span>;
  if (!asking) {
    return (
      <Button variant="secondary" onClick={() => setAsking(true)} aria-label={`Revoke ${accessKey.name}`}>
        Revoke
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`Confirm revoking ${accessKey.name}`} className="grid gap-1">
      <span className="text-sm text-copper">Tools using this key stop working at once.</span>
      <span className="flex gap-2">
        <Button disabled={revoke.isPending} onClick={() => revoke.mutate(accessKey.id)}>
          {revoke.isPending ? 'Revoking…' : 'Revoke now'}
        </Button>
        <Button variant="quiet" onClick={() => setAsking(false)}>
          Keep it
        </Button>
      </span>
      {revoke.isError ? <ErrorNotice title="The key could not be revoked" error={revoke.error} /> : null}
    </div>
  );
}

/** Access keys with scopes, creation, last use and revocation; with `all`, every key and its owner (admins). */
export function KeysTable({ all = false }: { all?: boolean }) {
  const keys = useAccessKeys({ all });
  if (keys.isPending) return <LoadingState label="Loading access keys…" />;
  if (keys.isError) return <ErrorNotice title="The access keys could not be loaded" error={keys.error} onRetry={() => void keys.refetch()} />;
  if (keys.data.length === 0) {
    return <EmptyState title="No access keys yet">{all ? 'Nobody has created one.' : 'Create one above for an instrument data system, a LIMS or a script.'}</EmptyState>;
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
      <table className="w-full border-collapse text-sm leading-7">
        <caption className="sr-only">Access keys</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headCell}>Name</th>
            {all ? <th scope="col" className={headCell}>Owner</th> : null}
            <th scope="col" className={headCell}>Key starts</th>
            <th scope="col" className={headCell}>Scopes</th>
            <th scope="col" className={headCell}>Created</th>
            <th scope="col" className={headCell}>Last used</th>
            <th scope="col" className={headCell}>Status</th>
          </tr>
        </thead>
        <tbody>
          {keys.data.map((key) => (
            <tr key={key.id} data-revoked={key.revokedAt !== null} className="border-b border-rule-faint last:border-b-0">
              <th scope="row" className={`${cell} text-left font-bold text-ink`}>{key.name}</th>
              {all ? <td className={cell}>{key.owner ? `${key.owner.displayName} (${key.owner.login})` : '—'}</td> : null}
              <td className={`${cell} font-mono`}>{key.prefix}…</td>
              <td className={cell}>{key.scopes.join(', ')}</td>
              <td className={`${cell} tabular-nums text-ink-soft`}><When iso={key.createdAt} otherwise="—" /></td>
              <td className={`${cell} tabular-nums text-ink-soft`}><When iso={key.lastUsedAt} otherwise="never" /></td>
              <td className={cell}>
                {key.revokedAt ? (
                  <span className="text-ink-soft">revoked <When iso={key.revokedAt} otherwise="" /></span>
                ) : (
                  <RevokeCell accessKey={key} />
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
