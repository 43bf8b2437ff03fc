import { useMemo } from 'react';
import { ChemError, checkRevision, parsePeakList, type CheckResult, type PeakList } from '@ionfolio/chem';
import { useDebouncedValue } from './use-debounced-value';

/** What the live checks found for the formula, peaks and ionization energy typed so far. */
export type LiveChecks = {
  peaks: PeakList | null;
  /** Why the pasted peaks do not parse (the message names line and column). */
  peaksError: string | null;
  checks: CheckResult[];
  /** Why no checks could run yet, e.g. a formula that does not parse. */
  waitingFor: string | null;
};

/** Pause after the last keystroke before the checks run again. */
export const LIVE_CHECK_DELAY_MS = 300;

/** The pasted peaks, or why they do not parse; nothing for empty text. */
export function parsePeaks(text: string): { peaks: PeakList | null; error: string | null } {
  if (text.trim() === '') return { peaks: null, error: null };
  try {
    return { peaks: parsePeakList(text), error: null };
  } catch (error) {
    if (error instanceof ChemError) return { peaks: null, error: error.message };
    throw error;
  }
}

/** Runs packages/chem's consistency checks as the contributor types (debounced). */
export function useLiveChecks(input: { formula: string; peaksText: string; ionizationEnergyEv: string }): LiveChecks {
  // A string settles by value; an object would be new on every render and never settle.
  const settled = useDebouncedValue(JSON.stringify([input.formula, input.peaksText, input.ionizationEnergyEv]), LIVE_CHECK_DELAY_MS);
  return useMemo(() => {
    const [formula, peaksText, ionizationEnergyEv] = JSON.parse(settled) as [string, string, string];
    const { peaks, error } = parsePeaks(peaksText);
    const base = { peaks, peaksError: error, checks: [] as CheckResult[] };
    if (error) return { ...base, waitingFor: 'peaks that parse' };
    if (!peaks) return { ...base, waitingFor: 'peaks' };
    if (formula.trim() === '') return { ...base, waitingFor: 'a formula' };
    const energy = ionizationEnergyEv.trim() === '' ? 70 : Number(ionizationEnergyEv);
    try {
      return {
        ...base,
        checks: checkRevision({ formula, peaks, ionizationEnergyEv: Number.isFinite(energy) && energy > 0 ? energy : 70 }),
        waitingFor: null,
      };
    } catch (failure) {
      if (failure instanceof ChemError || failure instanceof RangeError) {
        return { ...base, waitingFor: `a formula and peaks it can read (${failure.message})` };
      }
      throw failure;
    }
  }, [settled]);
}
