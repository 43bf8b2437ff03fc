import { useMemo } from 'react';
import Fuse from 'fuse.js';
import type { LibraryRow } from '../api/get-entries';

/**
 * Fuzzy find over the rows already loaded (name, synonyms, formula), best match first. It never
 * asks the server: the server-side name filter (`q`) covers the whole library.
 */
export function useQuickFind(rows: readonly LibraryRow[], text: string): LibraryRow[] {
  const fuse = useMemo(
    () =>
      new Fuse(rows, {
        keys: [
          { name: 'name', weight: 3 },
          { name: 'synonyms', weight: 2 },
          { name: 'formula', weight: 1 },
          { name: 'accession', weight: 1 },
        ],
        threshold: 0.34,
        ignoreLocation: true,
      }),
    [rows],
  );
  return useMemo(() => {
    const needle = text.trim();
    if (needle === '') return rows as LibraryRow[];
    return fuse.search(needle).map((result) => result.item);
  }, [fuse, rows, text]);
}
