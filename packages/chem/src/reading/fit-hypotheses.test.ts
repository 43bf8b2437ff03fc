import { describe, expect, it } from 'vitest';
import { seededRandom } from '../isotopes/seeded-random';
import { simulatedSpectrum } from '../search-index/synthetic-library';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import type { Peak } from '../types';
import { clusterPattern } from './cluster-model';
import { fitPattern, LEAD_DA, type NoiseModel } from './fit-cluster';
import { acceptable, fitHypothesesAt, type HypothesisFit } from './fit-hypotheses';
import { readMolecularIon } from './read-molecular-ion';
import { simulateSpectra } from './simulated-spectra';

// Spectra are simulated (simulated-spectra.ts: clusters from the isotope table of SCIENCE.md §1,
// fragments and noise invented), plus random fragment lists with no cluster at all.
const NOISE: NoiseModel = { relative: 0.05, absolute: 0.1 };

function spectra(): Peak[][] {
  const random = seededRandom(404);
  const fragmentsOnly = Array.from({ length: 60 }, () => simulatedSpectrum(random, { minMz: 26, maxMz: 60 + Math.floor(random() * 300), peakCount: 30 }));
  return [...simulateSpectra(20260917, 140).map((c) => c.peaks), ...fragmentsOnly];
}

/** The reading's candidates M of a spectrum: significant peaks within 14 Da below the highest. */
function candidates(peaks: Peak[]) {
  const spectrum = normalizeSpectrum(peaks);
  const intensity = new Map(spectrum.map(([mz, value]) => [mz, value]));
  const smallest = spectrum.reduce((min, [, value]) => Math.min(min, value), 100);
  const noise: NoiseModel = { ...NOISE, detectionLimit: Math.min(3, smallest) };
  const significant = spectrum.filter(([, value]) => value >= 0.5);
  const top = (significant[significant.length - 1] as Peak)[0];
  return { intensity, noise, top, ms: significant.map(([mz]) => mz).filter((mz) => mz >= top - 14) };
}

describe('fitHypothesesAt', () => {
  it('when the observed cluster is a pattern scaled by 50, fits scale 50 with χ² near 0 and no shifted share to 1e-9', () => {
    const pattern = clusterPattern({ chlorine: 2, bromine: 0, sulfur: 0, silicon: 0 }, 6);
    const observed = new Float64Array(LEAD_DA + 8);
    for (let k = 0; k < 8; k += 1) observed[LEAD_DA + k] = 50 * (pattern[k] ?? 0);
    const fit = fitPattern(observed, pattern, NOISE);
    expect(fit.scale).toBeCloseTo(50, 6);
    expect(fit.chiSquare).toBeLessThan(1e-9);
    expect(fit.shiftedScales[0]).toBeLessThan(1e-9);
    expect(fit.shiftedScales[1]).toBeLessThan(1e-9);
  });

  it('keeping fits within Δχ² 4 or 9 of the best gives the first part of the whole list, fit for fit, at every candidate M of 200 spectra', () => {
    let lists = 0;
    let dropped = 0;
    for (const peaks of spectra()) {
      const { intensity, noise, top, ms } = candidates(peaks);
      for (const m of ms) {
        const all = fitHypothesesAt(intensity, m, top + 2, noise);
        for (const within of [4, 9]) {
          const kept = fitHypothesesAt(intensity, m, top + 2, noise, within);
          const best = all[0] as HypothesisFit;
          expect(kept).toEqual(all.slice(0, kept.length));
          expect(kept.length).toBe(all.filter((f) => f.score - best.score <= within).length);
          dropped += all.length - kept.length;
        }
        lists += 1;
      }
    }
    expect(lists).toBeGreaterThan(500);
    expect(dropped).toBeGreaterThan(0);
  });

  it('does not mutate its input', () => {
    const intensity = new Map([[84, 60], [86, 38], [88, 6]]);
    const copy = new Map(intensity);
    fitHypothesesAt(intensity, 84, 90, NOISE, 4);
    expect(intensity).toEqual(copy);
  });
});

describe('readMolecularIon skipping the candidates above M', () => {
  it('reads the same M, hypothesis and carbon as when every candidate is fitted in full, over 200 spectra', () => {
    let skipped = 0;
    for (const peaks of spectra()) {
      const { intensity, noise, top, ms } = candidates(peaks);
      // Every candidate fitted with its whole list, then the reading's rule: the lowest plausible
      // candidate with an acceptable best fit, else the best by χ² per point.
      const lists = ms.map((m) => fitHypothesesAt(intensity, m, top + 2, noise)).filter((fits) => fits.length > 0);
      const first = (fits: HypothesisFit[]) => fits[0] as HypothesisFit;
      const plausible = (fits: HypothesisFit[]) => first(fits).fit.scale >= 0.3 * first(fits).fit.shiftedScales[1];
      const perPoint = (fits: HypothesisFit[]) => first(fits).fit.chiSquare / first(fits).fit.points;
      const byPerPoint = (a: HypothesisFit[], b: HypothesisFit[]) => perPoint(a) - perPoint(b);
      const chosen =
        lists.find((fits) => plausible(fits) && acceptable(first(fits).fit)) ??
        [...lists].filter(plausible).sort(byPerPoint)[0] ??
        ([...lists].sort(byPerPoint)[0] as HypothesisFit[]);
      skipped += lists.length - 1 - lists.indexOf(chosen);
      const best = first(chosen);
      const reading = readMolecularIon(peaks, { suggestLimit: 0 });
      expect(reading.clusterStartMz).toBe(best.m);
      expect([reading.chlorine, reading.bromine, reading.sulfurLikely, reading.siliconLikely]).toEqual([
        best.h.chlorine,
        best.h.bromine,
        best.h.sulfur > 0,
        best.h.silicon > 0,
      ]);
      const fitLine = reading.evidence.find((e) => e.label === 'Cluster fit')?.value ?? '';
      expect(fitLine).toContain(`with C${best.carbon}: χ² ${best.fit.chiSquare.toFixed(1)} over ${best.fit.points} m/z`);
    }
    expect(skipped).toBeGreaterThan(0);
  });
});
