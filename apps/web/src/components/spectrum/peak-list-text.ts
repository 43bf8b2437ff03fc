import type { PeakList } from '@ionfolio/chem';

/** A peak list as plain text, one `m/z<TAB>intensity` line per peak, ready to paste back in. */
export function peakListText(peaks: PeakList): string {
  return peaks.map(([mz, intensity]) => `${mz}\t${Math.round(intensity * 100) / 100}`).join('\n');
}
