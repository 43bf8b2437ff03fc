import type { ReactNode } from 'react';

type EmptyStateProps = {
  title: string;
  children?: ReactNode;
};

/** What a panel shows when there is nothing to list yet, with a hint of how to change that. */
export function EmptyState({ title, children }: EmptyStateProps) {
  return (
    <div className="rounded-lg border border-dashed border-rule bg-paper-raised px-6 py-10 text-center">
      <p className="font-bold text-ink">{title}</p>
      {children ? <div className="mx-auto mt-1 max-w-prose text-ink-soft">{children}</div> : null}
    </div>
  );
}
