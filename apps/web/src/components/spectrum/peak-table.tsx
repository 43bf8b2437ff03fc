import { useMemo, useState } from 'react';
import type { PeakList } from '@ionfolio/chem';
import { Button } from '../ui/button';
import { peakListText } from './peak-list-text';

type SortKey = 'mz' | 'intensity';
type Sort = { key: SortKey; descending: boolean };

type PeakTableProps = {
  peaks: PeakList;
  caption?: string;
  /** Rows shown before the table scrolls. */
  maxHeightRem?: number;
};

const headerCell = 'px-3 py-1.5 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';

/** Every peak of a spectrum: m/z and intensity relative to the base peak, sortable, copyable as text. */
export function PeakTable({ peaks, caption = 'Peaks', maxHeightRem = 20 }: PeakTableProps) {
  const [sort, setSort] = useState<Sort>({ key: 'mz', descending: false });
  const [copied, setCopied] = useState<'idle' | 'copied' | 'failed'>('idle');
  const maxIntensity = useMemo(() => peaks.reduce((m, [, i]) => Math.max(m, i), 0), [peaks]);
  const rows = useMemo(() => {
    const column = sort.key === 'mz' ? 0 : 1;
    const sorted = [...peaks].sort((a, b) => a[column] - b[column] || a[0] - b[0]);
    return sort.descending ? sorted.reverse() : sorted;
  }, [peaks, sort]);

  const sortButton = (key: SortKey, text: string) => {
    const active = sort.key === key;
    return (
      <th
        scope="col"
        className={headerCell}
        aria-sort={active ? (sort.descending ? 'descending' : 'ascending') : 'none'}
      >
        <button
          type="button"
          className="inline-flex items-center gap-1 uppercase hover:text-ink"
          onClick={() => setSort({ key, descending: active ? !sort.descending : key === 'intensity' })}
        >
          {text}
          <span aria-hidden="true">{active ? (sort.descending ? '▾' : '▴') : ''}</span>
        </button>
      </th>
    );
  };

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(peakListText(peaks));
      setCopied('copied');
    } catch {
      setCopied('failed');
    }
  };

  return (
    <div>
      <div className="mb-2 flex items-center gap-3">
        <Button variant="secondary" onClick={() => void copy()}>
          Copy as text
        </Button>
        <span role="status" className="text-sm text-ink-soft">
          {copied === 'copied' ? 'Copied as m/z–intensity lines.' : copied === 'failed' ? 'This browser did not allow copying.' : ''}
        </span>
      </div>
      <div className="overflow-y-auto rounded-lg border border-rule-faint bg-paper-raised" style={{ maxHeight: `${maxHeightRem}rem` }}>
        <table className="w-full border-collapse text-sm leading-6">
          <caption className="sr-only">{caption}</caption>
          <thead className="sticky top-0 border-b border-rule bg-paper-sunk">
            <tr>
              {sortButton('mz', 'm/z')}
              {sortButton('intensity', 'Intensity')}
              <th scope="col" className={headerCell}>
                % of base
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map(([mz, intensity]) => (
              <tr key={mz} className="border-b border-rule-faint last:border-b-0">
                <td className="px-3 py-0.5 tabular-nums">{mz}</td>
                <td className="px-3 py-0.5 tabular-nums">{Math.round(intensity * 100) / 100}</td>
                <td className="px-3 py-0.5 tabular-nums text-ink-soft">
                  {maxIntensity > 0 ? ((intensity / maxIntensity) * 100).toFixed(1) : '—'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
