import type { CheckStatus } from '../api/revision-view';

const marks: Record<CheckStatus, { mark: string; className: string }> = {
  pass: { mark: '✓', className: 'text-ink-soft' },
  warn: { mark: '!', className: 'font-bold text-copper' },
  fail: { mark: '✕', className: 'font-bold text-copper underline decoration-copper decoration-2 underline-offset-4' },
};

/** A check status as a mark and its word, so it reads without colour. */
export function CheckStatusMark({ status }: { status: CheckStatus | null | undefined }) {
  if (!status) return <span className="text-ink-soft">not run</span>;
  const { mark, className } = marks[status];
  return (
    <span className={`inline-flex items-center gap-1.5 whitespace-nowrap ${className}`}>
      <span aria-hidden="true" className="inline-block w-3 text-center">
        {mark}
      </span>
      {status}
    </span>
  );
}
