import type { PeakList } from '../types';

/**
 * One mass spectrum read from, or written to, a JCAMP-DX block.
 *
 * `peaks` holds m/z (Th) and intensity as the file gives them after XFACTOR/YFACTOR, zero
 * intensities dropped. `labels` holds every other labelled data record of the block, keyed by
 * the label as written (trimmed, upper case, e.g. `.IONIZATION ENERGY`), values trimmed.
 */
export interface JcampSpectrum {
  title: string;
  peaks: PeakList;
  /** ##MOLFORM as written, e.g. `C 8 H 8 O`. */
  formula?: string;
  /** ##CAS REGISTRY NO. */
  casRn?: string;
  /** ##MW in g/mol (or Da, as the file states). */
  molecularWeight?: number;
  /** ##.IONIZATION ENERGY in eV. */
  ionizationEnergyEv?: number;
  /** ##.IONIZATION MODE, e.g. `EI+`. */
  ionizationMode?: string;
  /** ##.SPECTROMETER TYPE. */
  spectrometerType?: string;
  /** ##.INLET. */
  inlet?: string;
  /** ##RETENTION INDEX (also `.RETENTION INDEX` or `$RETENTION INDEX`), index units. */
  retentionIndex?: number;
  labels: Record<string, string>;
}
