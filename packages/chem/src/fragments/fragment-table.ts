import type { ElementCounts } from '../elements/elements';

/** Where the table below comes from (SCIENCE.md §6). */
export const FRAGMENT_SOURCE = "Lange's Handbook of Chemistry, 15th ed., §7.8";

/** One way to explain a mass difference or an ion: its text and its atoms. */
export interface FragmentAlternative {
  readonly text: string;
  readonly atoms: ElementCounts;
}

/** A common neutral loss from the molecular ion, in Da (nominal). */
export interface LossEntry {
  readonly lossDa: number;
  readonly alternatives: readonly FragmentAlternative[];
}

/** A common low-mass ion, at nominal m/z. */
export interface IonEntry {
  readonly mz: number;
  readonly alternatives: readonly FragmentAlternative[];
}

const alt = (text: string, atoms: ElementCounts): FragmentAlternative => ({ text, atoms });

/** Common neutral losses, Lange's Handbook of Chemistry, 15th ed., §7.8 (via SCIENCE.md §6). */
export const COMMON_LOSSES: readonly LossEntry[] = [
  { lossDa: 15, alternatives: [alt('CH3', { C: 1, H: 3 })] },
  { lossDa: 17, alternatives: [alt('OH', { O: 1, H: 1 })] },
  { lossDa: 18, alternatives: [alt('H2O', { H: 2, O: 1 })] },
  { lossDa: 19, alternatives: [alt('F', { F: 1 })] },
  { lossDa: 20, alternatives: [alt('HF', { H: 1, F: 1 })] },
  { lossDa: 27, alternatives: [alt('HCN', { H: 1, C: 1, N: 1 })] },
  { lossDa: 28, alternatives: [alt('CO', { C: 1, O: 1 }), alt('C2H4', { C: 2, H: 4 })] },
  { lossDa: 29, alternatives: [alt('CHO', { C: 1, H: 1, O: 1 }), alt('C2H5', { C: 2, H: 5 })] },
  { lossDa: 30, alternatives: [alt('CH2O', { C: 1, H: 2, O: 1 }), alt('NO', { N: 1, O: 1 })] },
  { lossDa: 31, alternatives: [alt('OCH3', { O: 1, C: 1, H: 3 })] },
  { lossDa: 33, alternatives: [alt('HS', { H: 1, S: 1 })] },
  { lossDa: 34, alternatives: [alt('H2S', { H: 2, S: 1 })] },
  { lossDa: 35, alternatives: [alt('Cl', { Cl: 1 })] },
  { lossDa: 36, alternatives: [alt('HCl', { H: 1, Cl: 1 })] },
  { lossDa: 42, alternatives: [alt('CH2CO', { C: 2, H: 2, O: 1 })] },
  { lossDa: 43, alternatives: [alt('C3H7', { C: 3, H: 7 }), alt('CH3CO', { C: 2, H: 3, O: 1 })] },
  { lossDa: 45, alternatives: [alt('COOH', { C: 1, O: 2, H: 1 }), alt('OC2H5', { O: 1, C: 2, H: 5 })] },
  { lossDa: 79, alternatives: [alt('Br (79Br)', { Br: 1 })] },
  { lossDa: 81, alternatives: [alt('Br (81Br)', { Br: 1 })] },
  { lossDa: 127, alternatives: [alt('I', { I: 1 })] },
];

/**
 * Common low-mass ions, Lange's Handbook of Chemistry, 15th ed., §7.8 (via SCIENCE.md §6). The
 * table there gives 29, 43, 57 and 71 by m/z; their compositions here (alkyl and acyl ions) are
 * from memory (common practice).
 */
export const COMMON_IONS: readonly IonEntry[] = [
  { mz: 29, alternatives: [alt('C2H5+', { C: 2, H: 5 }), alt('CHO+', { C: 1, H: 1, O: 1 })] },
  { mz: 30, alternatives: [alt('CH2=NH2+', { C: 1, H: 4, N: 1 })] },
  { mz: 31, alternatives: [alt('CH2=OH+', { C: 1, H: 3, O: 1 })] },
  { mz: 43, alternatives: [alt('C3H7+', { C: 3, H: 7 }), alt('CH3CO+', { C: 2, H: 3, O: 1 })] },
  { mz: 49, alternatives: [alt('CH2Cl+ (35Cl)', { C: 1, H: 2, Cl: 1 })] },
  { mz: 51, alternatives: [alt('CH2Cl+ (37Cl)', { C: 1, H: 2, Cl: 1 })] },
  { mz: 57, alternatives: [alt('C4H9+', { C: 4, H: 9 })] },
  { mz: 71, alternatives: [alt('C5H11+', { C: 5, H: 11 })] },
  { mz: 73, alternatives: [alt('(CH3)3Si+', { C: 3, H: 9, Si: 1 })] },
  { mz: 77, alternatives: [alt('C6H5+', { C: 6, H: 5 })] },
  { mz: 91, alternatives: [alt('C7H7+', { C: 7, H: 7 })] },
  { mz: 93, alternatives: [alt('CH2Br+ (79Br)', { C: 1, H: 2, Br: 1 })] },
  { mz: 95, alternatives: [alt('CH2Br+ (81Br)', { C: 1, H: 2, Br: 1 })] },
  { mz: 105, alternatives: [alt('C6H5CO+', { C: 7, H: 5, O: 1 })] },
];
