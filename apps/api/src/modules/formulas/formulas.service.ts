import { formatFormula, isotopeCluster, monoisotopicMass, nominalMass, parseFormula, rdbe } from '@ionfolio/chem';
import { withChemErrors } from '../identify/chem-errors';
import type { FormulaAnswer } from './formulas.schemas';

/** Masses, RDBE and the nominal-mass isotope cluster of a formula (peaks below 0.01 % left out). */
export function describeFormula(text: string): FormulaAnswer {
  return withChemErrors(() => {
    const counts = parseFormula(text);
    return {
      formula: formatFormula(counts),
      nominalMass: nominalMass(counts),
      monoisotopicMass: monoisotopicMass(counts),
      cluster: isotopeCluster(counts).map((p) => ({ mz: p.mz, relativeIntensity: p.relIntensity })),
      rdbe: rdbe(counts),
    };
  }, 'formula');
}
