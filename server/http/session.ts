import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import { roleSchema } from '../../shared/account/role-schema.ts';
import type { Role } from '../../shared/account/roles.ts';
import type { Auth } from '../auth/auth.ts';
import { forbidden, unauthenticated } from './app-error.ts';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

declare module 'express-serve-static-core' {
  interface Locals {
    user?: SessionUser;
  }
}

/** Reads the session cookie once per request and keeps the user in res.locals. */
export function loadSession(auth: Auth): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    if (session) {
      const role = roleSchema.safeParse(session.user.role);
      res.locals.user = { id: session.user.id, email: session.user.email, name: session.user.name, role: role.success ? role.data : 'maker' };
    }
    next();
  };
}

export const requireUser: RequestHandler = (_req, res, next) => {
  if (!res.locals.user) throw unauthenticated();
  next();
};

/** Signed out: 401. Signed in without one of the roles: 403. */
export function requireRole(...allowed: Role[]): RequestHandler {
  return (_req, res, next) => {
    const user = res.locals.user;
    if (!user) throw unauthenticated();
    if (!allowed.includes(user.role)) throw forbidden();
    next();
  };
}

export function currentUser(res: Response): SessionUser {
  const user = res.locals.user;
  if (!user) throw unauthenticated();
  return user;
}
