import type { ElementSymbol } from '../elements/elements';

/**
 * Names of the Seven Golden Rules checks (Kind & Fiehn 2007, BMC Bioinformatics 8:105; SCIENCE.md
 * §2) that apply at nominal mass, as they appear in `FormulaSuggestion.rulesPassed`.
 * - `element-caps` (rule 1): element counts within the caps for the mass range.
 * - `lewis-senior` (rule 2): valence sum even, ≥ 2 × the largest valence, ≥ 2 × (atoms − 1).
 * - `nitrogen-rule`: nominal-mass parity matches the N count (equivalent to an integer RDBE here).
 * - `rdbe`: RDBE a whole number ≥ 0 (a molecular ion, not an even-electron fragment).
 * - `hc-ratio` (rule 4): H/C within the common range 0.2–3.1.
 * - `heteroatom-ratios` (rule 5): N/C, O/C, P/C, S/C, F/C, Cl/C, Br/C, Si/C within the common ranges.
 * - `element-probability` (rule 6): the multi-element N/O/P/S count limits.
 * - `isotope-pattern` (rule 3): agreement with the observed cluster ≥ {@link ISOTOPE_PATTERN_MIN_AGREEMENT}.
 */
export type GoldenRule =
  | 'element-caps'
  | 'lewis-senior'
  | 'nitrogen-rule'
  | 'rdbe'
  | 'hc-ratio'
  | 'heteroatom-ratios'
  | 'element-probability'
  | 'isotope-pattern';

/** Agreement (0–1) from which the isotope-pattern rule counts as passed. */
export const ISOTOPE_PATTERN_MIN_AGREEMENT = 0.5;

type Caps = Readonly<Partial<Record<ElementSymbol, number>>>;

/** Rule 1 caps below 500 Da (Kind & Fiehn 2007 via SCIENCE.md §2, secondary source). */
const CAPS_BELOW_500: Caps = { C: 39, H: 72, N: 20, O: 20, P: 9, S: 10, F: 16, Cl: 10, Br: 5, Si: 8 };
/** Rule 1 caps below 1000 Da (Kind & Fiehn 2007, Table 1 — from memory). */
const CAPS_BELOW_1000: Caps = { C: 78, H: 126, N: 25, O: 27, P: 9, S: 14, F: 34, Cl: 12, Br: 8, Si: 14 };
/** Iodine has no cap in the paper; this one keeps the enumeration small (a choice, not a source). */
const IODINE_CAP = 6;

/**
 * Largest count of an element that rule 1 allows at a nominal mass (no cap above 1000 Da).
 *
 * @example
 * elementCap('Br', 300) // 5
 */
export function elementCap(symbol: ElementSymbol, nominalMassDa: number): number {
  if (symbol === 'I') return IODINE_CAP;
  if (nominalMassDa < 500) return CAPS_BELOW_500[symbol] ?? Infinity;
  if (nominalMassDa < 1000) return CAPS_BELOW_1000[symbol] ?? Infinity;
  return Infinity;
}

/** Common H/C range of rule 4 (Kind & Fiehn 2007 [src via SCIENCE.md §2]). */
export const HC_COMMON = Object.freeze({ min: 0.2, max: 3.1 });

/**
 * Common upper limits of X/C of rule 5. N, O, P, S from SCIENCE.md §2 (Kind & Fiehn 2007, from
 * memory there); F, Cl, Br, Si from the same paper's table, from memory.
 */
export const HETEROATOM_COMMON_MAX: Readonly<Partial<Record<ElementSymbol, number>>> = Object.freeze({
  N: 1.3,
  O: 1.2,
  P: 0.3,
  S: 0.8,
  F: 1.5,
  Cl: 0.8,
  Br: 0.8,
  Si: 0.5,
});

/** Counts in the fixed order used by the enumeration. */
export interface CountsVector {
  C: number;
  H: number;
  N: number;
  O: number;
  S: number;
  Cl: number;
  Br: number;
  F: number;
  Si: number;
  P: number;
  I: number;
}

/** Rule 2, LEWIS and SENIOR with the lowest valences: whether the formula can be a closed-shell molecule. */
export function passesLewisSenior(c: CountsVector): boolean {
  const monovalent = c.H + c.F + c.Cl + c.Br + c.I;
  const valenceSum = monovalent + 2 * (c.O + c.S) + 3 * (c.N + c.P) + 4 * (c.C + c.Si);
  const atoms = monovalent + c.O + c.S + c.N + c.P + c.C + c.Si;
  const maxValence = c.C + c.Si > 0 ? 4 : c.N + c.P > 0 ? 3 : c.O + c.S > 0 ? 2 : 1;
  return valenceSum % 2 === 0 && valenceSum >= 2 * maxValence && valenceSum >= 2 * (atoms - 1);
}

/** Rule 4 (common range) on H/C; false without carbon. */
export function passesHcRatio(c: CountsVector): boolean {
  if (c.C === 0) return false;
  const ratio = c.H / c.C;
  return ratio >= HC_COMMON.min && ratio <= HC_COMMON.max;
}

/** Number of rule-5 heteroatom ratios outside their common range (all count when C = 0). */
export function heteroatomRatioFailures(c: CountsVector): number {
  const limits = HETEROATOM_COMMON_MAX;
  const over = (count: number, limit: number | undefined) =>
    count > 0 && count > (limit ?? Infinity) * c.C ? 1 : 0;
  return (
    over(c.N, limits.N) +
    over(c.O, limits.O) +
    over(c.P, limits.P) +
    over(c.S, limits.S) +
    over(c.F, limits.F) +
    over(c.Cl, limits.Cl) +
    over(c.Br, limits.Br) +
    over(c.Si, limits.Si)
  );
}

/**
 * Rule 6, element probability check (Kind & Fiehn 2007, from memory): when several of N, O, P, S
 * are each above 1, their counts stay below the listed limits.
 */
export function passesElementProbability(c: CountsVector): boolean {
  const n = c.N > 1;
  const o = c.O > 1;
  const p = c.P > 1;
  const s = c.S > 1;
  if (n && o && p && s && (c.N >= 10 || c.O >= 20 || c.P >= 4 || c.S >= 3)) return false;
  if (n && o && p && (c.N >= 11 || c.O >= 22 || c.P >= 6)) return false;
  if (o && p && s && (c.O >= 14 || c.P >= 3 || c.S >= 3)) return false;
  if (p && s && n && (c.P >= 3 || c.S >= 3 || c.N >= 4)) return false;
  if (n && o && s && (c.N >= 19 || c.O >= 14 || c.S >= 8)) return false;
  return true;
}
