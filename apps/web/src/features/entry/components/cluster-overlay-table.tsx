import type { PeakList } from '@ionfolio/chem';
import { useMemo } from 'react';
import { clusterOverlay } from '../utils/cluster-overlay';

const head = 'px-3 py-1.5 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const cell = 'px-3 py-1 tabular-nums';

function pct(value: number | null): string {
  return value === null ? '—' : value.toFixed(1);
}

/**
 * Observed against theoretical, both as % of M: each row has a bar for the observed peak (ink) with
 * the theoretical height marked on the same bar (a copper tick), so the two patterns overlay.
 */
export function ClusterOverlayTable({ peaks, formula }: { peaks: PeakList; formula: string }) {
  const overlay = useMemo(() => clusterOverlay(peaks, formula), [peaks, formula]);
  if (overlay.kind === 'bad-formula') return <p className="text-sm text-ink-soft">The formula {formula} could not be read, so no cluster is computed.</p>;
  if (overlay.kind === 'no-m') {
    return <p className="text-sm text-ink-soft">The spectrum has no peak at m/z {overlay.molecularIonMz} (M of {formula}), so the cluster cannot be scaled to M.</p>;
  }
  // Bars span 0 … the largest value shown, so an M+2 above M (bromine) still fits.
  const scale = Math.max(100, ...overlay.rows.flatMap((r) => [r.observedPctOfM ?? 0, r.theoreticalPctOfM ?? 0]));
  return (
    <div>
      <p className="mb-1 text-sm text-ink-soft">
        Observed peaks against the isotope cluster of {formula}, both as % of M (m/z {overlay.molecularIonMz}). Ink bar: observed; copper tick:
        theoretical.
      </p>
      <div className="overflow-x-auto rounded-lg border border-rule-faint">
        <table className="w-full border-collapse text-sm leading-6">
          <caption className="sr-only">Isotope cluster, observed against theoretical, % of M</caption>
          <thead className="border-b border-rule bg-paper-sunk">
            <tr>
              <th scope="col" className={head}>Peak</th>
              <th scope="col" className={head}>m/z</th>
              <th scope="col" className={`${head} text-right`}>Observed %</th>
              <th scope="col" className={`${head} text-right`}>Theoretical %</th>
              <th scope="col" className={head}>
                <span className="sr-only">Overlay</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {overlay.rows.map((row) => (
              <tr key={row.mz} className="border-b border-rule-faint last:border-b-0">
                <th scope="row" className={`${cell} text-left font-normal text-ink-soft`}>{row.offset === 0 ? 'M' : `M+${row.offset}`}</th>
                <td className={cell}>{row.mz}</td>
                <td className={`${cell} text-right`}>{pct(row.observedPctOfM)}</td>
                <td className={`${cell} text-right`}>{pct(row.theoreticalPctOfM)}</td>
                <td className="px-3 py-1" aria-hidden="true">
                  <span className="relative block h-2.5 w-16 rounded-sm bg-paper-sunk lg:w-28">
                    <span className="absolute inset-y-0 left-0 rounded-sm bg-ink" style={{ width: `${((row.observedPctOfM ?? 0) / scale) * 100}%` }} />
                    {row.theoreticalPctOfM === null ? null : (
                      <span className="absolute -inset-y-0.5 w-0.5 bg-copper" style={{ left: `calc(${(row.theoreticalPctOfM / scale) * 100}% - 1px)` }} />
                    )}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
