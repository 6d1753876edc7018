import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const alias = { '@server': root('./server'), '@shared': root('./shared'), '@': root('./src') };

/**
 * Three projects: `unit` needs nothing but Node (and ffmpeg for media services),
 * `api` runs against the real PostgreSQL test database that scripts/test.ts prepares, and
 * `alone` holds tests that kill and restart worker processes (`*.alone.test.ts`): scripts/test.ts
 * runs them in a pass of their own, after the others, so no other file's queue worker sweeps up
 * the job they interrupt on purpose. Browser tests live in tests/e2e with their own config.
 */
export default defineConfig({
  resolve: { alias },
  test: {
    testTimeout: 30_000,
    hookTimeout: 120_000,
    pool: 'forks',
    maxWorkers: 2,
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          include: [
            'shared/**/*.test.ts',
            'scripts/**/*.test.ts',
            'src/**/*.test.ts',
            'server/services/media/**/*.test.ts',
            'server/services/article/**/*.test.ts',
            'server/services/publish/**/*.test.ts',
          ],
          testTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['server/**/*.test.ts'],
          exclude: ['server/services/media/**', 'server/services/article/**', 'server/services/publish/**', '**/*.alone.test.ts'],
          globalSetup: ['tests/harness/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'alone',
          include: ['server/**/*.alone.test.ts'],
          globalSetup: ['tests/harness/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
