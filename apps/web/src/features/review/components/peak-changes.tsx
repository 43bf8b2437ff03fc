import type { PeakDiff } from '../utils/diff-revisions';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

const rel = (value: number) => (Math.round(value * 10) / 10).toFixed(1);

type Row = { mz: number; before: string; after: string; change: 'added' | 'removed' | 'changed' };

/** The peaks this revision adds, removes or re-scales against the published one, by m/z. */
export function PeakChanges({ peaks }: { peaks: PeakDiff }) {
  const rows: Row[] = [
    ...peaks.added.map(([mz, value]): Row => ({ mz, before: '—', after: rel(value), change: 'added' })),
    ...peaks.removed.map(([mz, value]): Row => ({ mz, before: rel(value), after: '—', change: 'removed' })),
    ...peaks.changed.map((peak): Row => ({
      mz: peak.mz,
      before: rel(peak.beforeRelIntensity),
      after: rel(peak.afterRelIntensity),
      change: 'changed',
    })),
  ].sort((a, b) => a.mz - b.mz);
  const summary = `${peaks.added.length} added · ${peaks.removed.length} removed · ${peaks.changed.length} changed`;
  if (rows.length === 0) {
    return <p className="text-sm text-ink-soft">The peaks are the same as in the published revision.</p>;
  }
  return (
    <div>
      <p className="mb-2 text-sm text-ink-soft" data-testid="peak-change-summary">
        {summary}
      </p>
      <div className={`${tableFrame} max-h-80 overflow-y-auto`}>
        <table className={tableBase}>
          <caption className="sr-only">Peak changes</caption>
          <thead className="sticky top-0 border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className={headCell}>m/z</th>
              <th scope="col" className={`${headCell} text-right`}>Published (rel.)</th>
              <th scope="col" className={`${headCell} text-right`}>This revision (rel.)</th>
              <th scope="col" className={headCell}>Change</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={`${row.change}-${row.mz}`} data-change={row.change} className={rowBase}>
                <th scope="row" className={`${bodyCell} text-left tabular-nums`}>{row.mz}</th>
                <td className={`${bodyCell} text-right tabular-nums text-ink-soft`}>{row.before}</td>
                <td className={`${bodyCell} text-right tabular-nums`}>{row.after}</td>
                <td className={`${bodyCell} ${row.change === 'changed' ? 'text-ink' : 'font-bold text-copper'}`}>{row.change}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
