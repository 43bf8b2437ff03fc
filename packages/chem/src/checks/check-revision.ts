import { nominalMass } from '../formula/nominal-mass';
import { toElementCounts } from '../formula/to-element-counts';
import { formatFormula } from '../formula/format-formula';
import { isotopeCluster } from '../isotopes/isotope-cluster';
import { readMolecularIon } from '../reading/read-molecular-ion';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import type { PeakList } from '../types';
import type { CheckContext } from './check-context';
import type { CheckResult } from './check-result';
import { checkIsotopeCluster, checkMolecularIonMass, checkNitrogenParity, checkPeaksAboveMolecularIon } from './cluster-checks';
import { checkFragmentHalogens } from './fragment-halogen-check';
import { checkBackgroundIons, checkClippedBasePeak, checkIonizationEnergy, checkPeakCount } from './spectrum-checks';

/** What {@link checkRevision} checks. */
export interface CheckRevisionInput {
  /** Molecular formula, e.g. `C6H5Cl` (any form parseFormula accepts, such as `C 6 H 5 Cl`). */
  formula: string;
  peaks: PeakList;
  /** Ionization energy in eV; library spectra are 70 eV. */
  ionizationEnergyEv?: number;
}

/**
 * The consistency checks of a revision (issue 3 item 7), each pass / warn / fail with a one-line
 * reason and its numbers, in this order: formula mass vs cluster (`molecular-ion-mass`), observed vs
 * theoretical cluster (`isotope-cluster`, tolerance ±(10 % + 2 points) of the 0–100 scale),
 * nitrogen parity (`nitrogen-rule`), peaks above M that isotopes cannot explain
 * (`peaks-above-molecular-ion`), too few peaks (`peak-count`), flat-topped base peak
 * (`clipped-base-peak`), air/water/column-bleed ions (`background-ions`), fragment clusters with more
 * Cl/Br than the formula (`impossible-fragment`) and ionization energy other than 70 eV
 * (`ionization-energy`).
 *
 * @param input - formula, peaks (any order and scale; not changed) and ionization energy.
 * @returns one result per check, in the order above.
 * @throws {ChemError} for a bad formula (`FORMULA_SYNTAX`, `UNKNOWN_ELEMENT` with position) or peaks
 *   (`INVALID_PEAKS`, `EMPTY_SPECTRUM` with field).
 * @throws {RangeError} for a non-finite or non-positive ionization energy.
 * @example
 * checkRevision({ formula: 'CH2Cl2', peaks: [[49, 100], [51, 31], [84, 60], [86, 38], [88, 6]], ionizationEnergyEv: 70 })
 *   .map((r) => `${r.id}: ${r.status}`)
 */
export function checkRevision(input: CheckRevisionInput): CheckResult[] {
  const { ionizationEnergyEv } = input;
  if (ionizationEnergyEv !== undefined && !(Number.isFinite(ionizationEnergyEv) && ionizationEnergyEv > 0)) {
    throw new RangeError(`ionizationEnergyEv must be a positive number, got ${String(ionizationEnergyEv)}`);
  }
  const counts = toElementCounts(input.formula);
  const spectrum = normalizeSpectrum(input.peaks);
  const context: CheckContext = {
    formula: formatFormula(counts),
    counts,
    molecularMassDa: nominalMass(counts),
    theoretical: isotopeCluster(counts, { minRelIntensity: 0.01 }),
    spectrum,
    intensity: new Map(spectrum.map(([mz, value]) => [mz, value])),
    reading: readMolecularIon(spectrum, { suggestLimit: 0 }),
    ionizationEnergyEv,
  };
  return [
    checkMolecularIonMass,
    checkIsotopeCluster,
    checkNitrogenParity,
    checkPeaksAboveMolecularIon,
    checkPeakCount,
    checkClippedBasePeak,
    checkBackgroundIons,
    checkFragmentHalogens,
    checkIonizationEnergy,
  ].map((check) => check(context));
}
