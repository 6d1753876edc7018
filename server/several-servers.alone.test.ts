import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, readFile } from 'node:fs/promises';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Recording, sequelize, Tutorial } from '@server/models';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import { s3Storage } from '@server/services/storage-s3';
import { testApp } from '../tests/harness/app';
import { makeStudio, TEST_PASSWORD, type StudioFixture } from '../tests/harness/factories';
import { fakeS3Env, fakeS3Settings } from '../tests/harness/s3';

/**
 * DESIGN.md's scale path on one machine: two app processes (WORKERS=off, each with a scratch
 * folder of its own and no shared disk) and one queue worker, against one database and the local
 * S3 fake. What one app server does, the other sees.
 */
const app = testApp();
const root = path.resolve(import.meta.dirname, '..');
const suffix = crypto.randomUUID().slice(0, 8);
// queues of this test's own, so no other worker takes its jobs
const queues = { QUEUE_PROCESS_RECORDING: `process-recording-2s-${suffix}`, QUEUE_PULL_STILL: `pull-still-2s-${suffix}` };
const children: ChildProcess[] = [];
let f: StudioFixture;
let clip: string;
let a: string;
let b: string;
const mediaDirs: string[] = [];

const freePort = () =>
  new Promise<number>((resolve) => {
    const srv = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });

