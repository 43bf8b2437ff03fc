export { suggestFormulas, DEFAULT_ELEMENT_RANGES, MAX_SUGGEST_MASS_DA } from './suggest-formulas';
export type { FormulaSuggestion, SuggestFormulasConstraints, ElementRanges } from './suggest-formulas';
export { clusterAgreement, AGREEMENT_NOISE, AGREEMENT_WINDOW } from './cluster-agreement';
export { elementCap, HC_COMMON, HETEROATOM_COMMON_MAX, ISOTOPE_PATTERN_MIN_AGREEMENT } from './golden-rules';
export type { GoldenRule } from './golden-rules';
