/**
 * `npm run dev`: the API on :3000 (restarting on server changes via tsx watch) and Vite with hot
 * reload on :5173, proxying /api to it.
 */
import { spawn } from 'node:child_process';
import path from 'node:path';
import { APP_NEEDS, ensureDebianPackages } from './lib/system';
import { PROJECT_ROOT, ensureDatabase, startCluster } from './lib/cluster';
import { appEnv } from './lib/env';

ensureDebianPackages(APP_NEEDS);
startCluster();
await ensureDatabase('cardwright');
const env = { ...process.env, ...appEnv('dev', 3000), CARDWRIGHT_SKIP_BUILD: '1' };
const bin = (p: string) => path.join(PROJECT_ROOT, 'node_modules', p);
const api = spawn(process.execPath, [bin('tsx/dist/cli.mjs'), 'watch', '--clear-screen=false', 'scripts/start.ts'], {
  cwd: PROJECT_ROOT,
  env,
  stdio: 'inherit',
});
const vite = spawn(process.execPath, [bin('vite/bin/vite.js')], { cwd: PROJECT_ROOT, env, stdio: 'inherit' });
const stop = () => {
  api.kill('SIGTERM');
  vite.kill('SIGTERM');
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
