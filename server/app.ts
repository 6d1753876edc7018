import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import pg from 'pg';
import { config as defaultConfig, type Config } from './config';
import { NotFoundError } from './lib/errors';
import { endOldSessions, loadUser } from './middlewares/authenticate';
import { throttledPgStore } from './lib/session-store';
import { csrfProtection } from './middlewares/csrf';
import { apiNotFound, errorHandler } from './middlewares/error-handler';
import { authRouter } from './routes/auth/auth.router';
import { healthRouter } from './routes/health/health.router';
import { invitationsRouter } from './routes/invitations/invitations.router';
import { outboxRouter } from './routes/outbox/outbox.router';
import { devMailRouter } from './routes/dev-mail/dev-mail.router';
import { studiosRouter } from './routes/studios/studios.router';
import { versionsRouter } from './routes/versions/versions.router';
import { tutorialsRouter } from './routes/tutorials/tutorials.router';
import { recordingsRouter, tutorialRecordingsRouter } from './routes/recordings/recordings.router';
import { uploadsRouter } from './routes/uploads/uploads.router';
import { mediaRouter } from './routes/media/media.router';
import { piecesRouter } from './routes/pieces/pieces.router';
import { suppliesRouter } from './routes/supplies/supplies.router';
import { assemblyRouter } from './routes/assembly/assembly.router';
import { commentsRouter } from './routes/comments/comments.router';
import { mailSettingsRouter } from './routes/mail-settings/mail-settings.router';
import { articlesRouter } from './routes/articles/articles.router';
import { exportsRouter } from './routes/exports/exports.router';
import { publicRouter } from './routes/public/public.router';
import { classesRouter } from './routes/classes/classes.router';
import { paymentsRouter } from './routes/classes/payments.router';
import { briefsRouter } from './routes/briefs/briefs.router';
import { boardRouter } from './routes/board/board.router';
import { closeSheetPlans } from './services/sheet-plan';
import { publicPageChanges, watchPublishedContent } from './services/public-page-invalidation';
import { keptSessions, signedInChanges, watchSignedInRows } from './services/signed-in-cache';
import { listenForChanges } from './lib/change-listener';

type Overrides = { config?: Partial<Config>; rateLimit?: Partial<Config['rateLimit']> };

/** Builds the Express app; tests import this and drive it through supertest. */
export function createApp(overrides: Overrides = {}): Express & { close: () => Promise<void> } {
  const config = { ...defaultConfig, ...overrides.config };
  const rl = { ...config.rateLimit, ...overrides.rateLimit };
  const app = express() as Express & { close: () => Promise<void> };
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          // https: lets a write-up show a photo pasted from the web while it is being edited.
          imgSrc: ["'self'", 'data:', 'blob:', 'https:'],
          mediaSrc: ["'self'", 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
      // Plain HTTP on loopback: HSTS would lock a developer's browser to HTTPS for 127.0.0.1.
      strictTransportSecurity: config.secureCookies,
    }),
  );

  const pool = new pg.Pool({ connectionString: config.databaseUrl, max: 5 });
  app.use(
    session({
      name: 'cardwright.sid',
      store: throttledPgStore(pool, keptSessions),
      secret: config.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.session.idleMs },
    }),
  );
  app.use(endOldSessions(config.session.absoluteMs));
  const csrf = csrfProtection({ secret: config.sessionSecret, secureCookies: config.secureCookies });

  // The payment provider's signed webhook reads its raw body, before the JSON parser and the CSRF check.
  app.use('/api/payments', paymentsRouter());

  const api = express.Router();
  api.use(express.json({ limit: '5mb' }));
  api.use(loadUser);
  api.use(csrf.requireCsrf);
  api.use('/health', healthRouter());
  api.use('/auth', authRouter({ signInLimit: rl.signIn, signUpTakenLimit: rl.signUpTaken, windowMs: rl.windowMs, config, csrfToken: csrf.tokenFor }));
  api.use('/invitations', invitationsRouter());
  api.use('/studios', studiosRouter());
  // Exports first: a published tutorial's exports are open to visitors who are not signed in.
  api.use('/tutorials', exportsRouter());
  api.use('/tutorials', versionsRouter());
  api.use('/tutorials', tutorialsRouter());
  api.use('/tutorials', tutorialRecordingsRouter({ maxUploadBytes: config.maxUploadBytes }));
  api.use('/uploads', uploadsRouter({ maxUploadBytes: config.maxUploadBytes }));
  api.use(recordingsRouter());
  api.use(piecesRouter());
  api.use(suppliesRouter());
  api.use(assemblyRouter());
  api.use(articlesRouter());
  api.use(commentsRouter());
  api.use(mailSettingsRouter());
  api.use(classesRouter());
  api.use(briefsRouter());
  api.use(boardRouter());
  api.use('/outbox', outboxRouter(config));
  api.use(apiNotFound);
  app.use('/api', api);
  app.use(publicRouter());
  // Every caught message, for this machine only (the router checks loopback, the fake and the environment).
  if (config.env !== 'production') app.use('/dev/mail', devMailRouter(config));
  app.use('/media', loadUser, mediaRouter(), (_req, _res, next) => next(new NotFoundError('File')));

  // The built client: static files, then index.html for every client route.
  if (existsSync(path.join(config.clientDir, 'index.html'))) {
    app.use(express.static(config.clientDir, { index: false, maxAge: '1h' }));
    app.get(/^\/(?!api\/|media\/|public\/|t\/|print\/|dev\/).*/, (_req, res) => res.sendFile(path.join(config.clientDir, 'index.html')));
  }

  app.use(errorHandler);
  // Public pages, sessions and signed-in people are kept in this process; these keep the copies
  // honest when any process changes them.
  watchPublishedContent();
  watchSignedInRows();
  const stopListening = listenForChanges(config.databaseUrl, { ...publicPageChanges, ...signedInChanges });
  app.close = async () => {
    await stopListening();
    await closeSheetPlans();
    await pool.end();
  };
  return app;
}
