import type { MolecularIonReading, PeakList } from '@ionfolio/chem';
import { useMemo } from 'react';
import { readEntrySpectrum } from '../utils/read-entry-spectrum';
import { ClusterOverlayTable } from './cluster-overlay-table';
import { Facts } from './entry-panel';

function carbonText(reading: MolecularIonReading): string {
  const c = reading.carbonRange;
  if (!c) return 'no usable M+1';
  return `C${c.min}–C${c.max} (about ${c.estimate.toFixed(1)}; ±2σ of M+1/M)`;
}

function nitrogenText(parity: MolecularIonReading['nitrogenParity']): string {
  if (parity === null) return 'not applied: M unknown';
  return parity === 'odd' ? 'odd number of N' : 'even number of N (possibly none)';
}

type MolecularIonCheckProps = { peaks: PeakList; formula: string; nominalMassDa: number };

/** The molecular-ion check of the spectrum shown, set against the stated formula, with its cluster overlay. */
export function MolecularIonCheck({ peaks, formula, nominalMassDa }: MolecularIonCheckProps) {
  const result = useMemo(() => readEntrySpectrum(peaks, formula, nominalMassDa), [peaks, formula, nominalMassDa]);
  if (peaks.length === 0) return <p className="text-sm text-ink-soft">This revision has no peaks, so there is nothing to read.</p>;
  if ('error' in result) return <p role="alert" className="text-sm text-copper">The spectrum could not be read: {result.error}</p>;
  const { reading, disagreements } = result;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-4" data-testid="molecular-ion-check">
      <Facts
        label="Molecular-ion reading"
        rows={[
          [
            'Molecular ion',
            reading.molecularIonMz === null ? (
              <span className="text-copper">likely absent (highest cluster starts at m/z {reading.clusterStartMz})</span>
            ) : (
              `likely M = m/z ${reading.molecularIonMz}`
            ),
          ],
          ['Chlorine', `Cl ${reading.chlorine}`],
          ['Bromine', `Br ${reading.bromine}`],
          ['Sulfur', reading.sulfurLikely ? 'likely' : 'not indicated'],
          ['Silicon', reading.siliconLikely ? 'likely' : 'not indicated'],
          ['Carbon (from M+1)', carbonText(reading)],
          ['Nitrogen rule', nitrogenText(reading.nitrogenParity)],
        ]}
      />
      {disagreements.length + reading.notes.length > 0 ? (
        <ul aria-label="Reading notes" className="grid gap-1 text-sm">
          {[...disagreements, ...reading.notes].map((note) => (
            <li key={note} className="border-l-2 border-copper pl-3 text-ink">
              {note}
            </li>
          ))}
        </ul>
      ) : null}
      <details className="text-sm">
        <summary className="cursor-pointer font-bold text-ink">Evidence ({reading.evidence.length} numbers)</summary>
        <dl className="mt-2 grid gap-1">
          {reading.evidence.map((item, index) => (
            <div key={`${item.label}-${index}`} className="grid gap-x-3 sm:grid-cols-[11rem_1fr]">
              <dt className="text-ink-soft">{item.label}</dt>
              <dd className="tabular-nums text-ink">{item.value}</dd>
            </div>
          ))}
        </dl>
      </details>
      <ClusterOverlayTable peaks={peaks} formula={formula} />
    </div>
  );
}
