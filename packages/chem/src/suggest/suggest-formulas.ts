import { ChemError } from '../errors/chem-error';
import { isElementSymbol, type ElementCounts, type ElementSymbol } from '../elements/elements';
import { formatFormula } from '../formula/format-formula';
import { monoisotopicMass } from '../formula/monoisotopic-mass';
import { elementNominalMass } from '../formula/nominal-mass';
import type { ClusterPeak } from '../isotopes/isotope-cluster';
import { elementDistribution } from '../isotopes/nominal-distribution';
import {
  AGREEMENT_NOISE,
  AGREEMENT_WINDOW,
  agreementFromChiSquare,
  clusterWindow,
  windowChiSquare,
} from './cluster-agreement';
import { elementLogPrior, formulaLogPrior } from './formula-prior';
import {
  elementCap,
  heteroatomRatioFailures,
  ISOTOPE_PATTERN_MIN_AGREEMENT,
  passesElementProbability,
  passesHcRatio,
  passesLewisSenior,
  type CountsVector,
  type GoldenRule,
} from './golden-rules';

// Module-local copies: bundlers and test runners may compile imported bindings to getters, which
// costs more than the arithmetic in the enumeration's innermost loops.
const WINDOW = AGREEMENT_WINDOW;
const chiSquareOf = windowChiSquare;
const elementPriorOf = elementLogPrior;
const priorOf = formulaLogPrior;
const lewisSenior = passesLewisSenior;

/** One candidate formula for a nominal molecular mass. */
export interface FormulaSuggestion {
  /** Hill-order formula, e.g. `C6H5Cl`. */
  formula: string;
  counts: ElementCounts;
  /** Da; equals the requested nominal mass. */
  nominalMass: number;
  /** u, lightest isotopes. */
  monoisotopicMass: number;
  /** Rings plus double bonds, a whole number ≥ 0 for every suggestion. */
  rdbe: number;
  /** 0–1 agreement of the theoretical with the observed cluster (see `clusterAgreement`), null without one. */
  agreement: number | null;
  /** The Golden Rules checks this formula passes (see {@link GoldenRule}). */
  rulesPassed: string[];
}

/** Element count ranges `[min, max]` (inclusive) per element. */
export type ElementRanges = Partial<Record<ElementSymbol, readonly [min: number, max: number]>>;

/** Constraints of {@link suggestFormulas}. */
export interface SuggestFormulasConstraints {
  /** Count ranges that replace the defaults for the elements given; others keep {@link DEFAULT_ELEMENT_RANGES}. */
  elements?: ElementRanges;
  /** Observed molecular-ion cluster (m/z, intensity on any scale); M is the requested nominal mass. */
  observedCluster?: readonly ClusterPeak[];
  /** Number of suggestions returned, default 20. */
  limit?: number;
}

/** Default element count ranges of {@link suggestFormulas}. Give `[0, 0]` to exclude an element. */
export const DEFAULT_ELEMENT_RANGES: Readonly<Record<ElementSymbol, readonly [number, number]>> =
  Object.freeze({
    C: [0, 39],
    H: [0, 72],
    N: [0, 20],
    O: [0, 20],
    S: [0, 4],
    Cl: [0, 6],
    Br: [0, 4],
    F: [0, 16],
    Si: [0, 4],
    P: [0, 3],
    I: [0, 2],
  });

/** Largest nominal mass accepted by {@link suggestFormulas}, in Da. */
export const MAX_SUGGEST_MASS_DA = 2000;

/** Ratios to M grow with every atom added, so a subtree above this many noise widths is skipped. */
const PRUNE_SIGMAS = 5;

/** Outer enumeration order: elements that dominate the cluster first, so pruning cuts early. */
const OUTER: readonly (keyof CountsVector & ElementSymbol)[] = [
  'I',
  'Br',
  'Cl',
  'S',
  'Si',
  'P',
  'F',
  'N',
  'O',
];
/** OUTER followed by the innermost elements, for bounds over everything still to come. */
const REST: readonly ElementSymbol[] = [...OUTER, 'C', 'H'];

interface Candidate {
  counts: CountsVector;
  chi2: number | null;
  score: number;
  rdbe: number;
}

function truncatedDistributions(symbol: ElementSymbol, max: number): Float64Array[] {
  const table: Float64Array[] = [];
  for (let n = 0; n <= max; n++) {
    const { start, values } = elementDistribution(symbol, n);
    const window = new Float64Array(WINDOW);
    for (let k = 0; k < WINDOW; k++) window[k] = values[k - start] ?? 0;
    table.push(window);
  }
  return table;
}

