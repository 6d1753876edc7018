/**
 * `npm test`: the same cluster set-up as `npm start` for a fresh test database, then unit and
 * API tests (Vitest), then browser tests in Debian's Chromium. Extra arguments go to the first
 * Vitest run; `--no-e2e` skips the browser stage, `--e2e-only` runs only it.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
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
Object.assign(process.env, appEnv('test', 3999), {
  SMTP_PORT: '2700',
  BCRYPT_ROUNDS: '10',
  MEDIA_DIR: mkdtempSync(path.join(os.tmpdir(), 'cardwright-test-media-')),
  CARDWRIGHT_TEST_PREPARED: '1',
});
{
  const { migrate } = await import('../server/services/database');
  await migrate();
}

const vitest = path.join(PROJECT_ROOT, 'node_modules/vitest/vitest.mjs');
const run = (argv: string[]) => spawnSync(process.execPath, [vitest, ...argv], { cwd: PROJECT_ROOT, stdio: 'inherit', env: process.env }).status ?? 1;

let status = 0;
if (!e2eOnly) status = run(['run', ...vitestArgs]);
if (!noE2e && (e2eOnly || vitestArgs.length === 0)) {
  buildClientIfStale();
  const e2e = run(['run', '--config', 'tests/e2e/vitest.config.ts']);
  status ||= e2e;
}
process.exit(status);
