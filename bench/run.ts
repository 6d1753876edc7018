/**
 * `npm run bench`: runs every bench/*.bench.ts in its own process, one after another (the machine
 * has two cores; parallel runs would skew each other), and sums up which met their targets.
 * `npm run bench -- still mentions` runs only those whose names contain a word given.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import path from 'node:path';

const dir = import.meta.dirname;
const filters = process.argv.slice(2);
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => filters.length === 0 || filters.some((w) => f.includes(w)))
  .sort();
const tsx = path.join(dir, '../node_modules/tsx/dist/cli.mjs');
const results: { file: string; ok: boolean; seconds: number }[] = [];
for (const f of files) {
  console.log(`\n== ${f}`);
  const t = performance.now();
  const r = spawnSync(process.execPath, [tsx, path.join(dir, f)], { stdio: 'inherit' });
  results.push({ file: f, ok: r.status === 0, seconds: (performance.now() - t) / 1000 });
}
console.log('\n== summary');
for (const r of results) console.log(`  ${r.ok ? 'met its targets ' : 'MISSED a target'}  ${r.file}  (${r.seconds.toFixed(0)} s)`);
process.exit(results.every((r) => r.ok) ? 0 : 1);
