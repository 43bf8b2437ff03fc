import type { CheckResult, CheckStatus } from '@ionfolio/chem';

const statusStyle: Record<CheckStatus, string> = {
  pass: 'border-rule-faint text-ink-soft',
  warn: 'border-copper/70 text-copper',
  fail: 'border-copper bg-copper text-on-copper',
};

const statusWord: Record<CheckStatus, string> = { pass: 'pass', warn: 'warn', fail: 'fail' };

function formatNumber(value: number | string): string {
  return typeof value === 'number' ? String(Math.round(value * 100) / 100) : value;
}

type CheckListProps = {
  checks: readonly CheckResult[];
  /** Said when there are no checks, e.g. while the formula or peaks are still missing. */
  emptyNote?: string;
};

/** The consistency checks: pass / warn / fail, each with its one-line reason and the numbers behind it. */
export function CheckList({ checks, emptyNote = 'No checks yet.' }: CheckListProps) {
  if (checks.length === 0) return <p className="text-sm text-ink-soft">{emptyNote}</p>;
  return (
    <ul aria-label="Consistency checks" className="divide-y divide-rule-faint rounded-lg border border-rule-faint bg-paper-raised">
      {checks.map((check) => (
        <li key={check.id} data-check={check.id} data-status={check.status} className="flex gap-3 px-4 py-2.5">
          <span
            className={`mt-0.5 inline-flex h-6 w-12 shrink-0 items-center justify-center rounded border text-xs font-bold uppercase tracking-wider ${statusStyle[check.status]}`}
          >
            {statusWord[check.status]}
          </span>
          <div className="min-w-0">
            <p className="font-bold text-ink">{check.title}</p>
            <p className="leading-relaxed text-ink">{check.reason}</p>
            {Object.keys(check.numbers).length > 0 ? (
              <p className="mt-0.5 text-sm tabular-nums text-ink-soft">
                {Object.entries(check.numbers)
                  .map(([name, value]) => `${name} ${formatNumber(value)}`)
                  .join(' · ')}
              </p>
            ) : null}
          </div>
        </li>
      ))}
    </ul>
  );
}
