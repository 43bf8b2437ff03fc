import { isotopeCluster, nominalMass, rdbe } from '@ionfolio/chem';
import { useMemo } from 'react';
import type { Reading } from '../api/identify-schemas';
import { bodyCell, headCell, rowBase, tableBase, tableFrame } from './table-styles';

type Row = { offset: number; observedMz: number; observed: number | null; theoreticalMz: number; theoretical: number | null };

/** Peaks of the theoretical cluster below this share (most intense = 100) are not listed. */
const MIN_THEORETICAL_REL = 0.5;

/**
 * The query's cluster beside the theoretical one, aligned by distance from M (M, M+1, M+2 …) so the
 * patterns compare even when the masses differ (the candidates table flags that); null when the
 * formula cannot be read.
 */
export function clusterRows(reading: Reading, formula: string): Row[] | null {
  let theory: { mz: number; relIntensity: number }[];
  let theoryM: number;
  try {
    theory = isotopeCluster(formula, { minRelIntensity: MIN_THEORETICAL_REL });
    theoryM = nominalMass(formula);
  } catch {
    return null;
  }
  const queryM = reading.clusterStartMz ?? reading.cluster[0]?.mz ?? 0;
  const observed = new Map(reading.cluster.map((p) => [Math.round(p.mz) - queryM, p.relIntensity]));
  const theoretical = new Map(theory.map((p) => [Math.round(p.mz) - theoryM, p.relIntensity]));
  const offsets = [...new Set([...observed.keys(), ...theoretical.keys()])].sort((a, b) => a - b);
  return offsets.map((offset) => ({
    offset,
    observedMz: queryM + offset,
    observed: observed.get(offset) ?? null,
    theoreticalMz: theoryM + offset,
    theoretical: theoretical.get(offset) ?? null,
  }));
}

function Bar({ mz, value, heavy }: { mz: number; value: number | null; heavy: boolean }) {
  if (value === null) return <span className="text-ink-soft">—</span>;
  return (
    <span className="flex items-center gap-2">
      <span className="w-10 tabular-nums text-ink-soft">{mz}</span>
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
        Query cluster (M at m/z {reading.clusterStartMz ?? reading.cluster[0]?.mz ?? '?'}) against {formula} of {label}, peak by peak from M; both
        scaled to their most intense peak = 100. RDBE of {formula}: {rdbeText}.
      </p>
      <div className={tableFrame}>
        <table className={tableBase}>
          <caption className="sr-only">Isotope cluster: query against candidate formula</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className={headCell}>Peak</th>
              <th scope="col" className={headCell}>Query (observed)</th>
              <th scope="col" className={headCell}>{formula} (theoretical)</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.offset} className={rowBase}>
                <th scope="row" className={`${bodyCell} text-left tabular-nums`}>{row.offset === 0 ? 'M' : `M${row.offset > 0 ? '+' : '−'}${Math.abs(row.offset)}`}</th>
                <td className={bodyCell}><Bar mz={row.observedMz} value={row.observed} heavy /></td>
                <td className={bodyCell}><Bar mz={row.theoreticalMz} value={row.theoretical} heavy={false} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
