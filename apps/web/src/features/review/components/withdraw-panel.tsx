import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../lib/describe-error';
import { useWithdrawEntry } from '../api/withdraw-entry';
import { textareaClasses } from './table-styles';

const minReasonLength = 3;

/** Retires a published entry, with the reason it is kept under; nothing published is deleted. */
export function WithdrawPanel({ accession, onWithdrawn }: { accession: string; onWithdrawn: () => void }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const withdraw = useWithdrawEntry(accession);
  const reasonId = useId();
  if (!open) {
    return (
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Withdraw {accession}…
      </Button>
    );
  }
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (reason.trim().length < minReasonLength) {
      setMissing(true);
      return;
    }
    withdraw.mutate(reason.trim(), { onSuccess: onWithdrawn });
  };
  return (
    <form onSubmit={submit} className="space-y-2">
      <label htmlFor={reasonId} className="block text-sm font-bold text-ink">
        Why is {accession} withdrawn?
      </label>
      <textarea
        id={reasonId}
        rows={3}
        value={reason}
        aria-invalid={missing}
        onChange={(event) => {
          setReason(event.target.value);
          setMissing(false);
        }}
        className={textareaClasses}
      />
      {missing ? (
        <p role="alert" className="text-sm font-bold text-copper">
          Give a reason (at least {minReasonLength} characters).
        </p>
      ) : null}
      {withdraw.isError ? (
        <p role="alert" className="text-sm text-copper">
          Not withdrawn: {describeError(withdraw.error)}
        </p>
      ) : null}
      <p className="text-xs leading-relaxed text-ink-soft">
        Nothing is deleted: every revision of it stays retrievable.
      </p>
      <div className="flex gap-2">
        <Button type="submit" disabled={withdraw.isPending}>
          {withdraw.isPending ? 'Withdrawing…' : `Withdraw ${accession}`}
        </Button>
        <Button variant="quiet" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
