import type { ElementCounts } from '../elements/elements';
import type { ClusterPeak } from '../isotopes/isotope-cluster';
import type { MolecularIonReading } from '../reading/read-molecular-ion';
import type { PeakList } from '../types';

/** What every check reads: the formula, its theoretical cluster and the normalised spectrum. */
export interface CheckContext {
  readonly formula: string;
  readonly counts: ElementCounts;
  /** Nominal mass of the formula (lightest isotopes), Da. */
  readonly molecularMassDa: number;
  /** Theoretical cluster of the formula, most intense = 100. */
  readonly theoretical: readonly ClusterPeak[];
  /** Spectrum with nominal m/z, sorted, base peak 100. */
  readonly spectrum: PeakList;
  /** Relative intensity by nominal m/z (base peak 100). */
  readonly intensity: ReadonlyMap<number, number>;
  readonly reading: MolecularIonReading;
  readonly ionizationEnergyEv: number | undefined;
}
