export { ELEMENTS, ELEMENT_SYMBOLS, isElementSymbol, mostAbundantIsotope } from './elements';
export type { ElementSymbol, ElementCounts, ElementData, Isotope } from './elements';