function convolveWindow(a: Float64Array, b: Float64Array, out: Float64Array): void {
  for (let k = 0; k < WINDOW; k++) {
    let sum = 0;
    for (let i = 0; i <= k; i++) sum += (a[i] as number) * (b[k - i] as number);
    out[k] = sum;
  }
}

function validateRanges(
  nominalMassDa: number,
  given: ElementRanges | undefined,
): Record<ElementSymbol, [number, number]> {
  const ranges = {} as Record<ElementSymbol, [number, number]>;
  for (const symbol of Object.keys(DEFAULT_ELEMENT_RANGES) as ElementSymbol[]) {
    const [min, max] = DEFAULT_ELEMENT_RANGES[symbol];
    ranges[symbol] = [min, max];
  }
  if (given !== undefined) {
    if (given === null || typeof given !== 'object')
      throw new TypeError('constraints.elements must be an object');
    for (const key of Object.keys(given)) {
      const field = `constraints.elements.${key}`;
      if (!isElementSymbol(key))
        throw new ChemError('UNKNOWN_ELEMENT', `Unknown element "${key}"`, { field });
      const range: unknown = given[key];
      if (range === undefined) continue;
      const ok =
        Array.isArray(range) &&
        range.length === 2 &&
        Number.isInteger(range[0]) &&
        Number.isInteger(range[1]) &&
        range[0] >= 0 &&
        range[0] <= range[1] &&
        range[1] <= 10_000;
      if (!ok)
        throw new ChemError('INVALID_ARGUMENT', `${field} must be [min, max] with integers 0 ≤ min ≤ max`, {
          field,
        });
      ranges[key] = [range[0] as number, range[1] as number];
    }
  }
  for (const symbol of Object.keys(ranges) as ElementSymbol[]) {
    const range = ranges[symbol];
    const byMass = Math.floor(nominalMassDa / elementNominalMass(symbol));
    range[1] = Math.min(range[1], elementCap(symbol, nominalMassDa), byMass);
  }
  return ranges;
}

function rulesPassed(c: CountsVector, agreement: number | null): GoldenRule[] {
  const rules: GoldenRule[] = ['element-caps', 'lewis-senior', 'nitrogen-rule', 'rdbe'];
  if (passesHcRatio(c)) rules.push('hc-ratio');
  if (heteroatomRatioFailures(c) === 0) rules.push('heteroatom-ratios');
  if (passesElementProbability(c)) rules.push('element-probability');
  if (agreement !== null && agreement >= ISOTOPE_PATTERN_MIN_AGREEMENT) rules.push('isotope-pattern');
  return rules;
}

/**
 * Candidate molecular formulas for a nominal molecular mass, best first.
 *
 * Enumerates C, H, N, O, S, Cl, Br, F, Si, P and I within the ranges (defaults
 * {@link DEFAULT_ELEMENT_RANGES}, further capped by the Seven Golden Rules element caps and by the
 * mass) and keeps formulas that can be closed-shell molecules: LEWIS/SENIOR valence checks, nitrogen
 * rule, RDBE a whole number ≥ 0 (Kind & Fiehn 2007 rules 1 and 2; SCIENCE.md §2). The soft rules
 * (H/C, heteroatom ratios, element probability) do not remove a formula — small molecules such as
 * CCl4 or CS2 break them — but lower its prior and are missing from `rulesPassed`.
 *
 * Ranking: with an observed cluster, by `−χ²/2 + prior` where χ² is the window statistic behind
 * `clusterAgreement` and the prior is a documented plausibility heuristic (suggest/formula-prior.ts:
 * H/C near typical, soft-rule failures, elements the cluster cannot show); without a cluster, by the
 * prior alone. Pruning, all safe or stated: ratios M+k / M only grow as atoms are added, so branches
 * already more than 5 noise widths above the observed ratios, or unable to reach them even with the
 * most of every element still to come, are skipped; so are branches whose best possible prior cannot
 * enter the list, and branches whose remaining mass no element range can fill.
 *
 * @param nominalMassDa - nominal mass of M (lightest isotopes), integer 1 … {@link MAX_SUGGEST_MASS_DA}
 * @param constraints - element ranges, observed cluster, number of results (not changed)
 * @returns up to `limit` suggestions (default 20), best first
 * @throws {RangeError} when `nominalMassDa` is not an integer in range, or `limit` not a positive integer ≤ 1000
 * @throws {ChemError} `UNKNOWN_ELEMENT` / `INVALID_ARGUMENT` with `field` for bad element ranges or cluster peaks
 * @example
 * suggestFormulas(84, { observedCluster: [{ mz: 84, relIntensity: 100 }, { mz: 86, relIntensity: 64 }, { mz: 88, relIntensity: 10 }] })[0].formula // 'CH2Cl2'
 */
