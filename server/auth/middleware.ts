import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Session, User } from 'lucia';
import type { Role } from '../../shared/schemas/common';
import { forbidden, notSignedIn } from '../http/errors';
import type { Auth } from './lucia';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      user: User | null;
      session: Session | null;
    }
  }
}

/** Reads the session cookie on every request and refreshes it when the library asks to. */
export function sessionMiddleware(auth: Auth): RequestHandler {
  return async (req, res, next) => {
    const sessionId = auth.readSessionCookie(req.headers.cookie ?? '');
    res.locals.user = null;
    res.locals.session = null;
    if (!sessionId) return next();
    const { session, user } = await auth.validateSession(sessionId);
    if (session?.fresh) res.append('Set-Cookie', auth.createSessionCookie(session.id).serialize());
    if (!session) res.append('Set-Cookie', auth.createBlankSessionCookie().serialize());
    res.locals.user = user;
    res.locals.session = session;
    next();
  };
}

export function currentUser(res: Response): User {
  const user = res.locals.user;
  if (!user) throw notSignedIn();
  return user;
}

export const requireUser: RequestHandler = (_req: Request, res: Response, next: NextFunction) => {
  currentUser(res);
  next();
};

export function requireRole(...allowed: Role[]): RequestHandler {
  return (_req, res, next) => {
    const user = currentUser(res);
    if (!allowed.includes(user.role)) throw forbidden(`This needs one of the roles: ${allowed.join(', ')}`);
    next();
  };
}
