import { acceptable, fitHypothesesAt, type HypothesisFit } from '../reading/fit-hypotheses';
import type { NoiseModel } from '../reading/fit-cluster';
import type { CheckContext } from './check-context';
import type { CheckResult } from './check-result';

/** Noise model of the fragment-cluster fits: the molecular-ion check's defaults. */
const NOISE: NoiseModel = { relative: 0.05, absolute: 0.1 };
/** Fragment clusters weaker than this (% of base) are not judged. */
const MIN_REL_INTENSITY = 3;
/** How much better (Δχ²) the over-halogenated fit must be than every allowed one. */
const DECISIVE_DELTA = 9;

function clusterEnd(c: CheckContext, start: number, limit: number): number {
  let end = start;
  let empty = 0;
  for (let mz = start + 1; mz <= limit; mz += 1) {
    if ((c.intensity.get(mz) ?? 0) >= 0.5) {
      end = mz;
      empty = 0;
    } else if (++empty >= 2) break;
  }
  return end;
}

/**
 * Fragment clusters that need more Cl or Br than the molecule has: each fragment cluster start
 * below M is fitted like the molecular ion (isotope table, SCIENCE.md §1); it fails when the best
 * fit has more Cl or Br than the formula and every fit within the formula's counts is worse by
 * Δχ² > 9.
 */
export function checkFragmentHalogens(c: CheckContext): CheckResult {
  const chlorine = c.counts.Cl ?? 0;
  const bromine = c.counts.Br ?? 0;
  const base = { id: 'impossible-fragment', title: 'Fragments vs formula halogens' };
  const limit = c.molecularMassDa - 4;
  for (const [mz, value] of c.spectrum) {
    if (mz > limit || value < MIN_REL_INTENSITY) continue;
    if ((c.intensity.get(mz - 1) ?? 0) >= 0.5 * value) continue; // not the light end of a cluster
    const end = clusterEnd(c, mz, limit + 3);
    if (end < mz + 2) continue;
    // An allowed fit more than DECISIVE_DELTA behind the best decides the same as none, so only
    // the fits within it are kept.
    const fits = fitHypothesesAt(c.intensity, mz, end + 1, NOISE, DECISIVE_DELTA);
    const best = fits[0] as HypothesisFit | undefined;
    if (!best || !acceptable(best.fit) || (best.h.chlorine <= chlorine && best.h.bromine <= bromine)) continue;
    const allowed = fits.find((f) => f.h.chlorine <= chlorine && f.h.bromine <= bromine);
    if (allowed && allowed.score - best.score <= DECISIVE_DELTA) continue;
    const ratio = (((c.intensity.get(mz + 2) ?? 0) / value) * 100).toFixed(1);
    return {
      ...base,
      status: 'fail',
      numbers: { fragmentMz: mz, m2OverM: ratio, fragmentChlorine: best.h.chlorine, fragmentBromine: best.h.bromine, formulaChlorine: chlorine, formulaBromine: bromine },
      reason: `The cluster at m/z ${mz} (M+2/M ${ratio} %) fits Cl${best.h.chlorine} Br${best.h.bromine}, more than ${c.formula} has (Cl${chlorine} Br${bromine}).`,
    };
  }
  return { ...base, status: 'pass', numbers: { formulaChlorine: chlorine, formulaBromine: bromine }, reason: `No fragment cluster needs more Cl or Br than ${c.formula} has.` };
}
