import type { PeakList } from '@ionfolio/chem';

/**
 * The m/z values present in both spectra (intensity above 0), compared at nominal mass — the
 * resolution of library EI spectra. Sorted ascending.
 */
export function matchedMz(top: PeakList, bottom: PeakList): number[] {
  const present = (peaks: PeakList) => new Set(peaks.filter(([, i]) => i > 0).map(([mz]) => Math.round(mz)));
  const below = present(bottom);
  return [...present(top)].filter((mz) => below.has(mz)).sort((a, b) => a - b);
}
