import { Router, type Request } from 'express';
import rateLimit from 'express-rate-limit';
import { resetRequestSchema, resetSchema, signInSchema, signUpSchema } from '@shared/schemas/auth';
import { User } from '../../models';
import { config } from '../../config';
import { validate } from '../../middlewares/validate';
import { csrfToken } from '../../middlewares/csrf';
import { HttpError } from '../../lib/http-error';
import { burnPasswordCheck, verifyPassword } from '../../services/passwords';
import { requestPasswordReset, resetPassword, signUp, studiosOf } from '../../services/accounts';
import { DEMO_PASSWORD, DEMO_PEOPLE, demoPresent } from '../../seed';

/** Starts a fresh session for the person (OWASP Session Management: new id at sign-in). */
function startSession(req: Request, userId: string): Promise<string> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      const token = csrfToken(req);
      req.session.save((e) => (e ? reject(e) : resolve(token)));
    });
  });
}

async function me(user: User) {
  const studios = await studiosOf(user.id);
  // The Outbox exists only while mail goes to the local fake, and only owners read it.
  return { user: user.toPublic(), studios, outbox: config.mail.fake && studios.some((s) => s.role === 'owner') };
}

/** Sign-up, sign-in, sign-out, the CSRF token, the current person and password resets. */
export function authRouter(opts: { signInLimit: number; windowMs: number }) {
  const r = Router();
  const limiter = rateLimit({
    windowMs: opts.windowMs,
    limit: opts.signInLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => res.status(429).json({ error: 'Too many attempts; wait a few minutes and try again' }),
  });

  r.get('/csrf', (req, res) => {
    const token = csrfToken(req);
    req.session.save(() => res.json({ token }));
  });

  // The sign-in page lists the demo people while the demo studio exists.
  r.get('/demo', async (_req, res) => {
    const present = await demoPresent();
    res.json(present ? { present, password: DEMO_PASSWORD, people: DEMO_PEOPLE } : { present, people: [] });
  });

  r.get('/me', async (req, res) => {
    if (!req.user) throw new HttpError(401, 'Not signed in');
    res.json(await me(req.user));
  });

  r.post('/sign-up', limiter, validate({ body: signUpSchema }), async (req, res) => {
    const user = await signUp(req.body);
    const csrf = await startSession(req, user.id);
    res.status(201).json({ ...(await me(user)), csrfToken: csrf });
  });

  r.post('/sign-in', limiter, validate({ body: signInSchema }), async (req, res) => {
    const { email, password } = req.body as { email: string; password: string };
    const user = await User.findOne({ where: { email } });
    const ok = user ? await verifyPassword(password, user.passwordHash) : (await burnPasswordCheck(password), false);
    if (!user || !ok) throw new HttpError(401, 'That e-mail and password do not match an account');
    const csrf = await startSession(req, user.id);
    res.json({ ...(await me(user)), csrfToken: csrf });
  });

  r.post('/sign-out', (req, res, next) => {
    req.session.destroy((err) => {
      if (err) return next(err);
      res.clearCookie('cardwright.sid');
      res.status(204).end();
    });
  });

  r.post('/reset-request', limiter, validate({ body: resetRequestSchema }), async (req, res) => {
    await requestPasswordReset(req.body.email);
    res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' });
  });

  r.post('/reset', limiter, validate({ body: resetSchema }), async (req, res) => {
    const user = await resetPassword(req.body.token, req.body.password);
    const csrf = await startSession(req, user.id);
    res.json({ ...(await me(user)), csrfToken: csrf });
  });

  return r;
}
