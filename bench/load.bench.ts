/**
 * Load on the app, in one run against a fresh `cardwright_load` database seeded with the demo
 * studio: autocannon with 32 connections for 20 s a target, each figure printed beside
 * `/api/health` (no database) measured in the same run, first against one app process, then
 * against two processes sharing the database, the connections split round-robin between them.
 *
 * Targets (issue 16; "today" = before the public-page cache and the lean session, measured on
 * this machine: health ~2,500/s with p99 33 ms, tutorial API ~300/s with p99 220 ms, public page ~150/s):
 *  - public page: at least 10x today's rate (>= 1,500/s, or 0.6x the health baseline of the same
 *    run when the machine is slower) and p99 under 50 ms;
 *  - signed-in API reads: at least 3x today's rate (>= 900/s, or 0.36x health) and p99 under 50 ms;
 *  - 0 errors everywhere.
 *
 *   npx tsx bench/load.bench.ts [--seconds 20] [--connections 32] [--one]
 */
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { createInterface } from 'node:readline';
import autocannon from 'autocannon';
import { PROJECT_ROOT } from '../scripts/lib/cluster';
import { numberArg } from './lib';
import { BenchClient } from './support/client';

type Server = { port: number; pid: number; tutorialId: string; studioId: string; publicPath: string; child: ChildProcess };
type Target = { name: string; path: string; headers?: Record<string, string>; okStatus?: number; rate?: { floor: number; ofHealth: number } };
type Figures = { rps: number; p50: number; p99: number; errors: number; total: number };

const seconds = numberArg('seconds', 20);
const connections = numberArg('connections', 32);
const onlyOne = process.argv.includes('--one');

async function startLoadServer(port: number, fresh: boolean): Promise<Server> {
  const child = spawn(process.execPath, [path.join(PROJECT_ROOT, 'node_modules/tsx/dist/cli.mjs'), path.join(PROJECT_ROOT, 'bench/support/load-server.ts')], {
    cwd: PROJECT_ROOT,
    env: { ...process.env, BENCH_PORT: String(port), LOAD_FRESH: fresh ? '1' : '0' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  for await (const line of createInterface({ input: child.stdout! })) {
    if (line.startsWith('{')) return { ...JSON.parse(line), child };
  }
  throw new Error('the load server exited before it was ready');
}

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

/** Runs one autocannon per port at once, the connections split between them, and merges every response's latency. */
async function load(ports: number[], target: Target): Promise<Figures> {
  const latencies: number[] = [];
  let errors = 0;
  let total = 0;
  const okStatus = target.okStatus ?? 200;
  const per = Math.ceil(connections / ports.length);
  const runs = ports.map(
    (port) =>
      new Promise<void>((resolve, reject) => {
        const instance = autocannon(
          { url: `http://127.0.0.1:${port}${target.path}`, connections: per, duration: seconds, headers: target.headers ?? {} },
          (err, result) => {
            if (err) return reject(err);
            errors += result.errors + result.timeouts;
            resolve();
          },
        );
        instance.on('response', (_client, statusCode, _bytes, responseTime) => {
          total++;
          if (statusCode !== okStatus) errors++;
          latencies.push(responseTime);
        });
      }),
  );
  await Promise.all(runs);
  latencies.sort((a, b) => a - b);
  return { rps: total / seconds, p50: percentile(latencies, 50), p99: percentile(latencies, 99), errors, total };
}

const fmt = (f: Figures) =>
  `${f.rps.toFixed(0).padStart(6)} req/s  p50 ${f.p50.toFixed(1).padStart(6)} ms  p99 ${f.p99.toFixed(1).padStart(6)} ms  errors ${f.errors}`;

/** Prints a target's figures beside health, with its verdict; true when it met its targets. */
function report(target: Target, f: Figures, health: Figures): boolean {
  const ratio = f.rps / health.rps;
  let ok = f.errors === 0;
  let verdict = '';
  if (target.rate) {
    const rateOk = f.rps >= target.rate.floor || ratio >= target.rate.ofHealth;
    const p99Ok = f.p99 < 50;
    ok = ok && rateOk && p99Ok;
    // The p99 beside health's own: on a slower machine a request that does no work has a long tail too.
    verdict = `  [rate >= ${target.rate.floor}/s or ${target.rate.ofHealth}x health: ${rateOk ? 'OK' : 'SLOW'}; p99 < 50 ms: ${p99Ok ? 'OK' : 'SLOW'} (${(f.p99 / health.p99).toFixed(2)}x health's p99)]`;
  }
  console.log(`  ${target.name.padEnd(30)} ${fmt(f)}  (${ratio.toFixed(2)}x health)${verdict}${f.errors ? '  ERRORS' : ''}`);
  return ok;
}

async function phase(label: string, ports: number[], targets: Target[]): Promise<boolean> {
  console.log(`\n${label} (${connections} connections, ${seconds} s each):`);
  const health = await load(ports, { name: 'GET /api/health (baseline)', path: '/api/health' });
  let ok = report({ name: 'GET /api/health (baseline)', path: '' }, health, health);
  for (const t of targets) ok = report(t, await load(ports, t), health) && ok;
  return ok;
}

const first = await startLoadServer(3960, true);
const servers = [first];
try {
  const c = new BenchClient(`http://127.0.0.1:${first.port}`);
  await c.signIn('maker@example.com', 'cardwright-demo');
  if (!c.cookie) throw new Error('could not sign in as the demo maker');
  const page = await fetch(`http://127.0.0.1:${first.port}${first.publicPath}`);
  if (page.status !== 200) throw new Error(`the public page answered ${page.status}`);
  const etag = page.headers.get('etag');
  const signedIn = { cookie: c.cookie };
  const api = { floor: 900, ofHealth: 0.36 };
  const targets: Target[] = [
    { name: 'GET /api/tutorials/:id', path: `/api/tutorials/${first.tutorialId}`, headers: signedIn, rate: api },
    { name: 'GET /api/studios/:id/tutorials', path: `/api/studios/${first.studioId}/tutorials`, headers: signedIn, rate: api },
    { name: 'GET /t/:studio/:tutorial', path: first.publicPath, rate: { floor: 1500, ofHealth: 0.6 } },
  ];
  if (etag) targets.push({ name: 'same, If-None-Match (304)', path: first.publicPath, headers: { 'if-none-match': etag }, okStatus: 304 });
  let ok = await phase('One app process', [first.port], targets);
  if (!onlyOne) {
    servers.push(await startLoadServer(3961, false));
    ok = (await phase('Two app processes, one database, connections split round-robin', [3960, 3961], targets)) && ok;
  }
  console.log(`\n${ok ? 'Met every target.' : 'MISSED a target.'} Each figure is one ${seconds} s run; read it beside health from the same phase.`);
  process.exitCode = ok ? 0 : 1;
} finally {
  for (const s of servers) s.child.kill('SIGTERM');
}
