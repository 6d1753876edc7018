import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** Browser tests: the real server on loopback, driven by Debian's Chromium. One file at a time. */
export default defineConfig({
  resolve: { alias: { '@server': root('../../server'), '@shared': root('../../shared'), '@': root('../../src') } },
  test: {
    root: root('../..'),
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/global-setup.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    // A busy machine (several checkouts testing at once) can take longer than the 1 s default to redraw.
    expect: { poll: { timeout: 15_000 } },
    pool: 'forks',
  },
});
