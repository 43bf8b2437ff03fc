import { nitrogenRuleHolds } from '../formula/nitrogen-rule';
import type { CheckContext } from './check-context';
import { round1, type CheckResult } from './check-result';

/** Tolerance of the cluster comparison: 10 % of the theoretical value plus 2 points (0–100 scale). */
export const CLUSTER_TOLERANCE = Object.freeze({ relative: 0.1, absolutePoints: 2 });

/** The formula's nominal mass against the lowest m/z of the highest cluster the molecular-ion check found. */
export function checkMolecularIonMass(c: CheckContext): CheckResult {
  const m = c.molecularMassDa;
  const found = c.reading.clusterStartMz;
  const atM = c.intensity.get(m) ?? 0;
  const numbers = { formulaMassDa: m, clusterStartMz: found, relIntensityAtM: round1(atM) };
  const base = { id: 'molecular-ion-mass', title: 'Formula mass vs cluster', numbers };
  if (found === m && !c.reading.likelyAbsent) {
    return { ...base, status: 'pass', reason: `The highest cluster starts at m/z ${found}, the nominal mass of ${c.formula}.` };
  }
  if (found > m) {
    return { ...base, status: 'fail', reason: `The highest cluster starts at m/z ${found}, above ${c.formula} (M = ${m}): the formula or the peaks are wrong.` };
  }
  if (atM > 0) {
    return { ...base, status: 'warn', reason: `m/z ${m} (M of ${c.formula}) is only ${round1(atM)} % of the base peak and is not read as the molecular ion (cluster found at m/z ${found}).` };
  }
  return { ...base, status: 'warn', reason: `No peak at m/z ${m} (M of ${c.formula}); the highest cluster starts at m/z ${found}: M may be absent.` };
}

/** Observed cluster from M against the formula's theoretical cluster, both scaled to its most intense peak. */
export function checkIsotopeCluster(c: CheckContext): CheckResult {
  const top = c.theoretical.reduce((a, b) => (b.relIntensity > a.relIntensity ? b : a));
  const observedTop = c.intensity.get(top.mz) ?? 0;
  const tolerance = `±(${CLUSTER_TOLERANCE.relative * 100} % + ${CLUSTER_TOLERANCE.absolutePoints} points)`;
  const base = { id: 'isotope-cluster', title: 'Observed vs theoretical cluster' };
  if (observedTop <= 0) {
    return { ...base, status: 'warn', reason: `No peak at m/z ${top.mz}, the most intense m/z of the theoretical cluster: nothing to compare.`, numbers: { theoreticalTopMz: top.mz, tolerance } };
  }
  let worst = { mz: top.mz, observed: 100, theoretical: 100, excess: 0 };
  for (const peak of c.theoretical) {
    if (peak.relIntensity < 1) continue;
    const observed = ((c.intensity.get(peak.mz) ?? 0) / observedTop) * 100;
    const allowed = CLUSTER_TOLERANCE.relative * peak.relIntensity + CLUSTER_TOLERANCE.absolutePoints;
    const excess = Math.abs(observed - peak.relIntensity) / allowed;
    if (excess > worst.excess) worst = { mz: peak.mz, observed, theoretical: peak.relIntensity, excess };
  }
  const numbers = { worstMz: worst.mz, observed: round1(worst.observed), theoretical: round1(worst.theoretical), tolerance, deviationInTolerances: round1(worst.excess) };
  const detail = `m/z ${worst.mz}: observed ${round1(worst.observed)} vs theoretical ${round1(worst.theoretical)} (tolerance ${tolerance})`;
  if (worst.excess <= 1) return { ...base, status: 'pass', reason: `Cluster agrees with ${c.formula}; largest difference at ${detail}.`, numbers };
  if (worst.excess <= 2) return { ...base, status: 'warn', reason: `Cluster differs slightly from ${c.formula} at ${detail}.`, numbers };
  return { ...base, status: 'fail', reason: `Cluster does not match ${c.formula} at ${detail}.`, numbers };
}

/** Nitrogen rule on the formula (SCIENCE.md §2), and the observed M's parity against it. */
export function checkNitrogenParity(c: CheckContext): CheckResult {
  const nitrogen = c.counts.N ?? 0;
  const m = c.molecularMassDa;
  const numbers = { nitrogen, formulaMassDa: m, clusterStartMz: c.reading.clusterStartMz };
  const base = { id: 'nitrogen-rule', title: 'Nitrogen parity', numbers };
  if (!nitrogenRuleHolds(c.counts)) {
    return { ...base, status: 'fail', reason: `${c.formula} has ${nitrogen} N but nominal mass ${m} is ${m % 2 ? 'odd' : 'even'}: the nitrogen rule fails (a radical or a wrong H count?).` };
  }
  const observedM = c.reading.molecularIonMz;
  if (observedM !== null && observedM % 2 !== m % 2) {
    return { ...base, status: 'warn', reason: `The spectrum's M (m/z ${observedM}) has the other parity than ${c.formula} (M = ${m}, ${nitrogen} N).` };
  }
  return { ...base, status: 'pass', reason: `${c.formula}: ${nitrogen} N and nominal mass ${m} obey the nitrogen rule.` };
}

/** Peaks above the formula's M that its isotope cluster cannot explain. */
export function checkPeaksAboveMolecularIon(c: CheckContext): CheckResult {
  const m = c.molecularMassDa;
  const atM = c.intensity.get(m) ?? 0;
  const theoreticalM = c.theoretical.find((p) => p.mz === m)?.relIntensity ?? 100;
  const expected = new Map(c.theoretical.map((p) => [p.mz, (p.relIntensity / theoreticalM) * atM]));
  const unexplained = c.spectrum.filter(([mz, value]) => {
    if (mz <= m || value < 0.5) return false;
    const allowed = (expected.get(mz) ?? 0) * (1 + CLUSTER_TOLERANCE.relative) + 0.5;
    return value > allowed;
  });
  const strongest = unexplained.reduce<readonly [number, number] | null>((a, b) => (a === null || b[1] > a[1] ? b : a), null);
  const numbers: Record<string, number | string> = { formulaMassDa: m, unexplainedPeaks: unexplained.length };
  const base = { id: 'peaks-above-molecular-ion', title: 'Peaks above the molecular ion' };
  if (!strongest) return { ...base, status: 'pass', numbers, reason: `No peak above m/z ${m} beyond what the isotopes of ${c.formula} explain.` };
  numbers['strongestMz'] = strongest[0];
  numbers['strongestRelIntensity'] = round1(strongest[1]);
  const list = unexplained.slice(0, 5).map(([mz]) => mz).join(', ');
  const status = strongest[1] >= 5 ? 'fail' : 'warn';
  return { ...base, status, numbers, reason: `${unexplained.length} peak(s) above M = ${m} that isotopes cannot explain (m/z ${list}${unexplained.length > 5 ? ' …' : ''}; strongest m/z ${strongest[0]} at ${round1(strongest[1])} %).` };
}
