/** Outcome of one consistency check. */
export type CheckStatus = 'pass' | 'warn' | 'fail';

/** One consistency check of a revision: a status, a one-line reason and the numbers behind it. */
export interface CheckResult {
  /** Stable id, e.g. `molecular-ion-mass`. */
  id: string;
  /** Short title for the UI, e.g. `Formula mass vs cluster`. */
  title: string;
  status: CheckStatus;
  /** One line saying why, with the numbers. */
  reason: string;
  numbers: Record<string, number | string>;
}

/** Rounds for display in reasons and numbers: one decimal. */
export function round1(value: number): number {
  return Math.round(value * 10) / 10;
}
