export { parseFormula, MAX_ATOM_COUNT } from './parse-formula';
export { toElementCounts } from './to-element-counts';
export { formatFormula } from './format-formula';
export { nominalMass, elementNominalMass } from './nominal-mass';
export { monoisotopicMass } from './monoisotopic-mass';
export { rdbe } from './rdbe';
export { nitrogenRuleHolds } from './nitrogen-rule';
