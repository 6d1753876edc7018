import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { PROJECT_ROOT } from './cluster';

function newest(dir: string): number {
  let t = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, e.name);
    t = Math.max(t, e.isDirectory() ? newest(p) : statSync(p).mtimeMs);
  }
  return t;
}

/** Builds the client when dist/ is missing or older than its sources (a second start is quick). */
export function buildClientIfStale(force = false): void {
  const out = path.join(PROJECT_ROOT, 'dist/client/index.html');
  const sources = ['src', 'shared', 'index.html', 'vite.config.ts', 'tailwind.config.ts'].map((p) => path.join(PROJECT_ROOT, p));
  const srcTime = Math.max(...sources.filter(existsSync).map((p) => (statSync(p).isDirectory() ? newest(p) : statSync(p).mtimeMs)));
  if (!force && existsSync(out) && statSync(out).mtimeMs >= srcTime) return;
  console.log('Building the client ...');
  const r = spawnSync(process.execPath, [path.join(PROJECT_ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
  });
  if (r.status !== 0) throw new Error('The client build failed (see above).');
}
