import { ChemError } from '../errors/chem-error';
import type { ElementCounts, ElementSymbol } from '../elements/elements';
import { nominalMass } from '../formula/nominal-mass';
import { toElementCounts } from '../formula/to-element-counts';
import { convolve, elementDistribution, type NominalDistribution } from './nominal-distribution';

/** One peak of a nominal-mass isotope cluster: integer m/z (charge 1) and intensity, most intense = 100. */
export interface ClusterPeak {
  mz: number;
  relIntensity: number;
}

/** Options of {@link isotopeCluster}. */
export interface IsotopeClusterOptions {
  /** Peaks below this relative intensity (most intense = 100) are left out. Default 0.01. */
  minRelIntensity?: number;
}

/**
 * Nominal-mass isotope cluster of a formula: M, M+1, M+2 … where M is the nominal mass of the
 * lightest isotopes ({@link nominalMass}). Computed by exact convolution of the isotope table of
 * SCIENCE.md §1 (fine structure summed by nominal mass; tails below 1e-14 of the maximum pruned).
 * For bromine compounds the most intense peak may be M+2 or higher. Electron mass is ignored
 * (nominal resolution).
 *
 * @param formula - formula text or counts (not changed)
 * @param options - `minRelIntensity` (default 0.01, on the 0–100 scale)
 * @returns peaks sorted by m/z, the most intense at 100
 * @throws {ChemError} for bad formula text or counts, `INVALID_ARGUMENT` for a formula without atoms
 * @throws {RangeError} when `minRelIntensity` is not a finite number from 0 to 100
 * @example
 * isotopeCluster('Cl2') // [{ mz: 70, relIntensity: 100 }, { mz: 72, relIntensity: 63.99… }, { mz: 74, relIntensity: 10.24… }]
 */
export function isotopeCluster(
  formula: string | ElementCounts,
  options: IsotopeClusterOptions = {},
): ClusterPeak[] {
  const minRelIntensity = options.minRelIntensity ?? 0.01;
  if (
    typeof minRelIntensity !== 'number' ||
    !Number.isFinite(minRelIntensity) ||
    minRelIntensity < 0 ||
    minRelIntensity > 100
  ) {
    throw new RangeError(`minRelIntensity must be a number from 0 to 100, got ${String(minRelIntensity)}`);
  }
  const counts = toElementCounts(formula);
  const symbols = Object.keys(counts) as ElementSymbol[];
  if (symbols.length === 0) {
    throw new ChemError('INVALID_ARGUMENT', 'Formula has no atoms', { field: 'formula' });
  }
  let distribution: NominalDistribution | undefined;
  for (const symbol of symbols) {
    const part = elementDistribution(symbol, counts[symbol] ?? 0);
    distribution = distribution === undefined ? part : convolve(distribution, part);
  }
  const { start, values } = distribution as NominalDistribution;
  let max = 0;
  for (const v of values) if (v > max) max = v;
  const baseMz = nominalMass(counts) + start;
  const peaks: ClusterPeak[] = [];
  for (let k = 0; k < values.length; k++) {
    const relIntensity = ((values[k] as number) / max) * 100;
    if (relIntensity >= minRelIntensity && relIntensity > 0) peaks.push({ mz: baseMz + k, relIntensity });
  }
  return peaks;
}
