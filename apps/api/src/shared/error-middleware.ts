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

/** 404 for any /api or /auth path that no route answered. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body('ROUTE_NOT_FOUND', `No route for ${req.method} ${req.path}`));
};

/**
 * Maps every error to a JSON body: zod → 400 with the issues, AppError → its status, errors from
 * body parsing (malformed JSON, too large) → their 4xx, anything else → a logged 500 with the
 * request id and a generic message.
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
