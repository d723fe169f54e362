/** An error that carries the HTTP status and a stable code the client can act on. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
    /** Headers the answer carries, e.g. Retry-After on a 503. */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const unauthenticated = () => new AppError(401, 'UNAUTHENTICATED', 'Sign in to do this.');
export const forbidden = () => new AppError(403, 'FORBIDDEN', 'Your account is not allowed to do this.');
export const notFound = (what = 'This') => new AppError(404, 'NOT_FOUND', `${what} was not found.`);
