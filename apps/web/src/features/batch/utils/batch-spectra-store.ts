import type { BatchSpectrum } from '../api/start-batch';

const prefix = 'ionfolio.batch.';

/**
 * The unknowns a batch was started with, kept in this tab's session storage under the job id: the
 * results name each unknown by its index only, and drilling into one needs its peaks. A quota error
 * (a very large batch) only costs the drill-in links.
 */
export function rememberBatchSpectra(jobId: string, spectra: readonly BatchSpectrum[]): void {
  try {
    window.sessionStorage.setItem(prefix + jobId, JSON.stringify(spectra));
  } catch {
    // Storage full or disabled: the run goes on without drill-in peaks.
  }
}

export function recallBatchSpectra(jobId: string): BatchSpectrum[] | null {
  try {
    const text = window.sessionStorage.getItem(prefix + jobId);
    if (text === null) return null;
    const value = JSON.parse(text) as unknown;
    return Array.isArray(value) ? (value as BatchSpectrum[]) : null;
  } catch {
    return null;
  }
}
