import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import type { AuditFilter } from '../api/get-audit-events';

const inputClasses = 'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink';

/** Action and subject filters, applied on Enter or the button. */
export function AuditFilters({ filter, onApply }: { filter: AuditFilter; onApply: (filter: AuditFilter) => void }) {
  const [action, setAction] = useState(filter.action);
  const [subject, setSubject] = useState(filter.subject);
  const actionId = useId();
  const subjectId = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onApply({ action, subject });
  };
  return (
    <form role="search" aria-label="Filter the audit log" onSubmit={submit} className="mb-4 flex flex-wrap items-end gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={actionId} className="text-xs font-bold text-ink-soft">
          Action
        </label>
        <input
          id={actionId}
          value={action}
          placeholder="e.g. revision.published"
          onChange={(event) => setAction(event.target.value)}
          className={inputClasses}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={subjectId} className="text-xs font-bold text-ink-soft">
          Subject
        </label>
        <input
          id={subjectId}
          value={subject}
          placeholder="e.g. IF-000042 r2"
          onChange={(event) => setSubject(event.target.value)}
          className={inputClasses}
        />
      </div>
      <Button type="submit" variant="secondary">
        Filter
      </Button>
      {filter.action || filter.subject ? (
        <Button
          variant="quiet"
          onClick={() => {
            setAction('');
            setSubject('');
            onApply({ action: '', subject: '' });
          }}
        >
          Clear filters
        </Button>
      ) : null}
    </form>
  );
}
