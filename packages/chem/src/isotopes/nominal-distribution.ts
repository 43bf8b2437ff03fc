import { ELEMENTS, type ElementSymbol } from '../elements/elements';

/**
 * A probability distribution over nominal-mass offsets: `values[k]` is the probability of the
 * offset `start + k` Da above the lightest-isotope (monoisotopic) nominal mass.
 */
export interface NominalDistribution {
  readonly start: number;
  readonly values: Float64Array;
}

/** Relative pruning threshold: entries at either end below this fraction of the maximum are dropped. */
const PRUNE_RELATIVE = 1e-14;

const UNIT: NominalDistribution = { start: 0, values: Float64Array.of(1) };

function prune(start: number, values: Float64Array): NominalDistribution {
  let max = 0;
  for (const v of values) if (v > max) max = v;
  const floor = max * PRUNE_RELATIVE;
  let lo = 0;
  let hi = values.length - 1;
  while (lo < hi && (values[lo] as number) < floor) lo++;
  while (hi > lo && (values[hi] as number) < floor) hi--;
  return { start: start + lo, values: values.slice(lo, hi + 1) };
}

/**
 * Convolution of two nominal distributions (the distribution of the sum of the offsets), with both
 * tails pruned below 1e-14 of the maximum.
 *
 * @example
 * convolve(elementDistribution('Cl', 1), elementDistribution('Br', 1)).values // ClBr: M, M+1 (0), M+2, M+3 (0), M+4
 */
export function convolve(a: NominalDistribution, b: NominalDistribution): NominalDistribution {
  const out = new Float64Array(a.values.length + b.values.length - 1);
  for (let i = 0; i < a.values.length; i++) {
    const ai = a.values[i] as number;
    if (ai === 0) continue;
    for (let j = 0; j < b.values.length; j++)
      out[i + j] = (out[i + j] as number) + ai * (b.values[j] as number);
  }
  return prune(a.start + b.start, out);
}

function singleAtom(symbol: ElementSymbol): NominalDistribution {
  const isotopes = ELEMENTS[symbol].isotopes;
  const lightest = isotopes[0]?.massNumber ?? 0;
  const span = (isotopes[isotopes.length - 1]?.massNumber ?? lightest) - lightest;
  const values = new Float64Array(span + 1);
  for (const isotope of isotopes) values[isotope.massNumber - lightest] = isotope.abundance;
  return { start: 0, values };
}

const SINGLE = new Map<ElementSymbol, NominalDistribution>();

/**
 * Nominal-mass isotope distribution of `count` atoms of one element (exact multinomial, summed by
 * nominal mass, computed by repeated squaring with pruning of negligible tails). Probabilities sum
 * to 1 (less the pruned tails); `count` must be a non-negative integer (0 gives the unit distribution).
 *
 * @example
 * elementDistribution('Cl', 2).values // Float64Array [0.5740, 0, 0.3673, 0, 0.0588] (≈)
 */
export function elementDistribution(symbol: ElementSymbol, count: number): NominalDistribution {
  let base = SINGLE.get(symbol);
  if (base === undefined) {
    base = singleAtom(symbol);
    SINGLE.set(symbol, base);
  }
  let result = UNIT;
  let power = base;
  let n = count;
  while (n > 0) {
    if (n & 1) result = convolve(result, power);
    n = Math.floor(n / 2);
    if (n > 0) power = convolve(power, power);
  }
  return result;
}
