import type { MolecularIonReading, PeakList } from '@ionfolio/chem';
import { useMemo } from 'react';
import { readEntrySpectrum } from '../utils/read-entry-spectrum';
import { ClusterOverlayTable } from './cluster-overlay-table';
import { Facts } from './entry-panel';
import { ReadingEvidence, ReadingNotes } from '../../../components/spectrum/reading-evidence';

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
  const result = useMemo(
    () => readEntrySpectrum(peaks, formula, nominalMassDa),
    [peaks, formula, nominalMassDa],
  );
  if (peaks.length === 0)
    return <p className="text-sm text-ink-soft">This revision has no peaks, so there is nothing to read.</p>;
  if ('error' in result)
    return (
      <p role="alert" className="text-sm text-copper">
        The spectrum could not be read: {result.error}
      </p>
    );
  const { reading, disagreements } = result;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-4" data-testid="molecular-ion-check">
      <Facts
        label="Molecular-ion reading"
        rows={[
          [
            'Molecular ion',
            reading.molecularIonMz === null ? (
              <span className="text-copper">
                likely absent (highest cluster starts at m/z {reading.clusterStartMz})
              </span>
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
      <ReadingNotes label="Reading notes" notes={[...disagreements, ...reading.notes]} />
      <ReadingEvidence evidence={reading.evidence} />
      <ClusterOverlayTable peaks={peaks} formula={formula} />
    </div>
  );
}
