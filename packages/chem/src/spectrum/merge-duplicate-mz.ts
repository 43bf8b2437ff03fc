import type { Peak, PeakList } from '../types';

/**
 * Sorts peaks by m/z and merges peaks of equal m/z by summing their intensities.
 *
 * Summing (rather than keeping the maximum) is chosen because two centroids that fall on the same
 * nominal m/z are ion current of the same bin: the total is what a nominal-mass instrument records.
 *
 * @param peaks - any peak list; not changed.
 * @returns a new list, strictly increasing in m/z.
 * @example
 * mergeDuplicateMz([[58, 5], [43, 100], [58, 20]]); // [[43, 100], [58, 25]]
 */
export function mergeDuplicateMz(peaks: PeakList): PeakList {
  const sorted = [...peaks].sort((a, b) => a[0] - b[0]);
  const merged: Peak[] = [];
  for (const [mz, intensity] of sorted) {
    const last = merged[merged.length - 1];
    if (last !== undefined && last[0] === mz) merged[merged.length - 1] = [mz, last[1] + intensity];
    else merged.push([mz, intensity]);
  }
  return merged;
}
