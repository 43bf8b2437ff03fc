/**
 * One mass-spectral peak: nominal or decimal m/z, and intensity on any positive scale.
 * Library and query spectra are passed around as arrays of these tuples, the same shape the
 * REST contract uses (`peaks: [[mz, intensity], ...]`).
 */
export type Peak = readonly [mz: number, intensity: number];

/** A spectrum as a list of peaks. Functions that need sorted, normalised input say so. */
export type PeakList = readonly Peak[];
