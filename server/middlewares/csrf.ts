import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { ForbiddenError } from '../lib/errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The cookie that carries a signed-out visitor's random CSRF nonce (no session row is stored for them). */
export const CSRF_COOKIE = 'cardwright.csrf';

type CsrfOptions = { secret: string; secureCookies: boolean };

const sameToken = (sent: string, expected: string) =>
  sent.length > 0 && sent.length === expected.length && timingSafeEqual(Buffer.from(sent), Buffer.from(expected));

/** The session's CSRF token, made on first use (OWASP CSRF Prevention: synchronizer token). Only for signed-in sessions. */
export function sessionCsrfToken(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

/** A signed-out visitor's token: an HMAC of the nonce in their cookie, so nothing needs storing (OWASP: signed double-submit cookie). */
const signedToken = (nonce: string, secret: string) => createHmac('sha256', secret).update(`csrf:${nonce}`).digest('base64url');

function readNonce(req: Request): string | null {
  const raw = req.headers.cookie ?? '';
  const m = new RegExp(`(?:^|;\\s*)${CSRF_COOKIE.replace('.', '\\.')}=([A-Za-z0-9_-]{16,64})(?:;|$)`).exec(raw);
  return m ? m[1] : null;
}

/**
 * CSRF tokens for signed-in sessions and signed-out forms (sign-in, sign-up, reset, class
 * registration). A signed-in person's token lives in their session, as before. A visitor has no
 * session: asking for a token stores nothing on the server, it sets a random nonce in an HttpOnly
 * cookie and answers its HMAC under the server's secret. A page on another site can neither read
 * the cookie nor the answer, so it cannot send a matching pair.
 */
export function csrfProtection(opts: CsrfOptions) {
  /** The token for this request's browser: the session's when signed in, otherwise the signed nonce (set in a cookie when missing). */
  function tokenFor(req: Request, res: Response): string {
    if (req.session?.userId) return sessionCsrfToken(req);
    let nonce = readNonce(req);
    if (!nonce) {
      nonce = randomBytes(18).toString('base64url');
      res.cookie(CSRF_COOKIE, nonce, { httpOnly: true, sameSite: 'lax', secure: opts.secureCookies, path: '/' });
    }
    return signedToken(nonce, opts.secret);
  }

  /** State-changing API calls must carry X-CSRF-Token matching the session's token, or the signed nonce when signed out. */
  const requireCsrf: RequestHandler = (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const sent = req.get('x-csrf-token') ?? '';
    const stored = req.session?.csrfToken;
    const nonce = readNonce(req);
    const ok = stored ? sameToken(sent, stored) : nonce ? sameToken(sent, signedToken(nonce, opts.secret)) : false;
    if (!ok) return next(new ForbiddenError('The security token is missing or out of date; reload the page and try again', { code: 'csrf' }));
    next();
  };

  return { tokenFor, requireCsrf };
}
