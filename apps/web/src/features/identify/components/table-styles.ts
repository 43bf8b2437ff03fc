/** Cell classes of the identify page's dense tables. */
export const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
export const bodyCell = 'px-3 py-1.5 align-top';
export const tableFrame = 'overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised';
export const tableBase = 'w-full border-collapse text-sm leading-7';
export const rowBase = 'border-b border-rule-faint last:border-b-0';
export const fieldClass =
  'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink hover:border-ink disabled:opacity-60';
