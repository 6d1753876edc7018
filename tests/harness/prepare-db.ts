import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ensureDatabase, startCluster } from '../../scripts/lib/cluster';
import { appEnv } from '../../scripts/lib/env';

/**
 * Makes the test database ready. `npm test` has done it already (fresh database, migrations);
 * running Vitest directly does it here so a single file can be run on its own.
 */
export async function prepareTestDatabase(): Promise<void> {
  if (process.env.CARDWRIGHT_TEST_PREPARED) return;
  startCluster();
  await ensureDatabase('cardwright_test');
  Object.assign(process.env, appEnv('test', 3999), {
    SMTP_PORT: process.env.SMTP_PORT ?? '2700',
    PAYMENTS_PORT: process.env.PAYMENTS_PORT ?? '12700',
    BCRYPT_ROUNDS: '10',
    CARDWRIGHT_TEST_PREPARED: '1',
  });
  // Test uploads never land in the development media folder.
  process.env.MEDIA_DIR ??= mkdtempSync(path.join(os.tmpdir(), 'cardwright-test-media-'));
  const { migrate } = await import('../../server/services/database');
  await migrate();
  // pg-boss installs its schema once, before test files race to start it.
  const { getQueue, stopQueue } = await import('../../server/jobs/queue');
  await getQueue();
  await stopQueue();
}
