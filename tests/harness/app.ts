import { afterAll } from 'vitest';
import { createApp } from '@server/app';
import { sequelize } from '@server/models';
import { stopQueue } from '@server/jobs/queue';

/** One app per test file, closed with its database connections at the end. */
export function testApp(overrides: Parameters<typeof createApp>[0] = {}) {
  const app = createApp({ rateLimit: { signIn: 10_000, signUpTaken: 10_000 }, ...overrides });
  afterAll(async () => {
    await app.close();
  });
  return app;
}

afterAll(async () => {
  // Classes queue reminders and hold expiries: the file's queue connection closes with it.
  await stopQueue().catch(() => {});
  await sequelize.close().catch(() => {});
});
