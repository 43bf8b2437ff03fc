import { ChemError } from '@ionfolio/chem';

/**
 * A paste error a person can fix: packages/chem's message (it starts with "line N, column C") and the
 * offending line as typed.
 */
export function describePeakError(error: unknown, text: string): string {
  if (!(error instanceof ChemError)) return error instanceof Error ? error.message : 'The peak list could not be read.';
  if (error.code === 'EMPTY_SPECTRUM') return 'The peak list holds no peak: paste m/z and intensity pairs first.';
  const lineNumber = /^line (\d+)/.exec(error.field ?? '')?.[1] ?? /^line (\d+)/.exec(error.message)?.[1];
  const line = lineNumber === undefined ? undefined : text.split('\n')[Number(lineNumber) - 1]?.replace(/\r$/, '');
  const message = error.message.charAt(0).toUpperCase() + error.message.slice(1);
  return line === undefined ? message : `${message} — “${line.trim()}”`;
}
