import type { RevisionState } from '@ionfolio/contracts';

const stateText: Record<RevisionState, string> = {
  draft: 'draft',
  in_review: 'in review',
  needs_changes: 'needs changes',
  published: 'published',
  superseded: 'superseded',
  withdrawn: 'withdrawn',
};

const stateStyle: Record<RevisionState, string> = {
  draft: 'border-dashed border-rule text-ink-soft',
  in_review: 'border-ink text-ink',
  needs_changes: 'border-copper text-copper',
  published: 'border-ink bg-ink text-paper-raised',
  superseded: 'border-rule-faint text-ink-soft',
  withdrawn: 'border-copper bg-copper-soft text-copper',
};

/** A revision's state as a small tag; shared by the entry page, the submit page and the review desk. */
export function RevisionStateBadge({ state }: { state: RevisionState }) {
  return (
    <span
      data-state={state}
      className={`inline-flex items-center rounded border px-2 py-0.5 text-xs font-bold uppercase tracking-wider ${stateStyle[state]}`}
    >
      {stateText[state]}
    </span>
  );
}
