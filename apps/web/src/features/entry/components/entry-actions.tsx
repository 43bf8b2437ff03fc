import { useState } from 'react';
import { WithdrawBody } from '@ionfolio/contracts';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../lib/describe-error';
import { hasRole, type Role } from '../../../lib/roles';
import { useStartRevision, useWithdrawEntry } from '../api/entry-actions';
import type { EntryView } from '../api/entry-view';

type EntryActionsProps = {
  entry: EntryView;
  role: Role;
  /** Opens a new draft in the submit form. */
  onDraftCreated: (revisionId: string) => void;
};

/** What the signed-in person may do here: contributors start a revision; curators restore or withdraw. */
export function EntryActions({ entry, role, onDraftCreated }: EntryActionsProps) {
  const start = useStartRevision(entry.accession);
  const withdraw = useWithdrawEntry(entry.accession);
  const [withdrawing, setWithdrawing] = useState(false);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | null>(null);
  const shown = entry.revision;
  const withdrawn = Boolean(entry.withdrawnAt);
  if (!hasRole(role, 'contributor') || withdrawn) return null;
  const curator = hasRole(role, 'curator');

  return (
    <div className="grid justify-items-end gap-2">
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" disabled={start.isPending} onClick={() => start.mutate({}, { onSuccess: (r) => onDraftCreated(r.id) })}>
          Start a new revision
        </Button>
        {curator && shown.state === 'superseded' ? (
          <Button
            variant="secondary"
            disabled={start.isPending}
            onClick={() =>
              start.mutate(
                { fromRevision: shown.number, changeNote: `Restores the content of ${shown.label}.` },
                { onSuccess: (r) => onDraftCreated(r.id) },
              )
            }
          >
            Restore this revision's content
          </Button>
        ) : null}
        {curator ? (
          <Button variant="quiet" onClick={() => setWithdrawing(true)}>
            Withdraw entry
          </Button>
        ) : null}
      </div>
      {start.isError ? (
        <p role="alert" className="text-sm text-copper">
          {describeError(start.error)}
        </p>
      ) : null}
      {withdrawing ? (
        <div role="dialog" aria-modal="false" aria-label="Withdraw entry" className="w-full max-w-md rounded-lg border border-copper bg-paper-raised p-4 text-left">
          <p className="font-bold">Withdraw {entry.accession} from the library?</p>
          <p className="mt-1 text-sm text-ink-soft">Its revisions stay readable; searches no longer offer it. Readers see the reason.</p>
          <label htmlFor="withdraw-reason" className="mt-3 block text-sm font-bold">
            Reason
          </label>
          <textarea
            id="withdraw-reason"
            rows={3}
            className="w-full rounded-md border border-rule bg-paper-raised px-3 py-2"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
          />
          {reasonError || withdraw.isError ? (
            <p role="alert" className="mt-1 text-sm text-copper">
              {reasonError ?? describeError(withdraw.error)}
            </p>
          ) : null}
          <div className="mt-3 flex gap-2">
            <Button
              disabled={withdraw.isPending}
              onClick={() => {
                const parsed = WithdrawBody.safeParse({ reason });
                if (!parsed.success) {
                  setReasonError(parsed.error.issues[0]?.message ?? 'give a reason');
                  return;
                }
                setReasonError(null);
                withdraw.mutate(parsed.data.reason, { onSuccess: () => setWithdrawing(false) });
              }}
            >
              Withdraw
            </Button>
            <Button variant="quiet" onClick={() => setWithdrawing(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
