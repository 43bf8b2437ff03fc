import type { ReactNode } from 'react';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';

/** One independent panel of the entry page, with its own error boundary. */
export function Panel({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section aria-label={title} className={`min-w-0 rounded-lg border border-rule-faint bg-paper-raised px-5 py-4 ${className}`}>
      <h2 className="mb-3 text-lg font-bold">{title}</h2>
      <PanelErrorBoundary title={title}>{children}</PanelErrorBoundary>
    </section>
  );
}

/** Term–value pairs in two columns. */
export function Facts({ rows, label }: { rows: [string, ReactNode][]; label?: string }) {
  return (
    <dl aria-label={label} className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm leading-6">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-soft">{term}</dt>
          <dd className="tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
