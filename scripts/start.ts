/**
 * `npm start`: installs missing Debian packages, starts the project's PostgreSQL and the local
 * fakes on loopback, migrates, seeds the demo, builds the client and serves everything.
 */
import { APP_NEEDS, ensureDebianPackages } from './lib/system';
import { ensureDatabase, startCluster } from './lib/cluster';
import { appEnv } from './lib/env';
import { buildClientIfStale } from './lib/build';

const port = Number(process.env.PORT ?? 3000);

ensureDebianPackages(APP_NEEDS);
startCluster();
await ensureDatabase('cardwright');
Object.assign(process.env, appEnv('dev', port));

const { migrate } = await import('../server/services/database');
const applied = await migrate();
if (applied.length) console.log(`Applied ${applied.length} migration(s).`);
const { seedDemo } = await import('../server/seed');
await seedDemo(console.log);
if (!process.env.CARDWRIGHT_SKIP_BUILD) buildClientIfStale();

const { startFakeSmtp } = await import('../server/fakes/smtp');
const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
const { startServer } = await import('../server/index');
const app = await startServer({ port });
console.log(`\nCardwright is running at http://127.0.0.1:${port}`);
console.log('Sign in as maker@example.com (or owner@, coordinator@, student@) with the password cardwright-demo.');
console.log('Ctrl-C stops the app; `npm run db:stop` stops the database.');

let stopping = false;
const stop = async () => {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping ...');
  await app.stop();
  await smtp.close();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
