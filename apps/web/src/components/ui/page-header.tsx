import type { ReactNode } from 'react';
import { useDocumentTitle } from './use-document-title';

type PageHeaderProps = {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
};

/** The title block of a page; the `h1` every screen has exactly once. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  useDocumentTitle(title);
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-rule-faint pb-4">
      <div className="max-w-3xl">
        <h1 className="text-2xl font-bold text-ink">{title}</h1>
        {description ? <p className="mt-1 leading-relaxed text-ink-soft">{description}</p> : null}
      </div>
      {actions ? <div className="flex items-center gap-2">{actions}</div> : null}
    </div>
  );
}
