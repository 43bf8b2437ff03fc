import { readMolecularIon, type PeakList } from '@ionfolio/chem';

// Chlorobenzene-like unknown, invented (simulated): M+1 6.6 % from 6 × 13C at 1.08 %/C and M+2 32.5 %
// from one 37Cl at 32.0 %/Cl (SCIENCE.md §1, computed).
export const unknownPeaks: PeakList = [
  [50, 9],
  [51, 14],
  [77, 60],
  [112, 100],
  [113, 6.6],
  [114, 32.5],
  [115, 2.1],
];

export const unknownText = unknownPeaks.map(([mz, i]) => `${mz} ${i}`).join('\n');

/** The molecular-ion check as the API computes it: packages/chem's own reading of the unknown. */
export const unknownReading = readMolecularIon(unknownPeaks);

export const caution =
  'A library match proposes candidates; it does not confirm an identity. Confirm against an authentic standard run under the same conditions (spectrum and retention index) before reporting, and follow the laboratory\'s validated methods and the rules that apply to its work (forensic, clinical, environmental).';

const matched = (mzs: number[]) => mzs.map((mz) => ({ mz, queryRelIntensity: 50, libraryRelIntensity: 48 }));

/** Invented candidates: the first agrees with the reading (M 112, Cl1); the second is 2-chlorotoluene-like, M 126. */
export const candidates = [
  { accession: 'IF-000042', revision: 2, name: 'Chlorobenzene (simulated)', formula: 'C6H5Cl', nominalMass: 112, similarity: 97.84, matchedPeaks: matched([50, 51, 77, 112, 113, 114]) },
  { accession: 'IF-000077', revision: 1, name: '2-Chlorotoluene (simulated)', formula: 'C7H7Cl', nominalMass: 126, similarity: 61.27, matchedPeaks: matched([51, 77]) },
  { accession: 'IF-000123', revision: 3, name: 'Bromobenzene (simulated)', formula: 'C6H5Br', nominalMass: 156, similarity: 40.06, matchedPeaks: matched([50, 51, 77]) },
];

export function identifyAnswer(overrides: Record<string, unknown> = {}) {
  return {
    candidates,
    reading: JSON.parse(JSON.stringify(unknownReading)) as unknown,
    method: 'composite',
    edition: 'current',
    tookMs: 12.4,
    caution,
    ...overrides,
  };
}

export function entryReply(accession: string, number: number, name: string, formula: string, peaks: PeakList) {
  return {
    entry: {
      accession,
      revision: { accession, number, label: `${accession} r${number}`, name, formula, peaks, simulated: true },
    },
  };
}
