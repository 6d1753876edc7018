/**
 * `npm start`: installs missing Debian packages, starts the project's PostgreSQL and the local
 * fakes on loopback, migrates, seeds the demo, builds the client and serves everything.
 */
import { APP_NEEDS, ensureDebianPackages } from './lib/system';
import path from 'node:path';
import { ensureDatabase, PROJECT_ROOT, startCluster } from './lib/cluster';
import { appEnv } from './lib/env';
import { buildClientIfStale } from './lib/build';

const port = Number(process.env.PORT ?? 3000);

/** Starts the local S3 fake for this copy (port 9000 beside app port 3000) and points the app at it. */
async function startLocalS3(appPort: number) {
  const { FAKE_S3_KEYS, startFakeS3 } = await import('../server/fakes/s3');
  const bucket = process.env.S3_BUCKET ?? 'cardwright-media';
  const s3 = await startFakeS3({ port: Number(process.env.S3_FAKE_PORT ?? appPort - 3000 + 9000), directory: path.join(PROJECT_ROOT, '.data', 's3'), bucket });
  Object.assign(process.env, {
    S3_ENDPOINT: s3.endpoint,
    S3_BUCKET: bucket,
    S3_ACCESS_KEY_ID: FAKE_S3_KEYS.accessKeyId,
    S3_SECRET_ACCESS_KEY: FAKE_S3_KEYS.secretAccessKey,
  });
  console.log(`Media in the local S3 fake at ${s3.endpoint} (bucket ${bucket}, files in .data/s3).`);
  return s3;
}

ensureDebianPackages(APP_NEEDS);
startCluster();
await ensureDatabase('cardwright');
Object.assign(process.env, appEnv('dev', port));
// STORAGE=s3 with no S3_ENDPOINT: a local S3-compatible fake on loopback, its bucket in .data/s3 (docs/decisions/013).
const fakeS3 = process.env.STORAGE?.toLowerCase() === 's3' && !process.env.S3_ENDPOINT ? await startLocalS3(port) : null;

const { migrate } = await import('../server/services/database');
const applied = await migrate();
if (applied.length) console.log(`Applied ${applied.length} migration(s).`);
const { seedDemo } = await import('../server/seed');
await seedDemo(console.log);
if (!process.env.CARDWRIGHT_SKIP_BUILD) buildClientIfStale();

const { startFakeSmtp } = await import('../server/fakes/smtp');
const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
const { config } = await import('../server/config');
// The local payment fake, unless a real provider key is set; its events go to this app's webhook.
const { startFakePayments } = await import('../server/fakes/payments');
const payments = config.payments.fake
  ? await startFakePayments({
      port: config.payments.port,
      webhookSecret: config.payments.webhookSecret,
      webhookUrls: [`http://127.0.0.1:${port}/api/payments/webhook`],
    })
  : null;
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
  await payments?.close();
  await fakeS3?.close();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
