import type { Request, RequestHandler, Response } from 'express';
import { ipKeyGenerator, rateLimit, type RateLimitRequestHandler, type Store } from 'express-rate-limit';
import type { Database } from '../db/database.ts';
import { RequestCountStore } from './request-count-store.ts';

/**
 * How many requests a client may make, per client address (as Express derives it with
 * TRUST_PROXY) and per account being tried. Every figure is per minute. Limits are on in every
 * mode; outside production they are ten times looser, so a maker trying things on their own
 * machine never meets them. Figures are common practice, no source: a person signs in a few times
 * a day, while a class behind one school address may sign in thirty at once.
 */
export interface RateLimitPolicy {
  /** Any request to Canwright's own /api routes (the health check aside). */
  apiPerAddress: number;
  /** Kit renders (PDF, SVG, CSV, calibration sheet). */
  rendersPerAddress: number;
  /** Sign-in tries (better-auth's limit, counted in the database). */
  signInsPerAddress: number;
  /** New accounts. */
  signUpsPerAddress: number;
  /** Requests that send account mail: password reset, a new confirmation link. */
  accountMailPerAddress: number;
  /** Failed sign-ins on one account, from anywhere: a short back-off that forging addresses cannot get round. */
  failedSignInsPerAccount: number;
  /** Account mail to one address, from anywhere, so nobody's inbox can be flooded. */
  accountMailPerAccount: number;
  /** Wrong passwords typed to confirm a change of a signed-in account (deleting it), per account. */
  failedConfirmationsPerAccount: number;
}

export const productionLimits: RateLimitPolicy = {
  apiPerAddress: 1200,
  rendersPerAddress: 120,
  signInsPerAddress: 30,
  signUpsPerAddress: 10,
  accountMailPerAddress: 10,
  failedSignInsPerAccount: 5,
  accountMailPerAccount: 3,
  failedConfirmationsPerAccount: 5,
};

export const developmentLimits: RateLimitPolicy = Object.fromEntries(
  Object.entries(productionLimits).map(([name, limit]) => [name, limit * 10]),
) as unknown as RateLimitPolicy;

export function limitsFor(production: boolean): RateLimitPolicy {
  return production ? productionLimits : developmentLimits;
}

/** better-auth reads the client address from this header only; the app sets it from Express's own derivation. */
export const CLIENT_ADDRESS_HEADER = 'x-canwright-client-address';

/** Replaces whatever a client sent in the header with the address Express derived (TRUST_PROXY decides how). */
export const passClientAddress: RequestHandler = (req, _res, next) => {
  req.headers[CLIENT_ADDRESS_HEADER] = req.ip ?? req.socket.remoteAddress ?? '';
  next();
};

const WINDOW_MS = 60_000;

export interface AppRateLimits {
  api: RequestHandler;
  renders: RequestHandler;
  failedSignInsPerAccount: RequestHandler;
  accountMailPerAccount: RequestHandler;
  failedConfirmationsPerAccount: RequestHandler;
}

/**
 * Canwright's own limits (express-rate-limit). With a PostgreSQL server the counts live in the
 * database, so several servers count together; the embedded database allows one server process
 * only (the data-folder lock), so its counts stay in memory.
 */
export function createAppRateLimits(database: Database, policy: RateLimitPolicy): AppRateLimits {
  const store = (prefix: string): Store | undefined => (database.kind === 'postgres' ? new RequestCountStore(database.db, prefix) : undefined);
  const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown');
  const byAccount = (req: Request) => accountOf(req) ?? '';
  return {
    api: limiter({ limit: policy.apiPerAddress, key: byAddress, store: store('api:'), skip: (req) => req.path === '/health' }),
    renders: limiter({ limit: policy.rendersPerAddress, key: byAddress, store: store('render:') }),
    failedSignInsPerAccount: forgetOnSuccess(
      limiter({
        limit: policy.failedSignInsPerAccount,
        key: byAccount,
        store: store('sign-in:'),
        skip: (req) => accountOf(req) === undefined,
        onlyFailures: true,
      }),
      byAccount,
    ),
    accountMailPerAccount: limiter({ limit: policy.accountMailPerAccount, key: byAccount, store: store('mail:'), skip: (req) => accountOf(req) === undefined }),
    // Keyed by the signed-in user (the session was read before), counting only refusals.
    failedConfirmationsPerAccount: limiter({
      limit: policy.failedConfirmationsPerAccount,
      key: (_req, res) => res.locals.user?.id ?? '',
      store: store('confirm:'),
      skip: (_req, res) => !res.locals.user,
      onlyFailures: true,
    }),
  };
}

/** A sign-in that succeeds clears the account's failed tries: its owner is back. */
function forgetOnSuccess(limit: RateLimitRequestHandler, key: (req: Request) => string): RequestHandler {
  return (req, res, next) => {
    res.on('finish', () => {
      if (res.statusCode === 200 && key(req) !== '') void Promise.resolve(limit.resetKey(key(req))).catch(() => undefined);
    });
    limit(req, res, next);
  };
}

function limiter(options: { limit: number; key: (req: Request, res: Response) => string; store: Store | undefined; skip?: (req: Request, res: Response) => boolean; onlyFailures?: boolean }): RateLimitRequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: options.limit,
    keyGenerator: options.key,
    ...(options.store ? { store: options.store } : {}),
    skip: options.skip,
    skipSuccessfulRequests: options.onlyFailures ?? false,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // A forwarded header without TRUST_PROXY is ignored on purpose (it is what a forger sends).
    validate: { xForwardedForHeader: false },
    handler(req, res) {
      const resetTime = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = Math.max(1, Math.ceil(((resetTime?.getTime() ?? Date.now() + WINDOW_MS) - Date.now()) / 1000));
      res
        .status(429)
        .set('Retry-After', String(seconds))
        .json({ error: { code: 'RATE_LIMITED', message: `Too many tries in a short time. Wait ${seconds} second${seconds === 1 ? '' : 's'} and try again.`, retryAfterSeconds: seconds } });
    },
  });
}

/** The account a sign-in or account-mail request is about: its e-mail address (the new one of an address change), as better-auth compares them. */
function accountOf(req: Request): string | undefined {
  const body = req.body as { email?: unknown; newEmail?: unknown } | undefined;
  const email: unknown = body?.email ?? body?.newEmail;
  return typeof email === 'string' && email.trim() !== '' ? email.trim().toLowerCase() : undefined;
}
