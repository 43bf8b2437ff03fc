import { useEffect } from 'react';

/** Names the browser tab after the page, e.g. "Library · Ionfolio". */
export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = `${title} · Ionfolio`;
  }, [title]);
}
