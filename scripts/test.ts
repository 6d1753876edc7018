/**
 * `npm test`: the same cluster set-up as `npm start` for a fresh test database, then unit and
 * API tests (Vitest), then the tests that kill worker processes on their own, then browser tests in Debian's Chromium. Extra arguments go to the first
 * Vitest run (or, with `--e2e-only`, to the browser run); `--no-e2e` skips the browser stage,
 * `--e2e-only` runs only it.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { TEST_NEEDS, ensureDebianPackages } from './lib/system';
import { PROJECT_ROOT, ensureDatabase, startCluster } from './lib/cluster';
import { appEnv } from './lib/env';
import { buildClientIfStale } from './lib/build';

const args = process.argv.slice(2);
const noE2e = args.includes('--no-e2e');
const e2eOnly = args.includes('--e2e-only');
const vitestArgs = args.filter((a) => a !== '--no-e2e' && a !== '--e2e-only');

ensureDebianPackages(TEST_NEEDS);
startCluster();
await ensureDatabase('cardwright_test', { fresh: true });
/** A port nothing listens on now, so test runs in several checkouts do not collide. */
const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const srv = net.createServer().once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
const appPort = process.env.PORT ? Number(process.env.PORT) : await freePort();
Object.assign(process.env, appEnv('test', appPort), {
  SMTP_PORT: process.env.SMTP_PORT ?? String(await freePort()),
  PAYMENTS_PORT: process.env.PAYMENTS_PORT ?? String(await freePort()),
  // the local S3 fake for the object-storage tests (tests/harness/global-setup.ts starts it)
  S3_FAKE_PORT: process.env.S3_FAKE_PORT ?? String(await freePort()),
  S3_FAKE_DIR: mkdtempSync(path.join(os.tmpdir(), 'cardwright-test-s3-')),
  BCRYPT_ROUNDS: '10',
  MEDIA_DIR: mkdtempSync(path.join(os.tmpdir(), 'cardwright-test-media-')),
  CARDWRIGHT_TEST_PREPARED: '1',
});
{
  const { migrate } = await import('../server/services/database');
  await migrate();
  // The queue's own schema, installed once here: test files that start pg-boss at the same moment
  // would otherwise race to install it (PostgreSQL reports a deadlock).
  const { getQueue, stopQueue } = await import('../server/jobs/queue');
  await getQueue();
  await stopQueue();
}

const vitest = path.join(PROJECT_ROOT, 'node_modules/vitest/vitest.mjs');
const run = (argv: string[]) => spawnSync(process.execPath, [vitest, ...argv], { cwd: PROJECT_ROOT, stdio: 'inherit', env: process.env }).status ?? 1;

// Unit and API tests together; then the `alone` project (tests that kill worker processes) by itself.
// Given file names, a pass that holds none of them is not a failure.
const some = vitestArgs.length > 0 ? ['--passWithNoTests'] : [];
let status = 0;
if (!e2eOnly) {
  status = run(['run', '--project', 'unit', '--project', 'api', ...some, ...vitestArgs]);
  const alone = run(['run', '--project', 'alone', ...some, ...vitestArgs]);
  status ||= alone;
}
if (!noE2e && (e2eOnly || vitestArgs.length === 0)) {
  buildClientIfStale();
  // With --e2e-only, the other arguments pick browser test files (`npm test -- --e2e-only write-up`).
  const e2e = run(['run', '--config', 'tests/e2e/vitest.config.ts', ...(e2eOnly ? vitestArgs : [])]);
  status ||= e2e;
}
process.exit(status);
