import { isApiError } from './api-error';

/** A sentence a person can act on, for any thrown value. */
export function describeError(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message)) {
    return 'A newer version of Ionfolio is available. Reload the page to continue.';
  }
  if (error instanceof Error && error.message) return error.message;
  return 'Something unexpected happened.';
}

type DetailLike = { message?: unknown; path?: unknown };

/**
 * The lines worth showing from an error's `details` (a 400 carries one per bad field); anything the
 * page does not recognise is left out rather than dumped.
 */
export function describeErrorDetails(error: unknown): string[] {
  if (!isApiError(error) || !Array.isArray(error.details)) return [];
  return error.details.flatMap((detail: DetailLike) => {
    if (typeof detail?.message !== 'string') return [];
    const path = Array.isArray(detail.path) && detail.path.length > 0 ? `${detail.path.join('.')}: ` : '';
    return [`${path}${detail.message}`];
  });
}
