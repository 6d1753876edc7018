/**
 * Where a request's time goes: starts one load-bench app process under `node --cpu-prof`, counts
 * the SQL statements each target costs (signed in where the target needs it), loads each target
 * with autocannon, and prints the functions and packages with the most self time from the profile.
 *
 *   npx tsx bench/profile.ts [--seconds 10] [--target tutorial|studio|public|health]
 */
import { spawn } from 'node:child_process';
import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { createInterface } from 'node:readline';
import autocannon from 'autocannon';
import { PROJECT_ROOT } from '../scripts/lib/cluster';
import { numberArg } from './lib';
import { BenchClient } from './support/client';

const seconds = numberArg('seconds', 10);
const which = process.argv.includes('--target') ? process.argv[process.argv.indexOf('--target') + 1] : 'tutorial';
const dir = path.join(PROJECT_ROOT, 'bench/out/profiles');
rmSync(dir, { recursive: true, force: true });
mkdirSync(dir, { recursive: true });

const child = spawn(process.execPath, ['--cpu-prof', `--cpu-prof-dir=${dir}`, '--import', 'tsx', path.join(PROJECT_ROOT, 'bench/support/load-server.ts')], {
  cwd: PROJECT_ROOT,
  env: { ...process.env, BENCH_PORT: '3962', LOAD_FRESH: '1', LOAD_COUNT_QUERIES: '1' },
  stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
});
let info: { port: number; tutorialId: string; studioId: string; publicPath: string } | null = null;
for await (const line of createInterface({ input: child.stdout! })) {
  if (line.startsWith('{')) {
    info = JSON.parse(line);
    break;
  }
}
if (!info) throw new Error('the app process exited before it was ready');
const base = `http://127.0.0.1:${info.port}`;
const ask = () =>
  new Promise<{ queries: number; micros: number }>((resolve) => {
    child.once('message', resolve);
    child.send('queries');
  });
const queries = async () => (await ask()).queries;

const c = new BenchClient(base);
await c.signIn('maker@example.com', 'cardwright-demo');
const targets: Record<string, { path: string; headers: Record<string, string> }> = {
  health: { path: '/api/health', headers: {} },
  tutorial: { path: `/api/tutorials/${info.tutorialId}`, headers: { cookie: c.cookie } },
  studio: { path: `/api/studios/${info.studioId}/tutorials`, headers: { cookie: c.cookie } },
  public: { path: info.publicPath, headers: {} },
};

console.log('SQL statements per request (after one warm-up request):');
for (const [name, t] of Object.entries(targets)) {
  await fetch(base + t.path, { headers: t.headers });
  const before = await queries();
  const n = 20;
  for (let i = 0; i < n; i++) await fetch(base + t.path, { headers: t.headers }).then((r) => r.arrayBuffer());
  console.log(`  ${name.padEnd(9)} ${t.path.padEnd(60)} ${((await queries()) - before) / n}`);
}

const target = targets[which]!;
const from = (await ask()).micros;
const result = await autocannon({ url: base + target.path, headers: target.headers, connections: 32, duration: seconds });
console.log(
  `\n${which}: ${result.requests.average.toFixed(0)} req/s, p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, errors ${result.errors + result.non2xx}`,
);
const to = (await ask()).micros;
child.kill('SIGTERM');
await new Promise((r) => child.once('exit', r));

type Node = { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; hitCount: number };
const file = readdirSync(dir).find((f) => f.endsWith('.cpuprofile'));
if (!file) throw new Error('no profile was written');
const prof = JSON.parse(readFileSync(path.join(dir, file), 'utf8')) as { nodes: Node[]; samples: number[]; timeDeltas: number[]; startTime: number };
// Only the samples taken under load: set-up and seeding are left out.
const hits = new Map<number, number>();
let t = prof.startTime;
let total = 0;
prof.samples.forEach((id, i) => {
  t += prof.timeDeltas[i]!;
  if (t < from || t > to) return;
  hits.set(id, (hits.get(id) ?? 0) + 1);
  total++;
});
const byFn = new Map<string, number>();
const byPkg = new Map<string, number>();
for (const n of prof.nodes) {
  n.hitCount = hits.get(n.id) ?? 0;
  const url = n.callFrame.url.replace(/^file:\/\//, '');
  const pkg =
    /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url)?.[1] ??
    (url.startsWith(PROJECT_ROOT) ? 'cardwright' : url ? 'node' : n.callFrame.functionName || '(native)');
  const fn = `${n.callFrame.functionName || '(anonymous)'} ${path.relative(PROJECT_ROOT, url) || url}:${n.callFrame.lineNumber + 1}`;
  byFn.set(fn, (byFn.get(fn) ?? 0) + n.hitCount);
  byPkg.set(pkg, (byPkg.get(pkg) ?? 0) + n.hitCount);
}
const top = (m: Map<string, number>, k: number) => [...m].sort((a, b) => b[1] - a[1]).slice(0, k);
console.log(`\nSelf time by package (${total} samples under load):`);
for (const [k, v] of top(byPkg, 12)) console.log(`  ${((100 * v) / total).toFixed(1).padStart(5)} %  ${k}`);
console.log('\nSelf time by function:');
for (const [k, v] of top(byFn, 20)) console.log(`  ${((100 * v) / total).toFixed(1).padStart(5)} %  ${k}`);
console.log(`\nThe profile: ${path.join(dir, file)} (open it in Chrome DevTools' Performance panel).`);
