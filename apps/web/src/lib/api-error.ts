import { z } from 'zod';

/** The body every API error carries: `{ error: { code, message, details? } }`. */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});

/** A failed API call: the HTTP status plus the code and message from the error body. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** True when the call failed because nobody is signed in (the client is already redirecting). */
export function isUnauthenticated(error: unknown): boolean {
  return isApiError(error) && error.status === 401;
}
