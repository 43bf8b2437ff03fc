type ProgressBarProps = {
  /** What is counted, for assistive technology, e.g. "Blocks processed". */
  label: string;
  /** The unit in the spoken value, e.g. "blocks" → "12 of 50 blocks". */
  unit: string;
  done: number;
  total: number;
  /** Percent to draw when the caller knows better than done/total (e.g. a finished job with total 0). */
  percent?: number;
  countTestId?: string;
};

/** A calm progress bar with the count beside it, for background jobs (batch identify, bulk import). */
export function ProgressBar({ label, unit, done, total, percent, countTestId }: ProgressBarProps) {
  const width = percent ?? (total > 0 ? Math.round((done / total) * 100) : 0);
  return (
    <div className="mt-3 flex items-center gap-3">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={total}
        aria-valuenow={done}
        aria-valuetext={`${done} of ${total} ${unit}`}
        className="h-2.5 flex-1 overflow-hidden rounded-full border border-rule-faint bg-paper-sunk"
      >
        <div className="h-full bg-ink transition-[width]" style={{ width: `${width}%` }} />
      </div>
      <span className="text-sm tabular-nums text-ink" data-testid={countTestId}>
        {done} / {total}
      </span>
    </div>
  );
}
