/**
 * The elements that packages/chem understands, with their stable isotopes.
 *
 * Source of every mass and mole fraction below: NIST "Atomic Weights and Isotopic Compositions for
 * All Elements" — masses from the Atomic Mass Evaluation 2016, representative isotopic compositions
 * from IUPAC/CIAAW (Berglund & Wieser 2011, Pure Appl. Chem. 83, 397), as tabulated in
 * ../shared/SCIENCE.md §1. Valences are the usual lowest (LEWIS) valences — common practice.
 */

/** Symbol of an element that formulas, isotope clusters and formula suggestions support. */
export type ElementSymbol = 'H' | 'C' | 'N' | 'O' | 'F' | 'Si' | 'P' | 'S' | 'Cl' | 'Br' | 'I';

/** Atom counts per element; absent means 0. Counts are non-negative integers. */
export type ElementCounts = Readonly<Partial<Record<ElementSymbol, number>>>;

/** One stable isotope: mass number, exact mass in unified atomic mass units (u) and mole fraction 0–1. */
export interface Isotope {
  readonly massNumber: number;
  readonly massU: number;
  readonly abundance: number;
}

/** One element: symbol, stable isotopes lightest first, and its lowest common valence. */
export interface ElementData {
  readonly symbol: ElementSymbol;
  readonly isotopes: readonly Isotope[];
  readonly valence: number;
}

function element(symbol: ElementSymbol, valence: number, isotopes: [number, number, number][]): ElementData {
  return Object.freeze({
    symbol,
    valence,
    isotopes: Object.freeze(
      isotopes.map(([massNumber, massU, abundance]) => Object.freeze({ massNumber, massU, abundance })),
    ),
  });
}

/**
 * Isotope table of the supported elements (SCIENCE.md §1; NIST / AME 2016 / CIAAW 2011).
 * Isotopes are listed lightest first; abundances are mole fractions summing to 1 per element.
 *
 * @example
 * ELEMENTS.Cl.isotopes[1] // { massNumber: 37, massU: 36.965902602, abundance: 0.2424 }
 */
export const ELEMENTS: Readonly<Record<ElementSymbol, ElementData>> = Object.freeze({
  H: element('H', 1, [
    [1, 1.00782503223, 0.999885],
    [2, 2.01410177812, 0.000115],
  ]),
  C: element('C', 4, [
    [12, 12, 0.9893],
    [13, 13.00335483507, 0.0107],
  ]),
  N: element('N', 3, [
    [14, 14.00307400443, 0.99636],
    [15, 15.00010889888, 0.00364],
  ]),
  O: element('O', 2, [
    [16, 15.99491461957, 0.99757],
    [17, 16.9991317565, 0.00038],
    [18, 17.99915961286, 0.00205],
  ]),
  F: element('F', 1, [[19, 18.99840316273, 1]]),
  Si: element('Si', 4, [
    [28, 27.97692653465, 0.92223],
    [29, 28.9764946649, 0.04685],
    [30, 29.973770136, 0.03092],
  ]),
  P: element('P', 3, [[31, 30.97376199842, 1]]),
  S: element('S', 2, [
    [32, 31.9720711744, 0.9499],
    [33, 32.9714589098, 0.0075],
    [34, 33.967867004, 0.0425],
    [36, 35.96708071, 0.0001],
  ]),
  Cl: element('Cl', 1, [
    [35, 34.968852682, 0.7576],
    [37, 36.965902602, 0.2424],
  ]),
  Br: element('Br', 1, [
    [79, 78.9183376, 0.5069],
    [81, 80.9162897, 0.4931],
  ]),
  I: element('I', 1, [[127, 126.9044719, 1]]),
});

/**
 * All supported element symbols, in Hill order for a carbon compound (C, H, then alphabetical).
 *
 * @example
 * ELEMENT_SYMBOLS.includes('Br') // true
 */
export const ELEMENT_SYMBOLS: readonly ElementSymbol[] = Object.freeze([
  'C',
  'H',
  'Br',
  'Cl',
  'F',
  'I',
  'N',
  'O',
  'P',
  'S',
  'Si',
] as ElementSymbol[]);

/**
 * Whether a string is a supported element symbol (case-sensitive: `Cl`, not `CL`).
 *
 * @example
 * isElementSymbol('Cl') // true
 * isElementSymbol('Xx') // false
 */
export function isElementSymbol(symbol: string): symbol is ElementSymbol {
  return Object.prototype.hasOwnProperty.call(ELEMENTS, symbol);
}

/**
 * The most abundant isotope of an element (its mass number gives the element's nominal mass).
 * For every supported element this is also the lightest isotope.
 *
 * @example
 * mostAbundantIsotope('Br').massNumber // 79
 */
export function mostAbundantIsotope(symbol: ElementSymbol): Isotope {
  let best: Isotope | undefined;
  for (const isotope of ELEMENTS[symbol].isotopes) {
    if (best === undefined || isotope.abundance > best.abundance) best = isotope;
  }
  // Every element in ELEMENTS has at least one isotope.
  return best as Isotope;
}
