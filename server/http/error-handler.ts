import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from './app-error.ts';

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'NOT_FOUND', message: `No API route ${req.method} ${req.path}` } });
};

/** Turns thrown errors into JSON; unknown ones are logged and answered with a plain 500. */
export const errorHandler: ErrorRequestHandler = (error, _req, res, next) => {
  if (res.headersSent) return next(error);
  if (error instanceof AppError) {
    if (error.headers) res.set(error.headers);
    res.status(error.status).json({ error: { code: error.code, message: error.message, ...(error.details ? { details: error.details } : {}) } });
    return;
  }
  const status = (error as { status?: number; statusCode?: number }).status ?? (error as { statusCode?: number }).statusCode;
  if (status === 413) {
    res.status(413).json({ error: { code: 'TOO_LARGE', message: 'The request body is too large.' } });
    return;
  }
  if (status === 400 && (error as { type?: string }).type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'INVALID_JSON', message: 'The request body is not valid JSON.' } });
    return;
  }
  const refused = databaseRefusal(error);
  if (refused) {
    res.status(400).json({ error: { code: 'INVALID_INPUT', message: refused } });
    return;
  }
  console.error(error);
  res.status(500).json({ error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } });
};

/**
 * PostgreSQL's refusals of a value (SQLSTATE class 22, data exception, and 23502, a missing
 * required value; PostgreSQL manual, appendix A) are bad input, not a fault of the server.
 * Drizzle wraps the driver's error in `cause`.
 */
export function databaseRefusal(error: unknown): string | undefined {
  for (let e = error as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    const code = typeof e.code === 'string' ? e.code : '';
    if (code === '23502') return 'A required value is missing.';
    if (/^22[0-9A-Z]{3}$/.test(code)) return 'A value could not be stored as given (a character or number it cannot hold).';
  }
  return undefined;
}
