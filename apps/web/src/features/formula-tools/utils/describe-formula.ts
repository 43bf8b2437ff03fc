import {
  ChemError,
  formatFormula,
  isotopeCluster,
  monoisotopicMass,
  nitrogenRuleHolds,
  nominalMass,
  parseFormula,
  rdbe,
  type ClusterPeak,
} from '@ionfolio/chem';

/** What the isotope calculator shows for one formula, all computed in the browser by packages/chem. */
export type FormulaFacts = {
  formula: string;
  nominalMassDa: number;
  monoisotopicMassU: number;
  rdbe: number;
  nitrogenRuleHolds: boolean;
  nitrogenCount: number;
  cluster: ClusterPeak[];
};

/** Cluster peaks below this share of the most intense one (= 100) are left out of table and chart. */
export const CLUSTER_FLOOR_REL = 0.05;

/** Reads a formula and computes its masses, RDBE, nitrogen rule and isotope cluster. */
export function describeFormula(text: string): { ok: true; facts: FormulaFacts } | { ok: false; error: string } {
  try {
    const counts = parseFormula(text);
    return {
      ok: true,
      facts: {
        formula: formatFormula(counts),
        nominalMassDa: nominalMass(counts),
        monoisotopicMassU: monoisotopicMass(counts),
        rdbe: rdbe(counts),
        nitrogenRuleHolds: nitrogenRuleHolds(counts),
        nitrogenCount: counts.N ?? 0,
        cluster: isotopeCluster(counts, { minRelIntensity: CLUSTER_FLOOR_REL }),
      },
    };
  } catch (error) {
    if (error instanceof ChemError || error instanceof RangeError) {
      const where = error instanceof ChemError && error.position !== undefined ? ` (at character ${error.position + 1})` : '';
      return { ok: false, error: `${error.message}${where}` };
    }
    throw error;
  }
}