export function suggestFormulas(
  nominalMassDa: number,
  constraints: SuggestFormulasConstraints = {},
): FormulaSuggestion[] {
  if (
    typeof nominalMassDa !== 'number' ||
    !Number.isInteger(nominalMassDa) ||
    nominalMassDa < 1 ||
    nominalMassDa > MAX_SUGGEST_MASS_DA
  ) {
    throw new RangeError(
      `nominalMassDa must be an integer from 1 to ${MAX_SUGGEST_MASS_DA}, got ${String(nominalMassDa)}`,
    );
  }
  const limit = constraints.limit ?? 20;
  if (!Number.isInteger(limit) || limit < 1 || limit > 1000) {
    throw new RangeError(`limit must be an integer from 1 to 1000, got ${String(limit)}`);
  }
  const ranges = validateRanges(nominalMassDa, constraints.elements);
  const observed =
    constraints.observedCluster === undefined
      ? null
      : clusterWindow(constraints.observedCluster, nominalMassDa, 'observedCluster');

  // Upper bounds on the ratios M+k / M that the observed cluster tolerates.
  const maxRatio = new Float64Array(WINDOW).fill(Infinity);
  if (observed !== null) {
    const o0 = observed[0] as number;
    const floor0 = o0 - PRUNE_SIGMAS * (AGREEMENT_NOISE.absolutePercent + AGREEMENT_NOISE.relative * o0);
    if (floor0 > 0) {
      for (let k = 1; k < WINDOW; k++) {
        const ok = observed[k] as number;
        maxRatio[k] =
          (ok + PRUNE_SIGMAS * (AGREEMENT_NOISE.absolutePercent + AGREEMENT_NOISE.relative * ok)) / floor0;
      }
    }
  }
  // Lower bounds on the same ratios (0 where the observed peak is within noise of nothing).
  const minRatio = new Float64Array(WINDOW);
  if (observed !== null) {
    const o0 = observed[0] as number;
    const ceiling0 = o0 + PRUNE_SIGMAS * (AGREEMENT_NOISE.absolutePercent + AGREEMENT_NOISE.relative * o0);
    for (let k = 1; k < WINDOW; k++) {
      const ok = observed[k] as number;
      minRatio[k] =
        Math.max(0, ok - PRUNE_SIGMAS * (AGREEMENT_NOISE.absolutePercent + AGREEMENT_NOISE.relative * ok)) /
        ceiling0;
    }
  }
  const bound = new Float64Array(WINDOW);
  const boundNext = new Float64Array(WINDOW);
  /** Whether even the most of every element still to come leaves some M+k / M below the observed range. */
  const cannotReach = (v: Float64Array, nextDepth: number, remainingDa: number): boolean => {
    bound.set(v);
    for (let d = nextDepth; d < REST.length; d++) {
      const symbol = REST[d] as ElementSymbol;
      const n = Math.min(ranges[symbol][1], Math.floor(remainingDa / (masses[symbol] as number)));
      if (n <= 0) continue;
      convolveWindow(bound, tables[symbol][n] as Float64Array, boundNext);
      bound.set(boundNext);
    }
    const b0 = bound[0] as number;
    for (let k = 1; k < WINDOW; k++) if ((bound[k] as number) < (minRatio[k] as number) * b0) return true;
    return false;
  };
  const tooHigh = (v: Float64Array): boolean => {
    const v0 = v[0] as number;
    for (let k = 1; k < WINDOW; k++) if ((v[k] as number) > (maxRatio[k] as number) * v0) return true;
    return false;
  };

  const tables = {} as Record<ElementSymbol, Float64Array[]>;
  for (const symbol of Object.keys(ranges) as ElementSymbol[]) {
    tables[symbol] = truncatedDistributions(symbol, Math.max(ranges[symbol][1], ranges[symbol][0]));
  }
  const masses = {} as Record<ElementSymbol, number>;
  for (const symbol of Object.keys(ranges) as ElementSymbol[]) masses[symbol] = elementNominalMass(symbol);
  // Most mass that the elements from REST[d] on can still supply: branches that leave more are dead.
  const maxFillDa = new Float64Array(REST.length + 1);
  for (let d = REST.length - 1; d >= 0; d--) {
    const symbol = REST[d] as ElementSymbol;
    maxFillDa[d] = (maxFillDa[d + 1] as number) + ranges[symbol][1] * (masses[symbol] as number);
  }

  const best: Candidate[] = [];
  const c: CountsVector = { C: 0, H: 0, N: 0, O: 0, S: 0, Cl: 0, Br: 0, F: 0, Si: 0, P: 0, I: 0 };
  const vectors = Array.from({ length: OUTER.length + 3 }, () => new Float64Array(WINDOW));
  (vectors[0] as Float64Array)[0] = 1;
  const theoretical = new Float64Array(WINDOW);
  const [cMinRange, cMaxRange] = ranges.C;
  const [hMinRange, hMaxRange] = ranges.H;

  const consider = (vector: Float64Array) => {
    const full = best.length >= limit;
    let chi2: number | null = null;
    let score = 0;
    if (observed !== null) {
      let max = 0;
      for (const v of vector) if (v > max) max = v;
      for (let k = 0; k < WINDOW; k++) theoretical[k] = ((vector[k] as number) / max) * 100;
      chi2 = chiSquareOf(theoretical, observed);
      score = -chi2 / 2;
      // The element terms bound the prior from above: skip the rest when even they cannot win a place.
      if (full && score + elementPriorOf(c) <= (best[best.length - 1] as Candidate).score) return;
    }
    const value = c.C + c.Si - (c.H + c.F + c.Cl + c.Br + c.I) / 2 + (c.N + c.P) / 2 + 1;
    score += priorOf(c, value);
    if (best.length >= limit && score <= (best[best.length - 1] as Candidate).score) return;
    let at = best.length;
    while (at > 0 && (best[at - 1] as Candidate).score < score) at--;
    best.splice(at, 0, { counts: { ...c }, chi2, score, rdbe: value });
    if (best.length > limit) best.pop();
  };

  const innermost = (remainingDa: number, depth: number) => {
    const hal = c.F + c.Cl + c.Br + c.I;
    if ((remainingDa + hal + c.N + c.P) % 2 !== 0) return; // H ≡ remainingDa (mod 2): valence sum would be odd
    const parent = vectors[depth] as Float64Array;
    const withC = vectors[depth + 1] as Float64Array;
    const withH = vectors[depth + 2] as Float64Array;
    const cLow = Math.max(
      cMinRange,
      Math.ceil((remainingDa - hMaxRange) / 12),
      Math.ceil((remainingDa + hal - 2 * c.Si - c.N - c.P - 2) / 14),
    );
    const cHigh = Math.min(cMaxRange, Math.floor((remainingDa - hMinRange) / 12));
    for (let carbon = cLow; carbon <= cHigh; carbon++) {
      c.C = carbon;
      c.H = remainingDa - 12 * carbon;
      if (!lewisSenior(c)) continue;
      if (observed !== null) {
        convolveWindow(parent, tables.C[carbon] as Float64Array, withC);
        if (tooHigh(withC)) break; // more carbon only raises M+k / M
        convolveWindow(withC, tables.H[c.H] as Float64Array, withH);
      }
      consider(withH);
    }
    c.C = 0;
    c.H = 0;
  };

  const outer = (depth: number, remainingDa: number) => {
    if (depth === OUTER.length) {
      innermost(remainingDa, depth);
      return;
    }
    const symbol = OUTER[depth] as keyof CountsVector & ElementSymbol;
    const [min, max] = ranges[symbol];
    const massDa = masses[symbol];
    const parent = vectors[depth] as Float64Array;
    const child = vectors[depth + 1] as Float64Array;
    for (let n = min; n <= max; n++) {
      const left = remainingDa - n * massDa;
      if (left < 0) break;
      if (left > (maxFillDa[depth + 1] as number)) continue; // more of this element may still fit it
      c[symbol] = n;
      // The prior's element terms bound every score below this branch and only fall as n grows.
      if (best.length >= limit && elementPriorOf(c) <= (best[best.length - 1] as Candidate).score) break;
      if (observed !== null) {
        convolveWindow(parent, tables[symbol][n] as Float64Array, child);
        if (tooHigh(child)) break; // more of this element only raises M+k / M
        if (cannotReach(child, depth + 1, left)) continue;
      }
      outer(depth + 1, left);
    }
    c[symbol] = 0;
  };

  outer(0, nominalMassDa);

  return best.map((candidate) => {
    const counts: Partial<Record<ElementSymbol, number>> = {};
    for (const symbol of ['C', 'H', 'Br', 'Cl', 'F', 'I', 'N', 'O', 'P', 'S', 'Si'] as (keyof CountsVector &
      ElementSymbol)[]) {
      if (candidate.counts[symbol] > 0) counts[symbol] = candidate.counts[symbol];
    }
    const frozen = Object.freeze(counts);
    const agreement = candidate.chi2 === null ? null : agreementFromChiSquare(candidate.chi2);
    return {
      formula: formatFormula(frozen),
      counts: frozen,
      nominalMass: nominalMassDa,
      monoisotopicMass: monoisotopicMass(frozen),
      rdbe: candidate.rdbe,
      agreement,
      rulesPassed: rulesPassed(candidate.counts, agreement),
    };
  });
}
