import type { CheckContext } from './check-context';
import { round1, type CheckResult } from './check-result';

/** Fewest peaks for a usable EI reference spectrum: below 2 fails, below 5 warns (common practice, our thresholds). */
export const PEAK_COUNT_LIMITS = Object.freeze({ fail: 2, warn: 5 });

/** Air, water, argon, CO2 and siloxane column-bleed ions (SCIENCE.md §6, common practice). */
export const BACKGROUND_IONS: readonly { mz: number; source: string }[] = Object.freeze([
  { mz: 18, source: 'water' },
  { mz: 28, source: 'N2 (air)' },
  { mz: 32, source: 'O2 (air)' },
  { mz: 40, source: 'argon (air)' },
  { mz: 44, source: 'CO2' },
  { mz: 207, source: 'column bleed (siloxane)' },
  { mz: 281, source: 'column bleed (siloxane)' },
]);

/** Background ions below this % of the base peak are ignored. */
export const BACKGROUND_MIN_REL_INTENSITY = 1;

/** Too few peaks. */
export function checkPeakCount(c: CheckContext): CheckResult {
  const count = c.spectrum.length;
  const base = { id: 'peak-count', title: 'Number of peaks', numbers: { peaks: count, warnBelow: PEAK_COUNT_LIMITS.warn } };
  if (count < PEAK_COUNT_LIMITS.fail) return { ...base, status: 'fail', reason: `Only ${count} peak: an EI spectrum has fragments.` };
  if (count < PEAK_COUNT_LIMITS.warn) return { ...base, status: 'warn', reason: `Only ${count} peaks (fewer than ${PEAK_COUNT_LIMITS.warn}): check that the list is complete.` };
  return { ...base, status: 'pass', reason: `${count} peaks.` };
}

/**
 * Flat-topped (clipped, detector-saturated) base peak: several peaks at 100 %, or a neighbour one
 * m/z away nearly as intense as the base peak, which a 13C isotope peak cannot be below ~90 carbons
 * (1.08 %/C, SCIENCE.md §1).
 */
export function checkClippedBasePeak(c: CheckContext): CheckResult {
  const atTop = c.spectrum.filter(([, value]) => value >= 99.5);
  const [baseMz] = atTop[0] ?? [0];
  const neighbours = [baseMz - 1, baseMz + 1].map((mz) => [mz, c.intensity.get(mz) ?? 0] as const);
  const close = neighbours.find(([, value]) => value >= 97 && value < 99.5);
  const numbers: Record<string, number | string> = { baseMz, peaksAt100: atTop.length };
  const base = { id: 'clipped-base-peak', title: 'Flat-topped base peak' };
  if (atTop.length >= 2) {
    return { ...base, status: 'warn', numbers, reason: `${atTop.length} peaks at 100 % (m/z ${atTop.map(([mz]) => mz).join(', ')}): the detector may have saturated.` };
  }
  if (close) {
    numbers['neighbourMz'] = close[0];
    numbers['neighbourRelIntensity'] = round1(close[1]);
    return { ...base, status: 'warn', numbers, reason: `m/z ${close[0]} is ${round1(close[1])} % next to the base peak m/z ${baseMz}: implausible for an isotope neighbour, the base peak may be clipped.` };
  }
  return { ...base, status: 'pass', numbers, reason: `One base peak (m/z ${baseMz}) with ordinary neighbours.` };
}

/** Air, water and column-bleed ions in the spectrum (skipping the formula's own M). */
export function checkBackgroundIons(c: CheckContext): CheckResult {
  const found = BACKGROUND_IONS.filter(({ mz }) => mz !== c.molecularMassDa && (c.intensity.get(mz) ?? 0) >= BACKGROUND_MIN_REL_INTENSITY);
  const numbers: Record<string, number | string> = { minRelIntensity: BACKGROUND_MIN_REL_INTENSITY };
  for (const { mz } of found) numbers[`mz${mz}`] = round1(c.intensity.get(mz) ?? 0);
  const base = { id: 'background-ions', title: 'Air, water and column-bleed ions' };
  if (found.length === 0) return { ...base, status: 'pass', numbers, reason: 'No air, water or column-bleed ions (m/z 18, 28, 32, 40, 44, 207, 281) at 1 % or more.' };
  const list = found.map(({ mz, source }) => `${mz} ${source} ${round1(c.intensity.get(mz) ?? 0)} %`).join('; ');
  return { ...base, status: 'warn', numbers, reason: `Possible background: m/z ${list} — subtract background unless the compound explains them.` };
}

/** Library spectra are 70 eV EI (PRODUCT.md); other energies change the pattern. */
export function checkIonizationEnergy(c: CheckContext): CheckResult {
  const energy = c.ionizationEnergyEv;
  const base = { id: 'ionization-energy', title: 'Ionization energy' };
  if (energy === undefined) return { ...base, status: 'warn', numbers: {}, reason: 'Ionization energy not stated; the library holds 70 eV EI spectra.' };
  if (energy === 70) return { ...base, status: 'pass', numbers: { ionizationEnergyEv: energy }, reason: '70 eV EI.' };
  return { ...base, status: 'warn', numbers: { ionizationEnergyEv: energy }, reason: `${energy} eV, not 70 eV: fragment ratios will differ from library spectra.` };
}
