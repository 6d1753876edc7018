import type { RequestHandler } from 'express';
import { User } from '../models';
import { unauthorized } from '../lib/http-error';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    csrfToken?: string;
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: User;
    }
  }
}

/** Loads the signed-in person (if any) onto req.user. */
export const loadUser: RequestHandler = async (req, _res, next) => {
  try {
    const id = req.session?.userId;
    if (id) {
      const user = await User.findByPk(id);
      if (user) req.user = user;
      else delete req.session.userId;
    }
    next();
  } catch (e) {
    next(e);
  }
};

/** 401 unless someone is signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(unauthorized());
  next();
};

/** The signed-in person; only call after requireUser. */
export function currentUser(req: Express.Request): User {
  if (!req.user) throw unauthorized();
  return req.user;
}