/** A real process (an app server or a worker), resolved once it prints that it is ready. */
async function start(script: string, env: Record<string, string>): Promise<ChildProcess> {
  const mediaDir = await mkdtemp(path.join(os.tmpdir(), 'cardwright-2s-'));
  mediaDirs.push(mediaDir);
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, script)], {
    cwd: root,
    env: { ...process.env, ...fakeS3Env(), ...queues, MEDIA_DIR: mediaDir, ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  children.push(child);
  for await (const line of createInterface({ input: child.stdout! })) if (line.includes('"ready":true')) return child;
  throw new Error(`${script} stopped before it was ready`);
}

/** A browser's session over real HTTP: one cookie and CSRF token, sent to whichever server is asked. */
class Browser {
  cookie = '';
  csrf = '';
  async send(base: string, method: string, url: string, body?: object | FormData, headers: Record<string, string> = {}) {
    const form = body instanceof FormData;
    const res = await fetch(`${base}${url}`, {
      method,
      headers: {
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(this.csrf && method !== 'GET' ? { 'x-csrf-token': this.csrf } : {}),
        ...(body && !form ? { 'content-type': 'application/json' } : {}),
        ...headers,
      },
      body: form ? body : body ? JSON.stringify(body) : undefined,
    });
    const set = res.headers.getSetCookie().map((c) => c.split(';')[0]!);
    if (set.length) this.cookie = set.join('; ');
    const type = res.headers.get('content-type') ?? '';
    const data = type.includes('json') ? await res.json() : Buffer.from(await res.arrayBuffer());
    return { status: res.status, headers: res.headers, body: data as any };
  }
  async signIn(base: string, email: string) {
    const csrf = await this.send(base, 'GET', '/api/auth/csrf');
    this.csrf = csrf.body.token;
    const res = await this.send(base, 'POST', '/api/auth/sign-in', { email, password: TEST_PASSWORD });
    this.csrf = res.body.csrfToken ?? this.csrf;
    return res;
  }
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

beforeAll(async () => {
  f = await makeStudio(app);
  clip = await colourSteps(await tempDir());
  const [pa, pb] = [await freePort(), await freePort()];
  a = `http://127.0.0.1:${pa}`;
  b = `http://127.0.0.1:${pb}`;
  await Promise.all([
    start('server/app-process.ts', { PORT: String(pa), WORKERS: 'off', PUBLIC_URL: a }),
    start('server/app-process.ts', { PORT: String(pb), WORKERS: 'off', PUBLIC_URL: b }),
    start('server/jobs/worker-process.ts', {}),
  ]);
}, 180_000);

afterAll(() => {
  for (const c of children) if (c.exitCode === null) c.kill('SIGTERM');
});

describe('two app servers, one database, one bucket, one worker', () => {
  let recordingId = '';
  const maker = new Browser();

  it('a session made on one server is valid on the other', async () => {
    expect((await maker.signIn(a, f.users.maker.email)).status).toBe(200);
    const me = await maker.send(b, 'GET', '/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user?.email ?? me.body.email).toBe(f.users.maker.email);
  });

  it('an upload through one is stored in the bucket (no app disk), processed by the worker, and streams with ranges through the other', async () => {
    const form = new FormData();
    form.append('file', new Blob([await readFile(clip)], { type: 'video/mp4' }), 'steps.mp4');
    const up = await maker.send(a, 'POST', `/api/tutorials/${f.tutorial.id}/recordings`, form);
    expect(up.status).toBe(201);
    recordingId = up.body.id;
    const rec = (await Recording.findByPk(recordingId))!;
    expect(await s3Storage(fakeS3Settings()).exists(rec.sourceKey)).toBe(true);
    for (const dir of mediaDirs) expect(existsSync(path.join(dir, 'recordings', recordingId)), dir).toBe(false);

    const ready = await until(
      'the worker to process the upload',
      async () => {
        const r = await maker.send(b, 'GET', `/api/recordings/${recordingId}`);
        return r.body.status === 'ready' && r.body;
      },
      120_000,
    );
    expect(ready).toMatchObject({ width: 160, height: 120, durationMs: 5000 });
    const part = await maker.send(b, 'GET', `/media/recordings/${recordingId}/preview.mp4`, undefined, { range: 'bytes=0-99' });
    expect(part.status).toBe(206);
    expect(part.headers.get('content-range')).toMatch(/^bytes 0-99\/\d+$/);
    expect((part.body as Buffer).length).toBe(100);
    // an ISO BMFF file starts with its ftyp box (ISO/IEC 14496-12 §4.3)
    expect((part.body as Buffer).subarray(4, 8).toString('latin1')).toBe('ftyp');
  });

  it('a still asked for through one server is made by the worker and served by the other', async () => {
    const pulled = await maker.send(a, 'POST', `/api/recordings/${recordingId}/stills`, { atMs: 2500, mode: 'exact' });
    expect(pulled.status).toBe(201);
    const [[{ n }]] = (await sequelize.query(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = $1 AND state = 'completed'`, {
      bind: [queues.QUEUE_PULL_STILL],
    })) as [[{ n: number }], unknown];
    expect(n).toBe(1);
    const img = await maker.send(b, 'GET', `/media/stills/${pulled.body.id}.jpg`);
    expect(img.status).toBe(200);
    expect(img.headers.get('content-type')).toMatch(/image\/jpeg/);
    // a JPEG starts with SOI, FF D8 (ITU-T T.81 Annex B)
    expect([...(img.body as Buffer).subarray(0, 2)]).toEqual([0xff, 0xd8]);
    // after the last frame (4.96 s at 25 fps) ffmpeg finds none: the worker's refusal comes back as the 400 it is in process
    const late = await maker.send(a, 'POST', `/api/recordings/${recordingId}/stills`, { atMs: 4999, mode: 'exact' });
    expect(late.status).toBe(400);
    expect(late.body.error).toMatch(/no frame at 0:04/);
  });

  it('the write-up version check holds across the two: two writers on one version, one per server, exactly one wins', async () => {
    const other = new Browser();
    expect((await other.signIn(b, f.users.coordinator.email)).status).toBe(200);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const { version } = (await maker.send(a, 'GET', url)).body;
    const doc = (t: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: t }] }] });
    const [ra, rb] = await Promise.all([
      maker.send(a, 'PUT', url, { doc: doc('Score the base at 2 1/8 in.'), version }),
      other.send(b, 'PUT', url, { doc: doc('Fold along the score lines.'), version }),
    ]);
    expect([ra.status, rb.status].sort()).toEqual([200, 409]);
  });

  it('a change made through one server reaches the public page the other has cached', async () => {
    await Tutorial.update({ state: 'published', publishedAt: new Date() }, { where: { id: f.tutorial.id } });
    const here = `/t/${f.studio.slug}/${f.tutorial.slug}`;
    const reader = new Browser();
    const first = await reader.send(b, 'GET', here);
    expect(first.status).toBe(200);
    const owner = new Browser();
    await owner.signIn(a, f.users.owner.email);
    const name = `Lantern Fold ${suffix}`;
    expect((await owner.send(a, 'PATCH', `/api/studios/${f.studio.id}`, { name })).status).toBe(200);
    await until('server b to show the new name', async () => (await reader.send(b, 'GET', here)).body.toString().includes(name), 5000);
  });

  it('a member removed or signed out through one server is refused by the other, which had them kept', async () => {
    const student = new Browser();
    expect((await student.signIn(a, f.users.student.email)).status).toBe(200);
    const url = `/api/studios/${f.studio.id}`;
    for (let i = 0; i < 3; i++) expect((await student.send(b, 'GET', url)).status).toBe(200); // b keeps the person now
    const owner = new Browser();
    await owner.signIn(b, f.users.owner.email);
    expect((await owner.send(b, 'GET', url)).status).toBe(200);
    expect((await owner.send(a, 'DELETE', `${url}/members/${f.users.student.id}`)).status).toBe(204);
    // b hears of the change by NOTIFY, milliseconds after a's commit.
    await until('server b to refuse the removed member', async () => (await student.send(b, 'GET', url)).status === 404, 2000);
    // The old cookie is sent again after signing out (as a thief who copied it would): b must refuse it.
    const cookie = owner.cookie;
    expect((await owner.send(a, 'POST', '/api/auth/sign-out')).status).toBe(204);
    owner.cookie = cookie;
    await until('server b to refuse the ended session', async () => (await owner.send(b, 'GET', url)).status === 401, 2000);
  });
});
