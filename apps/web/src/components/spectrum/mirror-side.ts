import type { PeakList } from '@ionfolio/chem';

/** One spectrum of the mirror view: its text label (e.g. "Query" or "IF-000012 r2") and peaks. */
export type MirrorSide = {
  label: string;
  peaks: PeakList;
  /** Nominal mass of the formula when known, for the molecular-ion labels. */
  molecularIonMz?: number | null | undefined;
};
