import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from './app-error';

interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  expose?: boolean;
  message?: string;
}

function body(code: string, message: string, details?: unknown) {
  return { error: details === undefined ? { code, message } : { code, message, details } };
}

// PostgreSQL error codes that mean "the server is not there right now" (PostgreSQL docs, appendix A
// "Error Codes"): class 08 connection exceptions, 57P01–57P03 admin/crash shutdown and cannot connect
// now, 53300 too many connections.
const DATABASE_DOWN_CODES = new Set(['08000', '08001', '08003', '08004', '08006', '57P01', '57P02', '57P03', '53300']);
// Socket errors: during a request the database is the only server the API talks to (mail goes
// through the outbox dispatcher, sign-in errors arrive wrapped by passport).
const SOCKET_DOWN_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH']);
// What node-postgres and TypeORM say when a connection dies or cannot be had, without a code.
const DATABASE_DOWN_MESSAGES =
  /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|Connection is not established|the database system is (?:starting up|shutting down|in recovery mode)/i;

/** True when `err` (or what it wraps: TypeORM's driverError, a cause, an AggregateError's errors) says the database is unreachable. */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (err === null || typeof err !== 'object' || depth > 4) return false;
  const e = err as { name?: unknown; code?: unknown; message?: unknown; driverError?: unknown; cause?: unknown; errors?: unknown };
  // TypeORM releases a transaction's query runner when its connection dies; the transaction's next query then throws this.
  if (e.name === 'QueryRunnerAlreadyReleasedError') return true;
  if (typeof e.code === 'string' && (DATABASE_DOWN_CODES.has(e.code) || SOCKET_DOWN_CODES.has(e.code))) return true;
  if (typeof e.message === 'string' && DATABASE_DOWN_MESSAGES.test(e.message)) return true;
  const inner = [e.driverError, e.cause, ...(Array.isArray(e.errors) ? e.errors : [])];
  return inner.some((x) => isDatabaseUnavailable(x, depth + 1));
}

// 22021 character_not_in_repertoire (a NUL byte in text), 22P05 untranslatable_character (\u0000 in
// jsonb): PostgreSQL cannot store the text, so the request, not the server, is at fault.
const UNSTORABLE_TEXT_CODES = new Set(['22021', '22P05']);

function isUnstorableText(err: unknown): boolean {
  const e = err as { code?: unknown; driverError?: { code?: unknown } } | null;
  return typeof e === 'object' && e !== null && (UNSTORABLE_TEXT_CODES.has(String(e.code)) || UNSTORABLE_TEXT_CODES.has(String(e.driverError?.code)));
}

/** Seconds a client should wait before trying again while the database is away. */
export const DATABASE_RETRY_AFTER_S = 5;

/** 404 for any /api or /auth path that no route answered. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body('ROUTE_NOT_FOUND', `No route for ${req.method} ${req.path}`));
};

/**
 * Maps every error to a JSON body: zod → 400 with the issues, AppError → its status, errors from
 * body parsing (malformed JSON, too large) → their 4xx, the database being unreachable → 503 with
 * Retry-After, anything else → a logged 500 with the request id and a generic message.
 */
export const errorMiddleware: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  if (res.headersSent) {
    res.end();
    return;
  }
  if (err instanceof ZodError) {
    const details = err.issues.map((i) => ({ path: i.path.join('.'), message: i.message, code: i.code }));
    const first = details[0];
    const where = first && first.path ? ` at ${first.path}` : '';
    res.status(400).json(body('VALIDATION', `Invalid request${where}: ${first?.message ?? 'bad input'}`, details));
    return;
  }
  if (err instanceof AppError) {
    if (err.status >= 500) req.log?.error({ err }, err.message);
    res.status(err.status).json(body(err.code, err.message, err.details));
    return;
  }
  if (err instanceof Error && err.name === 'MulterError') {
    const code = (err as Error & { code?: string }).code;
    if (code === 'LIMIT_FILE_SIZE') {
      res.status(413).json(body('FILE_TOO_LARGE', 'The file is larger than the 20 MB an upload may be'));
    } else {
      res.status(400).json(body('BAD_UPLOAD', `The upload was refused: ${err.message}`));
    }
    return;
  }
  if (isUnstorableText(err)) {
    res.status(400).json(body('INVALID_TEXT', 'The text holds a NUL character (\\u0000) or a byte sequence that is not UTF-8; remove it'));
    return;
  }
  if (isDatabaseUnavailable(err)) {
    req.log?.warn({ err }, 'database unavailable');
    res
      .status(503)
      .set('Retry-After', String(DATABASE_RETRY_AFTER_S))
      .json(body('DATABASE_UNAVAILABLE', `The library database is not answering; try again in ${DATABASE_RETRY_AFTER_S} s`));
    return;
  }
  const e = (err ?? {}) as HttpishError;
  const status = e.status ?? e.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const code =
      e.type === 'entity.parse.failed'
        ? 'MALFORMED_JSON'
        : e.type === 'entity.too.large'
          ? 'PAYLOAD_TOO_LARGE'
          : 'BAD_REQUEST';
    const message =
      code === 'MALFORMED_JSON' ? 'The request body is not valid JSON' : (e.message ?? 'Bad request');
    res.status(status).json(body(code, message));
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json(body('INTERNAL', `Something went wrong on our side (request ${String(req.id)})`));
};
