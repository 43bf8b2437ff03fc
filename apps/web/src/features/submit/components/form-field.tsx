import { useId, type ReactNode } from 'react';

export const inputClass =
  'w-full rounded-md border border-rule bg-paper-raised px-3 py-2 text-ink placeholder:text-ink-soft/70 ' +
  'focus:border-ink disabled:cursor-not-allowed disabled:bg-paper-sunk aria-[invalid=true]:border-copper';

type FieldProps = {
  label: string;
  hint?: ReactNode;
  errors?: readonly string[];
  /** Renders the control with the id, the description id and the invalid flag it must carry. */
  children: (control: { id: string; 'aria-describedby'?: string; 'aria-invalid'?: boolean }) => ReactNode;
  className?: string;
};

/** One labelled control of the submit form with its hint and the problems found in it. */
export function Field({ label, hint, errors = [], children, className = '' }: FieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', errors.length > 0 ? `${id}-errors` : ''].filter(Boolean).join(' ');
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-sm font-bold text-ink">
        {label}
      </label>
      {children({
        id,
        ...(describedBy ? { 'aria-describedby': describedBy } : {}),
        ...(errors.length > 0 ? { 'aria-invalid': true } : {}),
      })}
      {hint ? (
        <div id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
          {hint}
        </div>
      ) : null}
      {errors.length > 0 ? (
        <ul id={`${id}-errors`} className="mt-1 text-sm text-copper">
          {errors.map((message) => (
            <li key={message}>{message}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/** A titled group of fields. */
export function FormSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="rounded-lg border border-rule-faint bg-paper-raised/60 px-5 pb-5 pt-2">
      <legend className="px-1 text-sm font-bold uppercase tracking-wider text-ink-soft">{title}</legend>
      <div className="grid gap-4 md:grid-cols-2">{children}</div>
    </fieldset>
  );
}
