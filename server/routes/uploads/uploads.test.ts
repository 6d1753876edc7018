import type { AddressInfo } from 'node:net';
import type { Server as HttpServer } from 'node:http';
import { createHash, randomBytes } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Upload, type DetailedError, type UploadOptions } from 'tus-js-client';
import { Recording, sequelize } from '@server/models';
import { storage } from '@server/services/storage';
import { resumableDir, sweepStaleUploads } from '@server/services/resumable-uploads';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

// A 10 MB limit so the size refusal needs no large file.
const MAX = 10_000_000;
const app = testApp({ config: { maxUploadBytes: MAX } as never });
let server: HttpServer;
let endpoint: string;
let f: StudioFixture;
let video: Buffer;
let auth: Record<string, string>;

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

beforeAll(async () => {
  const dir = await tempDir();
  // a real MP4 followed by random bytes: 4 MB, so 40 % falls in the middle of a stream
  video = Buffer.concat([readFileSync(await colourSteps(dir)), randomBytes(4_000_000)]);
  f = await makeStudio(app);
  server = app.listen(0);
  endpoint = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/uploads`;
  const c = await f.clientFor('maker');
  const token = await c.token();
  const cookie = (await c.agent.get('/api/auth/me')).request.cookies as unknown as string;
  auth = { cookie, 'x-csrf-token': token };
});
afterAll(() => {
  server?.close();
});

/** A tus client as the Footage section makes one: the session's cookie and CSRF token on every request. */
function tusUpload(file: Buffer, o: Partial<UploadOptions> & { filename?: string } = {}) {
  return new Upload(file, {
    endpoint,
    headers: auth,
    metadata: { tutorialId: f.tutorial.id, filename: o.filename ?? 'steps.mp4' },
    retryDelays: null,
    ...o,
  });
}

/**
 * Starts an upload and stops it (as a closed laptop would) once `fraction` of the bytes went out.
 * On loopback the whole file would go before the first progress event, so it goes in 200 KB PATCHes.
 */
function stopAt(file: Buffer, fraction: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const up = tusUpload(file, {
      chunkSize: 200_000,
      onProgress(sent, total) {
        if (sent / total >= fraction) void up.abort().then(() => resolve(up.url!));
      },
      onError: reject,
      onSuccess: () => reject(new Error('finished before it was stopped')),
    });
    up.start();
  });
}

const headOffset = async (url: string) => {
  const res = await fetch(url, { method: 'HEAD', headers: { ...auth, 'tus-resumable': '1.0.0' } });
  return { status: res.status, offset: Number(res.headers.get('upload-offset')) };
};

/** Waits until the server has written what it received before the stop. */
async function settledOffset(url: string) {
  let last = -1;
  for (let i = 0; i < 40; i++) {
    const { offset } = await headOffset(url);
    if (offset === last) return offset;
    last = offset;
    await new Promise((r) => setTimeout(r, 100));
  }
  return last;
}

describe('resumable recording uploads (tus 1.0, tus.io/protocols/resumable-upload)', () => {
  it('stopped at 40 % and continued by a new client from the stored URL, it completes byte-identical and is queued once', async () => {
    const url = await stopAt(video, 0.4);
    const offset = await settledOffset(url);
    expect(offset, 'the bytes before the stop were kept').toBeGreaterThan(0);
    expect(offset).toBeLessThan(video.length);
    const id = url.split('/').pop()!;
    expect(await Recording.findByPk(id), 'no row until the upload completes').toBeNull();

    // a new page: a new client that knows only the URL the first one stored
    const body = await new Promise<string>((resolve, reject) => {
      const up = tusUpload(video, { uploadUrl: url, onError: reject, onSuccess: ({ lastResponse }) => resolve(lastResponse.getBody()) });
      up.start();
    });
    const rec = await Recording.findByPk(id);
    expect(rec, JSON.stringify(body)).not.toBeNull();
    expect(JSON.parse(body).id).toBe(id);
    expect(rec!.sizeBytes).toBe(video.length);
    expect(rec!.originalName).toBe('steps.mp4');
    expect(rec!.mime).toBe('video/mp4');
    expect(sha256(await storage.read(rec!.sourceKey))).toBe(sha256(video));
    const [jobs] = await sequelize.query(`SELECT count(*)::int AS n FROM pgboss.job WHERE data->>'recordingId' = :id`, { replacements: { id } });
    expect((jobs as { n: number }[])[0].n, 'queued for processing once').toBe(1);
    // the partial files are gone and the URL no longer answers
    expect(existsSync(path.join(resumableDir, id))).toBe(false);
    expect((await headOffset(url)).status).toBe(404);
  });

  it('refuses a text file named .mp4 with words (415), keeping nothing', async () => {
    const before = readdirSync(resumableDir).filter((n) => !n.startsWith('.'));
    const text = Buffer.from('Cut the base 4 1/4 by 5 1/2 and score at 2 1/8.\n'.repeat(200));
    const err = await new Promise<DetailedError>((resolve, reject) => {
      tusUpload(text, {
        filename: 'notes.mp4',
        onError: (e) => resolve(e as DetailedError),
        onSuccess: () => reject(new Error('a text file was taken')),
      }).start();
    });
    expect(err.originalResponse?.getStatus()).toBe(415);
    expect(JSON.parse(err.originalResponse!.getBody()).error).toMatch(/text, not a video/);
    expect(await Recording.count({ where: { tutorialId: f.tutorial.id, originalName: 'notes.mp4' } })).toBe(0);
    expect(
      readdirSync(resumableDir).filter((n) => !n.startsWith('.')),
      'no partial file or metadata left',
    ).toEqual(before);
  });

  it('refuses a file over the size limit before a byte is sent (413 with the limit in words)', async () => {
    const b64 = (s: string) => Buffer.from(s).toString('base64');
    const res = await fetch(endpoint, {
      method: 'POST',
      headers: {
        ...auth,
        'tus-resumable': '1.0.0',
        'upload-length': String(MAX + 1),
        'upload-metadata': `tutorialId ${b64(f.tutorial.id)},filename ${b64('big.mp4')}`,
      },
    });
    expect(res.status).toBe(413);
    expect((await res.json()).error).toBe('The recording is larger than the 10 MB limit');
  });

  it('a partial upload nobody continued is removed by the sweep, leaving no row', async () => {
    const url = await stopAt(video, 0.4);
    await settledOffset(url);
    const id = url.split('/').pop()!;
    const info = path.join(resumableDir, `${id}.json`);
    expect(existsSync(path.join(resumableDir, id))).toBe(true);
    // a recent partial stays
    await sweepStaleUploads();
    expect(existsSync(info)).toBe(true);
    // started three days ago (past the 48-hour expiry)
    const meta = JSON.parse(readFileSync(info, 'utf8'));
    writeFileSync(info, JSON.stringify({ ...meta, creation_date: new Date(Date.now() - 3 * 86_400_000).toISOString() }));
    expect(await sweepStaleUploads()).toBeGreaterThanOrEqual(1);
    expect(existsSync(info)).toBe(false);
    expect(existsSync(path.join(resumableDir, id))).toBe(false);
    expect((await headOffset(url)).status).toBe(404);
    expect(await Recording.findByPk(id)).toBeNull();
  });
  it('an upload whose last byte arrived but whose answer was lost is kept at the next HEAD, once', async () => {
    const b64 = (s: string) => Buffer.from(s).toString('base64');
    const created = await fetch(endpoint, {
      method: 'POST',
      headers: {
        ...auth,
        'tus-resumable': '1.0.0',
        'upload-length': String(video.length),
        'upload-metadata': `tutorialId ${b64(f.tutorial.id)},filename ${b64('lid.mp4')}`,
      },
    });
    expect(created.status).toBe(201);
    const url = new URL(created.headers.get('location')!, endpoint).toString();
    const id = url.split('/').pop()!;
    // every byte on the server's disk, as if the process stopped before it kept the recording
    writeFileSync(path.join(resumableDir, id), video);
    expect(await Recording.findByPk(id)).toBeNull();
    const head = await headOffset(url);
    expect(head).toEqual({ status: 200, offset: video.length });
    const rec = await Recording.findByPk(id);
    expect(sha256(await storage.read(rec!.sourceKey))).toBe(sha256(video));
    // the client's next look finds it done, not a fresh start
    expect((await headOffset(url)).status).toBe(404);
    expect(await Recording.count({ where: { id } })).toBe(1);
  });
});
