import type { RequestHandler } from 'express';
import type { User } from '../models';
import { findSignedInUser } from '../services/accounts';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    csrfToken?: string;
    /** When the person signed in (ms since the epoch), for the absolute lifetime. */
    signedInAt?: number;
  }
}

// The signed-in person on every request (set by loadUser below).
declare module 'express-serve-static-core' {
  interface Request {
    user?: User;
  }
}

/**
 * Ends a signed-in session older than `maxAgeMs` since sign-in, however active it stayed: the
 * rolling cookie alone would let a stolen session live for ever. The stored row goes and the
 * request carries on signed out. A session from before this rule gets its clock started now.
 */
export function endOldSessions(maxAgeMs: number): RequestHandler {
  return (req, _res, next) => {
    const s = req.session;
    if (!s?.userId) return next();
    if (s.signedInAt === undefined) {
      s.signedInAt = Date.now();
      return next();
    }
    if (Date.now() - s.signedInAt <= maxAgeMs) return next();
    s.regenerate((err) => next(err));
  };
}

/**
 * Loads the signed-in person (if any) onto req.user, with their roles in one query: every access
 * check of the request reads the role from there instead of asking the database again.
 */
export const loadUser: RequestHandler = async (req, _res, next) => {
  try {
    const id = req.session?.userId;
    if (id && !req.user) {
      const user = await findSignedInUser(id);
      if (user) req.user = user;
      else delete req.session.userId;
    }
    next();
  } catch (e) {
    next(e);
  }
};
