import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { afterAll, describe, expect, it } from 'vitest';
import { Tutorial } from '@server/models';
import { TEST_PASSWORD, makeStudio } from '../../tests/harness/factories';
import { testApp } from '../../tests/harness/app';
import { mailTo } from '../../tests/harness/mail';

const app = testApp();
const root = path.resolve(import.meta.dirname, '../..');
// A queue of this test's own, so workers of other test files never take its job.
const queue = `publish-tutorial-restart-${crypto.randomUUID().slice(0, 8)}`;
const children: ChildProcess[] = [];

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const srv = net.createServer().once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });

/** A real app process (server/app-process.ts: HTTP and the queue workers), resolved once it listens. */
async function startApp(port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server/app-process.ts')], {
    cwd: root,
    env: { ...process.env, PORT: String(port), QUEUE_PUBLISH_TUTORIAL: queue },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  children.push(child);
  for await (const line of createInterface({ input: child.stdout! })) if (line.includes('"ready":true')) return child;
  throw new Error('the app process stopped before it was ready');
}

async function stop(child: ChildProcess, signal: NodeJS.Signals) {
  const exited = new Promise((r) => child.once('exit', r));
  child.kill(signal);
  await exited;
}

async function until<T>(what: string, fn: () => Promise<T | null | undefined | false>, ms: number): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** Signs in over real HTTP and returns a caller that keeps the cookie and sends the CSRF token. */
async function signedIn(base: string, email: string) {
  let cookie = '';
  const call = async (method: string, url: string, body?: object, token?: string) => {
    const res = await fetch(base + url, {
      method,
      headers: { 'content-type': 'application/json', cookie, ...(token ? { 'x-csrf-token': token } : {}) },
      body: body ? JSON.stringify(body) : undefined,
    });
    const set = res.headers.getSetCookie().map((c) => c.split(';')[0]);
    if (set.length) cookie = set.join('; ');
    return { status: res.status, body: (await res.json().catch(() => null)) as Record<string, unknown> | null };
  };
  const csrf = async () => (await call('GET', '/api/auth/csrf')).body!.token as string;
  expect((await call('POST', '/api/auth/sign-in', { email, password: TEST_PASSWORD }, await csrf())).status).toBe(200);
  const token = await csrf();
  return (method: string, url: string, body?: object) => call(method, url, body, token);
}

afterAll(() => {
  for (const c of children) if (c.exitCode === null) c.kill('SIGKILL');
});

describe('a scheduled publish across a restart', () => {
  it('scheduled through one app process, which is then stopped, it is published by the next one to start', async () => {
    const f = await makeStudio(app);
    await f.tutorial.update({ state: 'approved' });
    const port = await freePort();
    const first = await startApp(port);
    const api = await signedIn(`http://127.0.0.1:${port}`, f.users.coordinator.email);
    // The schedule's floor is a minute ahead; the test then moves the job's time up so it is due while no app runs.
    const at = new Date(Date.now() + 90_000);
    const res = await api('PUT', `/api/tutorials/${f.tutorial.id}/schedule`, { at: at.toISOString(), timeZone: 'Europe/London' });
    expect(res.status).toBe(200);
    await stop(first, 'SIGTERM');

    // While no app process runs, the time comes and goes: nothing publishes it.
    const soon = new Date(Date.now() + 2_000);
    await Tutorial.update({ publishAt: soon }, { where: { id: f.tutorial.id } });
    await Tutorial.sequelize!.query(`UPDATE pgboss.job SET start_after = :soon, data = jsonb_set(data, '{at}', to_jsonb(:iso::text)) WHERE name = :queue`, {
      replacements: { soon, iso: soon.toISOString(), queue },
    });
    await new Promise((r) => setTimeout(r, 4_000));
    expect((await Tutorial.findByPk(f.tutorial.id))!.state).toBe('approved');

    // The next app process takes the waiting job and publishes it.
    const second = await startApp(port);
    const t = await until('the tutorial to be published', async () => ((await Tutorial.findByPk(f.tutorial.id))!.state === 'published' ? true : null), 60_000);
    expect(t).toBe(true);
    for (const u of [f.users.maker, f.users.coordinator]) expect((await mailTo(u.email, /is published/, 20)).text).toContain('went out as scheduled');
    await stop(second, 'SIGTERM');
  }, 180_000);
});
