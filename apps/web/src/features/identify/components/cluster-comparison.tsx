import { isotopeCluster, rdbe } from '@ionfolio/chem';
import { useMemo } from 'react';
import type { Reading } from '../api/identify-schemas';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

type Row = { mz: number; observed: number | null; theoretical: number | null };

/** Peaks of the theoretical cluster below this share (most intense = 100) are not listed. */
const MIN_THEORETICAL_REL = 0.5;

/** The query's cluster beside the theoretical one, by m/z; null when the formula cannot be read. */
export function clusterRows(reading: Reading, formula: string): Row[] | null {
  let theory: { mz: number; relIntensity: number }[];
  try {
    theory = isotopeCluster(formula, { minRelIntensity: MIN_THEORETICAL_REL });
  } catch {
    return null;
  }
  const observed = new Map(reading.cluster.map((p) => [Math.round(p.mz), p.relIntensity]));
  const theoretical = new Map(theory.map((p) => [Math.round(p.mz), p.relIntensity]));
  const mzs = [...new Set([...observed.keys(), ...theoretical.keys()])].sort((a, b) => a - b);
  return mzs.map((mz) => ({ mz, observed: observed.get(mz) ?? null, theoretical: theoretical.get(mz) ?? null }));
}

function Bar({ value, heavy }: { value: number | null; heavy: boolean }) {
  if (value === null) return <span className="text-ink-soft">—</span>;
  return (
    <span className="flex items-center gap-2">
      <span className="inline-block w-24 rounded-sm bg-paper-sunk" aria-hidden="true">
        <span className={`block h-2 rounded-sm ${heavy ? 'bg-ink' : 'bg-ink-soft/60'}`} style={{ width: `${Math.min(100, value)}%` }} />
      </span>
      <span className="tabular-nums">{value.toFixed(1)}</span>
    </span>
  );
}

/** The query's molecular-ion cluster over the isotope cluster computed from the candidate's formula. */
export function ClusterComparison({ reading, formula, label }: { reading: Reading | null; formula: string; label: string }) {
  const rows = useMemo(() => (reading ? clusterRows(reading, formula) : null), [reading, formula]);
  if (reading === null) return null;
  if (rows === null) return <p className="text-sm text-ink-soft">The formula {formula} could not be read, so no cluster is computed.</p>;
  let rdbeText = '—';
  try {
    rdbeText = String(rdbe(formula));
  } catch {
    // An unreadable formula was already said above.
  }
  return (
    <div>
      <p className="mb-1 text-sm text-ink-soft">
        Query cluster (from m/z {reading.clusterStartMz ?? reading.cluster[0]?.mz ?? '?'}) against {formula} of {label}; both scaled to their
        most intense peak = 100. RDBE of {formula}: {rdbeText}.
      </p>
      <div className={tableFrame}>
        <table className={tableBase}>
          <caption className="sr-only">Isotope cluster: query against candidate formula</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className={headCell}>m/z</th>
              <th scope="col" className={headCell}>Query (observed)</th>
              <th scope="col" className={headCell}>{formula} (theoretical)</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.mz} className={rowBase}>
                <th scope="row" className={`${bodyCell} text-left tabular-nums`}>{row.mz}</th>
                <td className={bodyCell}><Bar value={row.observed} heavy /></td>
                <td className={bodyCell}><Bar value={row.theoretical} heavy={false} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
