import { Link } from 'react-router-dom';
import type { QueueState, ReviewQueue } from '../api/get-review-queue';
import { queueStates } from '../api/get-review-queue';

export const queueStateLabels: Record<QueueState, string> = {
  in_review: 'In review',
  needs_changes: 'Returned',
  draft: 'Drafts',
};

type QueueTabsProps = {
  active: QueueState;
  counts: ReviewQueue['counts'] | undefined;
  /** The address of each tab (the page keeps the other filters). */
  hrefFor: (state: QueueState) => string;
};

/** One tab per open state, each with how many revisions are in it. */
export function QueueTabs({ active, counts, hrefFor }: QueueTabsProps) {
  return (
    <nav aria-label="Queue states" className="mb-4 border-b border-rule-faint">
      <ul className="flex gap-1 px-1">
        {queueStates.map((state) => {
          const isActive = state === active;
          return (
            <li key={state}>
              <Link
                to={hrefFor(state)}
                aria-current={isActive ? 'page' : undefined}
                className={`-mb-px inline-flex items-center gap-2 border-b-2 px-3 py-2 text-sm ${
                  isActive ? 'border-copper font-bold text-ink' : 'border-transparent text-ink-soft hover:text-ink'
                }`}
              >
                {queueStateLabels[state]}
                <span
                  data-testid={`count-${state}`}
                  className="rounded border border-rule-faint bg-paper px-1.5 text-xs tabular-nums text-ink-soft"
                >
                  {counts ? counts[state] : '–'}
                </span>
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
