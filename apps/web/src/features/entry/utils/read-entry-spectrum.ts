import { readMolecularIon, toElementCounts, type MolecularIonReading, type PeakList } from '@ionfolio/chem';

export type EntryReading = { reading: MolecularIonReading; disagreements: string[] } | { error: string };

/**
 * The molecular-ion check of an entry's spectrum, and where it disagrees with the stated formula
 * (M, chlorine or bromine count): those disagreements are what a reviewer wants to see first.
 */
export function readEntrySpectrum(peaks: PeakList, formula: string, nominalMassDa: number): EntryReading {
  let reading: MolecularIonReading;
  try {
    // Formula suggestions are the identify page's business; the entry already states its formula.
    reading = readMolecularIon(peaks, { suggestLimit: 0 });
  } catch (error) {
    return { error: error instanceof Error ? error.message : 'the spectrum could not be read' };
  }
  const disagreements: string[] = [];
  if (reading.molecularIonMz === null) {
    disagreements.push(`The formula puts M at m/z ${nominalMassDa}; the spectrum reads M as likely absent.`);
  } else if (reading.molecularIonMz !== nominalMassDa) {
    disagreements.push(`The formula puts M at m/z ${nominalMassDa}; the spectrum reads M at m/z ${reading.molecularIonMz}.`);
  }
  try {
    const counts = toElementCounts(formula);
    for (const [symbol, read] of [['Cl', reading.chlorine], ['Br', reading.bromine]] as const) {
      const stated = counts[symbol] ?? 0;
      if (stated !== read) disagreements.push(`The formula has ${symbol} ${stated}; the cluster reads ${symbol} ${read}.`);
    }
  } catch {
    // An unreadable formula is shown by the compound panel; the reading stands on its own.
  }
  return { reading, disagreements };
}
