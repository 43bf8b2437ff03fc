import { ChemError } from '../errors/chem-error';
import type { ClusterPeak } from '../isotopes/isotope-cluster';

/**
 * Number of nominal-mass offsets compared by {@link clusterAgreement}: M, M+1 … M+8 — wide enough
 * for the whole cluster of four bromine or chlorine atoms.
 */
export const AGREEMENT_WINDOW = 9;

/**
 * Assumed noise of an observed cluster peak, in percentage points of the window's most intense
 * peak: `σ = ABSOLUTE + RELATIVE · (observed + theoretical) / 2`. A judgement for 70 eV EI spectra
 * on quadrupole instruments (common practice: isotope ratios good to a few per cent relative, plus
 * baseline noise of a few tenths of a per cent), not a published value.
 */
export const AGREEMENT_NOISE = Object.freeze({ absolutePercent: 0.5, relative: 0.05 });

/**
 * Intensities at M … M+8 on a 0–100 scale (most intense of the window = 100). Peaks are matched by
 * rounded m/z; peaks outside the window are ignored, absent offsets are 0.
 *
 * @throws {ChemError} `INVALID_ARGUMENT` (field `${field}[i].mz` / `.relIntensity`) for non-finite
 *   or negative values, or (field `${field}`) when no peak of the window has intensity above 0
 */
export function clusterWindow(
  peaks: readonly ClusterPeak[],
  monoisotopicMz: number,
  field: string,
): Float64Array {
  if (!Array.isArray(peaks)) throw new TypeError(`${field} must be an array of { mz, relIntensity }`);
  const window = new Float64Array(AGREEMENT_WINDOW);
  peaks.forEach((peak, i) => {
    const mz: unknown = peak?.mz;
    const relIntensity: unknown = peak?.relIntensity;
    if (typeof mz !== 'number' || !Number.isFinite(mz) || mz <= 0) {
      throw new ChemError('INVALID_ARGUMENT', `${field}[${i}].mz must be a positive finite number`, {
        field: `${field}[${i}].mz`,
      });
    }
    if (typeof relIntensity !== 'number' || !Number.isFinite(relIntensity) || relIntensity < 0) {
      throw new ChemError('INVALID_ARGUMENT', `${field}[${i}].relIntensity must be a finite number ≥ 0`, {
        field: `${field}[${i}].relIntensity`,
      });
    }
    const k = Math.round(mz) - monoisotopicMz;
    if (k >= 0 && k < AGREEMENT_WINDOW) window[k] = (window[k] as number) + relIntensity;
  });
  return scaleToHundred(window, field);
}

/** Scales a window in place so its maximum is 100; throws when all of it is 0. */
export function scaleToHundred(window: Float64Array, field: string): Float64Array {
  let max = 0;
  for (const v of window) if (v > max) max = v;
  if (!(max > 0)) {
    throw new ChemError(
      'INVALID_ARGUMENT',
      `${field} has no peak with intensity above 0 at M … M+${AGREEMENT_WINDOW - 1}`,
      {
        field,
      },
    );
  }
  for (let k = 0; k < window.length; k++) window[k] = ((window[k] as number) / max) * 100;
  return window;
}

/** χ² of two 0–100 windows under the {@link AGREEMENT_NOISE} model. */
export function windowChiSquare(theoretical: Float64Array, observed: Float64Array): number {
  let chi2 = 0;
  for (let k = 0; k < AGREEMENT_WINDOW; k++) {
    const t = theoretical[k] as number;
    const o = observed[k] as number;
    const sigma = AGREEMENT_NOISE.absolutePercent + (AGREEMENT_NOISE.relative * (t + o)) / 2;
    chi2 += ((o - t) / sigma) ** 2;
  }
  return chi2;
}

/** Agreement 0–1 from a window χ²: the per-peak geometric mean of the Gaussian likelihoods. */
export function agreementFromChiSquare(chi2: number): number {
  return Math.exp(-chi2 / (2 * AGREEMENT_WINDOW));
}

/**
 * Agreement (0–1) between a theoretical and an observed isotope cluster of the same molecular ion.
 *
 * Both clusters are cut to M … M+8 (M = `monoisotopicMz`, peaks matched by rounded m/z) and scaled
 * so each window's most intense peak is 100. Each offset k contributes
 * `((observed − theoretical) / σ)²` with `σ = 0.5 + 0.05 · (observed + theoretical)/2` percentage
 * points ({@link AGREEMENT_NOISE}); with χ² their sum over the 9 offsets,
 * `agreement = exp(−χ² / (2 · 9))` — 1 for identical clusters, about 0.6 when every peak is one
 * noise width off, near 0 for a wrong chlorine or bromine count.
 *
 * @param theoretical - e.g. from `isotopeCluster(formula)`
 * @param observed - the cluster read from a spectrum, any intensity scale
 * @param monoisotopicMz - nominal m/z of M (the lightest-isotope peak)
 * @throws {ChemError} `INVALID_ARGUMENT` naming the field for bad peaks or an empty window
 * @throws {RangeError} when `monoisotopicMz` is not a positive integer
 * @example
 * const observed = [{ mz: 84, relIntensity: 100 }, { mz: 85, relIntensity: 1.1 }, { mz: 86, relIntensity: 64 }, { mz: 88, relIntensity: 10 }];
 * clusterAgreement(isotopeCluster('CH2Cl2'), observed, 84) // ≈ 0.90 (M+3 and M+5 missing, M+4 a little low)
 * clusterAgreement(isotopeCluster('CH2Cl2'), observed.slice(0, 3), 84) // ≈ 0.00003 (no M+4)
 */
export function clusterAgreement(
  theoretical: readonly ClusterPeak[],
  observed: readonly ClusterPeak[],
  monoisotopicMz: number,
): number {
  if (!Number.isInteger(monoisotopicMz) || monoisotopicMz <= 0) {
    throw new RangeError(`monoisotopicMz must be a positive integer, got ${String(monoisotopicMz)}`);
  }
  const t = clusterWindow(theoretical, monoisotopicMz, 'theoretical');
  const o = clusterWindow(observed, monoisotopicMz, 'observed');
  return agreementFromChiSquare(windowChiSquare(t, o));
}
