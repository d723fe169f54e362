import type { RequestHandler } from 'express';
import { AppError } from './app-error.ts';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request forgery: a request that changes something and carries the session cookie
 * must come from one of our own pages. The browser says where a request comes from in Origin
 * (Fetch Standard), and in Sec-Fetch-Site (W3C Fetch Metadata) where Origin is missing; a request
 * with neither and no cookie is a script or a tool with no session to abuse. The same rule as
 * better-auth's own check on its routes. SameSite=Lax is not enough alone: to a browser, another
 * port on localhost is the same site.
 */
export function requireSameOrigin(trustedOrigins: readonly string[], { except }: { except?: string } = {}): RequestHandler {
  const trusted = new Set(trustedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method) || (except && req.path.startsWith(except))) return next();
    const origin = req.get('origin');
    if (origin !== undefined && origin !== 'null') return next(trusted.has(origin) ? undefined : refused());
    const site = req.get('sec-fetch-site');
    if (site !== undefined) return next(site === 'same-origin' || site === 'none' ? undefined : refused());
    if (origin === 'null' || req.get('cookie')) return next(refused());
    next();
  };
}

const refused = () => new AppError(403, 'FOREIGN_ORIGIN', 'This request came from another site; changes are only accepted from Canwright’s own pages.');
