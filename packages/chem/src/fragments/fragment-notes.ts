import type { ElementCounts, ElementSymbol } from '../elements/elements';
import { nominalMass } from '../formula/nominal-mass';
import { toElementCounts } from '../formula/to-element-counts';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import type { PeakList } from '../types';
import type { FragmentAlternative } from './fragment-table';
import { COMMON_IONS, COMMON_LOSSES, FRAGMENT_SOURCE } from './fragment-table';

/** One annotation of a peak: a common neutral loss from M, or a common low-mass ion. */
export interface FragmentNote {
  /** Nominal m/z of the annotated peak. */
  mz: number;
  kind: 'loss' | 'ion';
  /** Human-readable, e.g. `M−15: loss of CH3` or `m/z 91: C7H7+`. */
  label: string;
  /** The neutral loss in Da, for `kind: 'loss'`. */
  lossDa?: number;
  /** Relative intensity of the peak, base peak 100. */
  relIntensity: number;
  /** Where the loss or ion comes from. */
  source: string;
}

/** Options of {@link fragmentNotes}. */
export interface FragmentNotesOptions {
  /** Nominal m/z of the molecular ion; needed for losses (default: the formula's nominal mass). */
  molecularIonMz?: number;
  /** Molecular formula: alternatives that need atoms the molecule lacks are left out. */
  formula?: string | ElementCounts;
  /** Peaks below this relative intensity (base peak 100) get no note; default 1. */
  minRelIntensity?: number;
}

function fits(atoms: ElementCounts, molecule: ElementCounts | undefined): boolean {
  if (!molecule) return true;
  return (Object.keys(atoms) as ElementSymbol[]).every((symbol) => (atoms[symbol] ?? 0) <= (molecule[symbol] ?? 0));
}

function possible(alternatives: readonly FragmentAlternative[], molecule: ElementCounts | undefined): string[] {
  return alternatives.filter((alternative) => fits(alternative.atoms, molecule)).map((alternative) => alternative.text);
}

/**
 * Notes common neutral losses from the molecular ion and common low-mass ions found in a
 * spectrum (Lange's Handbook of Chemistry, 15th ed., §7.8; SCIENCE.md §6). With a formula, an
 * explanation needing atoms the molecule lacks is dropped (no "loss of Cl" from a molecule without
 * chlorine), and a loss or ion larger than the molecule is never noted.
 *
 * @param peaks - any peak list (not changed); m/z are rounded to nominal.
 * @param options - molecular-ion m/z, formula, intensity floor (see {@link FragmentNotesOptions}).
 * @returns notes sorted by m/z, highest first; losses only when M is known.
 * @throws {ChemError} for a malformed peak list (`INVALID_PEAKS`, `EMPTY_SPECTRUM`) or formula.
 * @throws {RangeError} for a molecular-ion m/z that is not a positive integer, or a floor outside 0–100.
 * @example
 * fragmentNotes([[43, 100], [58, 30], [15, 10]], { formula: 'C3H6O' })
 * // [{ mz: 43, kind: 'loss', label: 'M−15: loss of CH3', lossDa: 15, ... }, { mz: 43, kind: 'ion', label: 'm/z 43: CH3CO+', ... }]
 */
export function fragmentNotes(peaks: PeakList, options: FragmentNotesOptions = {}): FragmentNote[] {
  const minRelIntensity = options.minRelIntensity ?? 1;
  if (!Number.isFinite(minRelIntensity) || minRelIntensity < 0 || minRelIntensity > 100) {
    throw new RangeError(`minRelIntensity must be from 0 to 100, got ${String(minRelIntensity)}`);
  }
  const molecule = options.formula === undefined ? undefined : toElementCounts(options.formula);
  const molecularIonMz = options.molecularIonMz ?? (molecule ? nominalMass(molecule) : undefined);
  if (molecularIonMz !== undefined && !(Number.isInteger(molecularIonMz) && molecularIonMz > 0)) {
    throw new RangeError(`molecularIonMz must be a positive integer, got ${String(molecularIonMz)}`);
  }
  const relIntensity = new Map(normalizeSpectrum(peaks).map(([mz, value]) => [mz, value]));
  const present = (mz: number): number | undefined => {
    const value = relIntensity.get(mz);
    return value !== undefined && value >= minRelIntensity ? value : undefined;
  };
  const notes: FragmentNote[] = [];
  if (molecularIonMz !== undefined) {
    for (const loss of COMMON_LOSSES) {
      const mz = molecularIonMz - loss.lossDa;
      const value = mz > 0 ? present(mz) : undefined;
      const texts = possible(loss.alternatives, molecule);
      if (value === undefined || texts.length === 0) continue;
      notes.push({ mz, kind: 'loss', label: `M−${loss.lossDa}: loss of ${texts.join(' or ')}`, lossDa: loss.lossDa, relIntensity: value, source: FRAGMENT_SOURCE });
    }
  }
  for (const ion of COMMON_IONS) {
    const value = present(ion.mz);
    const texts = possible(ion.alternatives, molecule);
    if (value === undefined || texts.length === 0) continue;
    if (molecularIonMz !== undefined && ion.mz >= molecularIonMz) continue;
    notes.push({ mz: ion.mz, kind: 'ion', label: `m/z ${ion.mz}: ${texts.join(' or ')}`, relIntensity: value, source: FRAGMENT_SOURCE });
  }
  return notes.sort((a, b) => b.mz - a.mz || (a.kind === b.kind ? 0 : a.kind === 'loss' ? -1 : 1));
}
