import { EditionBody } from '@ionfolio/contracts';
import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../lib/describe-error';
import { useFreezeEdition } from '../api/freeze-edition';

const fieldClasses = 'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink';

/** Freezes today's published revisions under a label; checked by the same schema as the API. */
export function FreezeEditionForm({ onFrozen }: { onFrozen: (label: string) => void }) {
  const [label, setLabel] = useState('');
  const [notes, setNotes] = useState('');
  const [labelError, setLabelError] = useState<string | null>(null);
  const freeze = useFreezeEdition();
  const labelId = useId();
  const notesId = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = EditionBody.safeParse({ label, notes });
    if (!parsed.success) {
      setLabelError(parsed.error.issues[0]?.message ?? 'not a valid label');
      return;
    }
    freeze.mutate(parsed.data, { onSuccess: ({ edition }) => onFrozen(edition.label) });
  };
  return (
    <form onSubmit={submit} aria-label="Freeze an edition" className="space-y-3 rounded-lg border border-rule-faint bg-paper-raised p-4">
      <h2 className="font-bold text-ink">Freeze an edition</h2>
      <p className="text-sm leading-relaxed text-ink-soft">
        Takes every published revision as it is now. An edition never changes afterwards.
      </p>
      <div className="flex flex-col gap-1">
        <label htmlFor={labelId} className="text-xs font-bold text-ink-soft">
          Label
        </label>
        <input
          id={labelId}
          value={label}
          placeholder="e.g. 2026.12"
          aria-invalid={labelError !== null}
          onChange={(event) => {
            setLabel(event.target.value);
            setLabelError(null);
          }}
          className={`${fieldClasses} w-40`}
        />
        {labelError ? <p className="text-sm font-bold text-copper">{labelError}</p> : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={notesId} className="text-xs font-bold text-ink-soft">
          Notes
        </label>
        <textarea id={notesId} rows={3} value={notes} onChange={(event) => setNotes(event.target.value)} className={fieldClasses} />
      </div>
      {freeze.isError ? (
        <p role="alert" className="text-sm text-copper">
          Not frozen: {describeError(freeze.error)}
        </p>
      ) : null}
      <Button type="submit" disabled={freeze.isPending}>
        {freeze.isPending ? 'Freezing…' : 'Freeze'}
      </Button>
    </form>
  );
}
