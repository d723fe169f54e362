import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from './app-error.ts';

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'NOT_FOUND', message: `No API route ${req.method} ${req.path}` } });
};

/** Turns thrown errors into JSON; unknown ones are logged and answered with a plain 500. */
export const errorHandler: ErrorRequestHandler = (error, _req, res, next) => {
  if (res.headersSent) return next(error);
  if (error instanceof AppError) {
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
  console.error(error);
  res.status(500).json({ error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } });
};
