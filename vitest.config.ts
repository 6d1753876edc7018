import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const alias = { '@server': root('./server'), '@shared': root('./shared'), '@': root('./src') };

/**
 * Two projects: `unit` needs nothing but Node (and ffmpeg for media services),
 * `api` runs against the real PostgreSQL test database that scripts/test.ts prepares.
 * Browser tests live in tests/e2e with their own config.
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
        test: { name: 'unit', include: ['shared/**/*.test.ts', 'scripts/**/*.test.ts', 'src/**/*.test.ts', 'server/services/media/**/*.test.ts', 'server/services/article/**/*.test.ts', 'server/services/publish/**/*.test.ts'], testTimeout: 60_000 },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['server/**/*.test.ts'],
          exclude: ['server/services/media/**', 'server/services/article/**', 'server/services/publish/**'],
          globalSetup: ['tests/harness/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
