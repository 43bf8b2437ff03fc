import { ChemError } from '@ionfolio/chem';
import { AppError } from '../../shared/app-error';

/**
 * Runs a packages/chem call and turns its ChemError (bad peaks, formula, file) into a 400 that
 * names the field, with `path` prefixed by where the value came from (`peaks`, `spectra.3.peaks`).
 */
export function withChemErrors<T>(work: () => T, path: string): T {
  try {
    return work();
  } catch (err) {
    throw asAppError(err, path);
  }
}

/** {@link withChemErrors} for a promise (a reading done on a worker thread). */
export async function withChemErrorsAsync<T>(work: Promise<T>, path: string): Promise<T> {
  try {
    return await work;
  } catch (err) {
    throw asAppError(err, path);
  }
}

function asAppError(err: unknown, path: string): unknown {
  if (!(err instanceof ChemError)) return err;
  const field = err.field ? err.field.replace(/^(query|peaks|library|formula)/, path) : path;
  return new AppError('VALIDATION', 400, `Invalid request at ${field}: ${err.message}`, {
    cause: err,
    details: [{ path: field, message: err.message, code: err.code, position: err.position }],
  });
}
