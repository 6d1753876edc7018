import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import pg from 'pg';
import { config as defaultConfig, type Config } from './config';
import { loadUser } from './middlewares/authenticate';
import { requireCsrf } from './middlewares/csrf';
import { apiNotFound, errorHandler } from './middlewares/error-handler';
import { authRouter } from './routes/auth/auth.router';
import { healthRouter } from './routes/health/health.router';
import { invitationsRouter } from './routes/invitations/invitations.router';
import { outboxRouter } from './routes/outbox/outbox.router';
import { studiosRouter } from './routes/studios/studios.router';
import { tutorialsRouter } from './routes/tutorials/tutorials.router';
import { recordingsRouter, tutorialRecordingsRouter } from './routes/recordings/recordings.router';
import { mediaRouter } from './routes/media/media.router';
import { piecesRouter } from './routes/pieces/pieces.router';
import { suppliesRouter } from './routes/supplies/supplies.router';
import { articlesRouter } from './routes/articles/articles.router';
import { exportsRouter } from './routes/exports/exports.router';
import { publicRouter } from './routes/public/public.router';

type Overrides = { config?: Partial<Config>; rateLimit?: Partial<Config['rateLimit']> };

/** Builds the Express app; tests import this and drive it through supertest. */
export function createApp(overrides: Overrides = {}): Express & { close: () => Promise<void> } {
  const config = { ...defaultConfig, ...overrides.config };
  const rl = { ...config.rateLimit, ...overrides.rateLimit };
  const app = express() as Express & { close: () => Promise<void> };
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

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
  const PgStore = connectPgSimple(session);
  app.use(
    session({
      name: 'cardwright.sid',
      store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
      secret: config.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: 14 * 24 * 60 * 60_000 },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: '5mb' }));
  api.use(loadUser);
  api.use(requireCsrf);
  api.use('/health', healthRouter());
  api.use('/auth', authRouter({ signInLimit: rl.signIn, windowMs: rl.windowMs }));
  api.use('/invitations', invitationsRouter());
  api.use('/studios', studiosRouter());
  // Exports first: a published tutorial's exports are open to visitors who are not signed in.
  api.use('/tutorials', exportsRouter());
  api.use('/tutorials', tutorialsRouter());
  api.use('/tutorials', tutorialRecordingsRouter({ maxUploadBytes: config.maxUploadBytes }));
  api.use(recordingsRouter());
  api.use(piecesRouter());
  api.use(suppliesRouter());
  api.use(articlesRouter());
  api.use('/outbox', outboxRouter(config.mail.fake));
  api.use(apiNotFound);
  app.use('/api', api);
  app.use(publicRouter());
  app.use('/media', loadUser, mediaRouter(), (_req, res) => res.status(404).json({ error: 'File was not found' }));

  // The built client: static files, then index.html for every client route.
  if (existsSync(path.join(config.clientDir, 'index.html'))) {
    app.use(express.static(config.clientDir, { index: false, maxAge: '1h' }));
    app.get(/^\/(?!api\/|media\/|public\/|t\/|print\/).*/, (_req, res) => res.sendFile(path.join(config.clientDir, 'index.html')));
  }

  app.use(errorHandler);
  app.close = async () => {
    await pool.end();
  };
  return app;
}
