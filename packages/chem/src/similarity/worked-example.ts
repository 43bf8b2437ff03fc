import type { PeakList } from '../types';

/**
 * The worked check of SCIENCE.md §3 ([computed] there from the published formulas): spectra A and B
 * with their expected scores, shared by the similarity tests.
 */
export const WORKED_EXAMPLE = {
  a: [[15, 10], [43, 100], [58, 25]] as PeakList,
  b: [[42, 5], [43, 100], [58, 30]] as PeakList,
  cosine: 0.99311,
  weightedDotProduct: 0.98728,
  entropyUnweighted: 0.94323,
  entropyWeighted: 0.8276,
};
