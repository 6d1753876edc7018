import { afterAll } from 'vitest';
import { createApp } from '@server/app';
import { sequelize } from '@server/models';

/** One app per test file, closed with its database connections at the end. */
export function testApp(overrides: Parameters<typeof createApp>[0] = {}) {
  const app = createApp({ rateLimit: { signIn: 10_000 }, ...overrides });
  afterAll(async () => {
    await app.close();
  });
  return app;
}

afterAll(async () => {
  await sequelize.close().catch(() => {});
});
