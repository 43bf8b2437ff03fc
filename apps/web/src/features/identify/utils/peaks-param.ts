import type { PeakList } from '@ionfolio/chem';

/**
 * A peak list for an address (`?peaks=`): `mz:intensity` pairs joined by spaces, intensities to two
 * decimals — the pair layout parsePeakList reads back.
 */
export function peaksParam(peaks: PeakList): string {
  return peaks.map(([mz, intensity]) => `${mz}:${Math.round(intensity * 100) / 100}`).join(' ');
}
