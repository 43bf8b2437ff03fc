import { ChemError } from '../errors/chem-error';
import type { Peak, PeakList } from '../types';

/**
 * The most intense peak of a spectrum; among equal intensities the one of lowest m/z.
 *
 * @param peaks - any peak list (need not be sorted).
 * @returns that peak, as it appears in the list.
 * @throws {ChemError} `EMPTY_SPECTRUM` when the list is empty.
 * @example
 * basePeak([[15, 10], [43, 100], [58, 25]]); // [43, 100]
 */
export function basePeak(peaks: PeakList): Peak {
  let best: Peak | undefined;
  for (const peak of peaks) {
    if (best === undefined || peak[1] > best[1] || (peak[1] === best[1] && peak[0] < best[0])) best = peak;
  }
  if (best === undefined) throw new ChemError('EMPTY_SPECTRUM', 'a spectrum without peaks has no base peak', { field: 'peaks' });
  return best;
}
