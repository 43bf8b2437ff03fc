/** The one error a service throws; the error middleware turns it into `{ error: { code, message, details? } }`. */
export class AppError extends Error {
  readonly code: string;
  readonly status: number;
  readonly details: unknown;

  constructor(code: string, status: number, message: string, options: { cause?: unknown; details?: unknown } = {}) {
    super(message, { cause: options.cause });
    this.name = 'AppError';
    this.code = code;
    this.status = status;
    this.details = options.details;
  }
}

export const notFound = (what: string) => new AppError('NOT_FOUND', 404, `${what} was not found`);
