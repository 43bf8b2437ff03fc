import { seededRandom } from '../isotopes/seeded-random';
import type { Peak, PeakList } from '../types';

/** Shape of simulated spectra made by {@link simulatedSpectrum}. */
export interface SimulatedSpectrumOptions {
  /** Lowest m/z, default 30. */
  minMz?: number;
  /** Highest m/z, default 600. */
  maxMz?: number;
  /** Mean number of peaks, default 50 (actual count varies ±10). */
  peakCount?: number;
}

/**
 * One simulated EI-like spectrum (invented data, not a real compound): distinct integer m/z between
 * minMz and a random upper end, intensities heavy-tailed (many small peaks, few large), one base peak.
 * @example
 * simulatedSpectrum(seededRandom(1)); // [[31, 2.4], [44, 100], ...]
 */
export function simulatedSpectrum(random: () => number, options: SimulatedSpectrumOptions = {}): Peak[] {
  const { minMz = 30, maxMz = 600, peakCount = 50 } = options;
  const upperMz = Math.round(minMz + (maxMz - minMz) * (0.3 + 0.7 * random()));
  const span = upperMz - minMz + 1;
  const count = Math.min(span, Math.max(1, Math.round(peakCount - 10 + 20 * random())));
  const used = new Set<number>();
  const peaks: Peak[] = [];
  while (peaks.length < count) {
    // Favour lower m/z, as EI fragment ions do.
    const mz = minMz + Math.floor(span * Math.pow(random(), 1.4));
    if (used.has(mz)) continue;
    used.add(mz);
    peaks.push([mz, Math.max(0.05, 100 * Math.pow(random(), 4))]);
  }
  const base = peaks[Math.floor(random() * peaks.length)] as Peak;
  peaks[peaks.indexOf(base)] = [base[0], 100];
  return peaks.sort((a, b) => a[0] - b[0]);
}

/**
 * A simulated replicate of a spectrum, as a second run of the same compound might give: each intensity
 * multiplied by a random factor within ±noise, about `dropFraction` of the peaks lost and a few small
 * extra peaks added.
 * @example
 * simulatedReplicate(spectrum, seededRandom(7));
 */
export function simulatedReplicate(
  spectrum: PeakList,
  random: () => number,
  options: { noise?: number; dropFraction?: number; extraPeaks?: number; maxMz?: number } = {},
): Peak[] {
  const { noise = 0.2, dropFraction = 0.1, extraPeaks = 3, maxMz = 600 } = options;
  const out = new Map<number, number>();
  for (const [mz, intensity] of spectrum) {
    if (random() < dropFraction && intensity < 100) continue;
    out.set(mz, intensity * (1 - noise + 2 * noise * random()));
  }
  for (let i = 0; i < extraPeaks; i++) {
    const mz = 30 + Math.floor(random() * (maxMz - 29));
    if (!out.has(mz)) out.set(mz, 0.1 + 3 * random());
  }
  return [...out.entries()].sort((a, b) => a[0] - b[0]);
}

/**
 * Simulated library spectra one at a time: `count` spectra, some in families (a parent and perturbed
 * relatives, so that near neighbours exist, as for homologues), the rest independent. The same seed
 * gives the same spectra as {@link simulatedLibrary}.
 * @example
 * for (const peaks of simulatedSpectra(1000, 42)) index.add(id++, peaks);
 */
export function* simulatedSpectra(count: number, seed: number, options: SimulatedSpectrumOptions = {}): Generator<Peak[]> {
  const random = seededRandom(seed);
  let made = 0;
  while (made < count) {
    const parent = simulatedSpectrum(random, options);
    yield parent;
    made++;
    const relatives = random() < 0.3 ? 1 + Math.floor(random() * 4) : 0;
    for (let i = 0; i < relatives && made < count; i++) {
      yield simulatedReplicate(parent, random, { noise: 0.4, dropFraction: 0.2, extraPeaks: 5, maxMz: options.maxMz });
      made++;
    }
  }
}

/**
 * A simulated library as an array: the spectra of {@link simulatedSpectra}.
 * @example
 * simulatedLibrary(1000, 42).length; // 1000
 */
export function simulatedLibrary(count: number, seed: number, options: SimulatedSpectrumOptions = {}): Peak[][] {
  return [...simulatedSpectra(count, seed, options)];
}
