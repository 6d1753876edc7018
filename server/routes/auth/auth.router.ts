import { Router, type Request, type Response } from 'express';
import rateLimit from 'express-rate-limit';
import {
  changePasswordSchema,
  resetRequestSchema,
  resetSchema,
  signInSchema,
  signUpSchema,
  type DemoDto,
  type MeDto,
  type ResetRequestedDto,
  type SessionDto,
  type SignedInDto,
} from '@shared/schemas/auth';
import type { User } from '../../models';
import type { Config } from '../../config';
import { openRoute, route } from '../../lib/route';
import { connectionOf } from '../../lib/connection';
import { mailboxAbilities } from '../../policies';
import { errorBody, NotSignedInError } from '../../lib/errors';
import { sessionCsrfToken } from '../../middlewares/csrf';
import { changePassword, resetPassword, startPasswordReset, signIn, signUp, studiosOf } from '../../services/accounts';
import { DEMO_PASSWORD, DEMO_PEOPLE, demoPresent } from '../../seed';

/** Starts a fresh session for the person (OWASP Session Management: new id at sign-in). */
function startSession(req: Request, userId: string): Promise<string> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.signedInAt = Date.now();
      const token = sessionCsrfToken(req);
      req.session.save((e) => (e ? reject(e) : resolve(token)));
    });
  });
}

/** The person, their studios, and whether this request may open the Outbox (their own mail) and the development mailbox (the mailbox policy). */
async function me(user: User, req: Request, config: Pick<Config, 'env' | 'mail'>): Promise<MeDto> {
  const studios = await studiosOf(user.id);
  const { outbox, devMailbox } = mailboxAbilities(config, connectionOf(req));
  return { user: user.toPublic(), studios, outbox, devMailbox };
}

/** Sign-up, sign-in, sign-out, the CSRF token, the current person, password resets and changes. */
export function authRouter(opts: {
  signInLimit: number;
  signUpTakenLimit: number;
  windowMs: number;
  config: Pick<Config, 'env' | 'mail'>;
  csrfToken: (req: Request, res: Response) => string;
}) {
  const r = Router();
  const tooMany: Parameters<typeof rateLimit>[0] = {
    windowMs: opts.windowMs,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Without a trusted proxy a client's own X-Forwarded-For is ignored on purpose (TRUST_PROXY), not a mistake to warn about.
    validate: { xForwardedForHeader: false },
    handler: (_req, res) => res.status(429).json(errorBody('Too many attempts; wait a few minutes and try again')),
  };
  // Guessing passwords or tokens is what the limit stops, so only refused attempts count: a class
  // signing in from one shop's address all at once is not an attack.
  const limiter = rateLimit({ ...tooMany, limit: opts.signInLimit, skipSuccessfulRequests: true });
  // A reset request always answers 202, so every one counts: it sends mail.
  const mailLimiter = rateLimit({ ...tooMany, limit: opts.signInLimit });
  // "Already registered" tells a stranger who has an account: the answer stays (people need it), but
  // only a few of them per address and window; after that every sign-up from there waits.
  const takenLimiter = rateLimit({
    ...tooMany,
    limit: opts.signUpTakenLimit,
    skipSuccessfulRequests: true,
    requestWasSuccessful: (_req, res) => res.statusCode !== 409,
  });

  // A visitor's token needs no stored session (a signed nonce cookie); a signed-in person's is in their session.
  r.get(
    '/csrf',
    openRoute({}, async ({ req, res }) => {
      const token = opts.csrfToken(req, res);
      res.set('Cache-Control', 'no-store');
      if (req.session?.userId) await new Promise<void>((done, fail) => req.session.save((err) => (err ? fail(err) : done())));
      res.json({ token });
    }),
  );

  // The sign-in page lists the demo people while the demo studio exists.
  r.get(
    '/demo',
    openRoute({}, async ({ res }) => {
      const present = await demoPresent();
      const answer: DemoDto = present ? { present, password: DEMO_PASSWORD, people: DEMO_PEOPLE } : { present, people: [] };
      res.json(answer);
    }),
  );

  r.get(
    '/me',
    openRoute({}, async ({ user, req, res }) => {
      if (!user) throw new NotSignedInError('Not signed in');
      res.json(await me(user, req, opts.config));
    }),
  );

  // The client asks "who is here?" on every page; a signed-out visitor is an answer, not an
  // error, so it gets 200 with null (a 401 would be logged by the browser on every public page).
  r.get(
    '/session',
    openRoute({}, async ({ user, req, res }) => {
      res.json({ me: user ? await me(user, req, opts.config) : null } satisfies SessionDto);
    }),
  );

  r.post(
    '/sign-up',
    limiter,
    takenLimiter,
    openRoute({ body: signUpSchema }, async ({ body, req, res }) => {
      const user = await signUp(body);
      const csrf = await startSession(req, user.id);
      res.status(201).json({ ...(await me(user, req, opts.config)), csrfToken: csrf } satisfies SignedInDto);
    }),
  );

  r.post(
    '/sign-in',
    limiter,
    openRoute({ body: signInSchema }, async ({ body, req, res }) => {
      const user = await signIn(body.email, body.password);
      const csrf = await startSession(req, user.id);
      res.json({ ...(await me(user, req, opts.config)), csrfToken: csrf } satisfies SignedInDto);
    }),
  );

  r.post(
    '/sign-out',
    openRoute({}, async ({ req, res }) => {
      await new Promise<void>((done, fail) => req.session.destroy((err) => (err ? fail(err) : done())));
      res.clearCookie('cardwright.sid');
      res.status(204).end();
    }),
  );

  r.post(
    '/reset-request',
    mailLimiter,
    openRoute({ body: resetRequestSchema }, async ({ body, res }) => {
      // The answer goes out before any look-up, so its timing is the same whether the address has an account or not.
      res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' } satisfies ResetRequestedDto);
      startPasswordReset(body.email);
    }),
  );

  r.post(
    '/reset',
    limiter,
    openRoute({ body: resetSchema }, async ({ body, req, res }) => {
      const user = await resetPassword(body.token, body.password);
      const csrf = await startSession(req, user.id);
      res.json({ ...(await me(user, req, opts.config)), csrfToken: csrf } satisfies SignedInDto);
    }),
  );

  // The sign-in limit applies: a wrong current password is a guess at it.
  r.post(
    '/password',
    limiter,
    route({ body: changePasswordSchema }, async ({ body, user, req, res }) => {
      const changed = await changePassword(user.id, body.currentPassword, body.password);
      const csrf = await startSession(req, changed.id);
      res.json({ ...(await me(changed, req, opts.config)), csrfToken: csrf } satisfies SignedInDto);
    }),
  );

  return r;
}
