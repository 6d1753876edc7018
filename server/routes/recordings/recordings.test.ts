import type { AddressInfo } from 'node:net';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cue, Recording, Tutorial } from '@server/models';
import { config } from '@server/config';
import { processRecording } from '@server/jobs/process-recording';
import { startWorkers, stopQueue } from '@server/jobs';
import { colourSteps, ffmpegMake, nearestStep, pixelAt, tempDir } from '@server/services/media/test-clips';
import { createApp } from '@server/app';
import { testApp } from '../../../tests/harness/app';
import { TestClient } from '../../../tests/harness/client';
import { makeStudio, TEST_PASSWORD, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();
let dir: string;
let clip: string;
let f: StudioFixture;

beforeAll(async () => {
  dir = await tempDir();
  clip = await colourSteps(dir);
  f = await makeStudio(app);
});
afterAll(async () => {
  await stopQueue();
});

const tmpFiles = () => (existsSync(path.join(config.mediaDir, 'tmp')) ? readdirSync(path.join(config.mediaDir, 'tmp')) : []);

async function uploadClip(file = clip, name = 'steps.mp4') {
  const c = await f.clientFor('maker');
  const res = await c.upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', file, name);
  return res;
}

async function readyRecording() {
  const res = await uploadClip();
  expect(res.status).toBe(201);
  await processRecording(res.body.id);
  return res.body.id as string;
}

describe('POST /api/tutorials/:id/recordings', () => {
  it('401 signed out, 400 without a file, 403 for a student, 404 for an outsider', async () => {
    // Refusals come before the body is read: a small body, so the client has sent it all before the answer
    // (a large one can meet a closed socket, EPIPE, when the refusal is quick).
    const small = Buffer.from('not read');
    expect((await (await f.clientFor('anonymous')).upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', small, 'a.mp4')).status).toBe(401);
    const maker = await f.clientFor('maker');
    const none = await maker.post(`/api/tutorials/${f.tutorial.id}/recordings`, {});
    expect(none.status).toBe(400);
    expect((await (await f.clientFor('student')).upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', small, 'a.mp4')).status).toBe(403);
    expect((await (await f.clientFor('outsider')).upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', small, 'a.mp4')).status).toBe(404);
  });

  it('refuses a text file renamed .mp4 with 415 by its signature (OWASP File Upload), leaving no row and no file', async () => {
    const fake = path.join(dir, 'notes.mp4');
    writeFileSync(fake, 'Cut the base 4 1/4 by 5 1/2 and score at 2 1/8.\n'.repeat(50));
    const before = await Recording.count({ where: { tutorialId: f.tutorial.id } });
    const res = await uploadClip(fake, 'notes.mp4');
    expect(res.status).toBe(415);
    // what it found first, then what to do
    expect(res.body.error).toBe('“notes.mp4” is text, not a video. Upload the recording itself: an MP4, MOV, WebM or MKV file.');
    expect(await Recording.count({ where: { tutorialId: f.tutorial.id } })).toBe(before);
    expect(tmpFiles()).toEqual([]);
  });

  it('says a picture is a picture (its PNG signature), not a video', async () => {
    const png = await ffmpegMake(path.join(dir, 'cover.mp4.png'), ['-f', 'lavfi', '-i', 'color=c=red:s=8x8', '-frames:v', '1', '-f', 'image2']);
    const res = await uploadClip(png, 'cover.mp4');
    expect(res.status).toBe(415);
    expect(res.body.error).toBe('“cover.mp4” is a picture (PNG), not a video. Upload the recording itself: an MP4, MOV, WebM or MKV file.');
  });

  it('stores a video under a generated name and processes it: probe, 720p preview, poster, thumbnails', async () => {
    const res = await uploadClip(clip, '../../etc/passwd.mp4');
    expect(res.status).toBe(201);
    // The name is kept for display only, without any path; the file gets a generated name.
    expect(res.body).toMatchObject({ status: 'uploaded', originalName: 'passwd.mp4' });
    const rec = await Recording.findByPk(res.body.id);
    expect(rec!.sourceKey).toBe(`recordings/${rec!.id}/source.mp4`);
    await processRecording(rec!.id);
    const got = await (await f.clientFor('coordinator')).get(`/api/recordings/${rec!.id}`);
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ status: 'ready', progress: 100, width: 160, height: 120, durationMs: 5000 });
    expect(got.body.previewUrl).toMatch(/preview\.mp4/);
    expect(got.body.thumbnails.sheets.length).toBeGreaterThan(0);
    expect(tmpFiles()).toEqual([]);
  });

  it('a queue worker picks the upload up and the status moves to ready', async () => {
    await startWorkers();
    const res = await uploadClip();
    let status = res.body.status;
    for (let i = 0; i < 120 && status !== 'ready' && status !== 'failed'; i++) {
      await new Promise((r) => setTimeout(r, 250));
      status = (await Recording.findByPk(res.body.id))!.status;
    }
    expect(status).toBe('ready');
  });

  it('an upload cut off half way leaves no row and no file behind', async () => {
    const server = app.listen(0);
    const port = (server.address() as AddressInfo).port;
    const c = await f.clientFor('maker');
    const token = await c.token();
    const cookie = (await c.agent.get('/api/auth/me')).request.cookies as unknown as string;
    const before = await Recording.count({ where: { tutorialId: f.tutorial.id } });
    let during = 0;
    await new Promise<void>((resolve) => {
      const req = http.request({
        host: '127.0.0.1',
        port,
        path: `/api/tutorials/${f.tutorial.id}/recordings`,
        method: 'POST',
        headers: { cookie, 'x-csrf-token': token, 'content-type': 'multipart/form-data; boundary=XyZ', 'content-length': 50_000_000 },
      });
      req.on('error', () => resolve());
      req.write('--XyZ\r\nContent-Disposition: form-data; name="file"; filename="big.mp4"\r\nContent-Type: video/mp4\r\n\r\n');
      req.write(readFileSync(clip));
      // Give the server time to start writing the file, then drop the connection.
      setTimeout(() => {
        during = tmpFiles().length;
        req.destroy();
        resolve();
      }, 300);
    });
    for (let i = 0; i < 40 && tmpFiles().length > 0; i++) await new Promise((r) => setTimeout(r, 100));
    server.close();
    expect(during, 'the partial upload was being written').toBe(1);
    expect(tmpFiles()).toEqual([]);
    expect(await Recording.count({ where: { tutorialId: f.tutorial.id } })).toBe(before);
  });

  it('refuses a file over the size limit with 413 and keeps nothing (OWASP File Upload: size limit)', async () => {
    const small = createApp({ config: { maxUploadBytes: 1000 }, rateLimit: { signIn: 10_000 } });
    const c = new TestClient(small);
    await c.signIn(f.users.maker.email, TEST_PASSWORD);
    const before = await Recording.count({ where: { tutorialId: f.tutorial.id } });
    const res = await c.upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', clip, 'steps.mp4');
    expect(res.status).toBe(413);
    expect(res.body.error).toBe('The recording is larger than the 1 KB limit');
    expect(await Recording.count({ where: { tutorialId: f.tutorial.id } })).toBe(before);
    for (let i = 0; i < 20 && tmpFiles().length > 0; i++) await new Promise((r) => setTimeout(r, 100));
    expect(tmpFiles()).toEqual([]);
    await small.close();
  });

  it('a truncated file fails processing with a readable reason', async () => {
    const cut = path.join(dir, 'cut.mp4');
    writeFileSync(cut, readFileSync(clip).subarray(0, 2048));
    const res = await uploadClip(cut, 'cut.mp4');
    expect(res.status).toBe(201);
    await processRecording(res.body.id);
    const rec = await Recording.findByPk(res.body.id);
    expect(rec!.status).toBe('failed');
    expect(rec!.error).toMatch(/could not be read|not|video/i);
  });
});

describe('media serving', () => {
  it('answers Range requests with 206 and the exact bytes (RFC 9110 range requests)', async () => {
    const id = await readyRecording();
    const rec = await Recording.findByPk(id);
    const whole = readFileSync(path.join(config.mediaDir, rec!.previewKey!));
    const c = await f.clientFor('maker');
    const res = await c
      .get(`/media/recordings/${id}/preview.mp4`)
      .set('Range', 'bytes=100-199')
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (d: Buffer) => chunks.push(d));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(206);
    expect(res.headers['content-range']).toBe(`bytes 100-199/${whole.length}`);
    expect(Buffer.compare(res.body as Buffer, whole.subarray(100, 200))).toBe(0);
  });

  it('keeps a draft’s media from outsiders and signed-out visitors (404), and opens it once published', async () => {
    const id = await readyRecording();
    expect((await (await f.clientFor('outsider')).get(`/media/recordings/${id}/poster.jpg`)).status).toBe(404);
    expect((await (await f.clientFor('anonymous')).get(`/media/recordings/${id}/poster.jpg`)).status).toBe(404);
    expect((await (await f.clientFor('maker')).get(`/media/recordings/${id}/poster.jpg`)).status).toBe(200);
    expect((await (await f.clientFor('maker')).get(`/media/recordings/${id}/..%2F..%2Fsource.mp4`)).status).toBe(400);
    await Tutorial.update({ state: 'published' }, { where: { id: f.tutorial.id } });
    expect((await (await f.clientFor('anonymous')).get(`/media/recordings/${id}/poster.jpg`)).status).toBe(200);
    await Tutorial.update({ state: 'draft' }, { where: { id: f.tutorial.id } });
  });
});

describe('transcripts', () => {
  const vtt =
    'WEBVTT\n\n00:00.000 --> 00:02.000\nFirst cut the base panel four and a quarter by five and a half\n\n00:02.000 --> 00:04.500\nNext we score it at two and an eighth\n';
  it('parses WebVTT into cues; a malformed file answers 422 with the line and keeps the previous cues', async () => {
    const id = await readyRecording();
    const c = await f.clientFor('maker');
    const ok = await c.upload(`/api/recordings/${id}/transcript`, 'file', Buffer.from(vtt), 'talk.vtt');
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ format: 'vtt', cueCount: 2 });
    const bad = await c.upload(`/api/recordings/${id}/transcript`, 'file', Buffer.from('WEBVTT\n\n00:01.000 -> 00:02.000\nBroken arrow\n'), 'bad.vtt');
    expect(bad.status).toBe(422);
    expect(bad.body.line).toBe(3);
    expect(bad.body.error).toMatch(/line 3/);
    expect(await Cue.count({ where: { recordingId: id } })).toBe(2);
    const search = await c.get(`/api/recordings/${id}/cues?q=score`);
    expect(search.body.cues.map((x: { text: string }) => x.text)).toEqual(['Next we score it at two and an eighth']);
    const notText = await c.upload(`/api/recordings/${id}/transcript`, 'file', Buffer.from([0xff, 0xfe, 0x00, 0xd8]), 'x.vtt');
    expect(notText.status).toBe(422);
  });
});

describe('transcripts read with notes (issue 11)', () => {
  it('a title line before the first timed line is skipped with a note; a WebVTT cue the standard drops is named', async () => {
    const id = await readyRecording();
    const c = await f.clientFor('maker');
    const titled = await c.upload(
      `/api/recordings/${id}/transcript`,
      'file',
      Buffer.from('# Session 3 transcript\n\n0:00 Cut the base.\n0:05 Score it.\n'),
      'talk.txt',
    );
    expect(titled.status).toBe(201);
    expect(titled.body).toMatchObject({ format: 'plain', cueCount: 2, notices: [expect.stringMatching(/^line 1: skipped a title/)] });
    const vtt = 'WEBVTT\n\n00:00.000 --> 00:02.000 Fold\nFold the flap.\n\n00:03.000 --> 00:02.000\nback\n\nstray words\n';
    const read = await c.upload(`/api/recordings/${id}/transcript`, 'file', Buffer.from(vtt.replace('Fold the', 'Fo\0ld the')), 'talk.vtt');
    expect(read.status).toBe(201);
    expect(read.body.cueCount).toBe(2);
    expect(read.body.notices.map((n: string) => n.split(':')[0])).toEqual(['line 3', 'line 4', 'line 6', 'line 9']);
    const cues = await c.get(`/api/recordings/${id}/cues`);
    expect(cues.body.cues[0].text).toBe('Fo\uFFFDld the flap.');
  });
});

describe('chapters', () => {
  it('creates, lists in time order, renames, retimes, deletes; suggests from cue phrases', async () => {
    const id = await readyRecording();
    const c = await f.clientFor('maker');
    await c.upload(`/api/recordings/${id}/transcript`, 'file', Buffer.from('0:00 Welcome to the studio\n0:01 First we cut the base\n'), 'talk.txt');
    expect((await c.post(`/api/recordings/${id}/chapters`, { title: '', startMs: 0 })).status).toBe(400);
    expect((await c.post(`/api/recordings/${id}/chapters`, { title: 'Too late', startMs: 60_000 })).status).toBe(400);
    const a = await c.post(`/api/recordings/${id}/chapters`, { title: 'Score', startMs: 3000 });
    const b = await c.post(`/api/recordings/${id}/chapters`, { title: 'Intro', startMs: 0 });
    expect([a.status, b.status]).toEqual([201, 201]);
    expect((await c.get(`/api/recordings/${id}/chapters`)).body.chapters.map((x: { title: string }) => x.title)).toEqual(['Intro', 'Score']);
    expect((await c.patch(`/api/chapters/${a.body.id}`, { title: 'Score the walls', startMs: 2500 })).body).toMatchObject({
      title: 'Score the walls',
      startMs: 2500,
    });
    expect((await (await f.clientFor('student')).patch(`/api/chapters/${a.body.id}`, { title: 'x' })).status).toBe(403);
    expect((await c.delete(`/api/chapters/${a.body.id}`)).status).toBe(204);
    const sug = await c.get(`/api/recordings/${id}/chapter-suggestions`);
    expect(sug.status).toBe(200);
    expect(Array.isArray(sug.body.suggestions)).toBe(true);
  });
});

describe('chapters and the write-up’s links to their time', () => {
  it('a retimed chapter moves the steps linked to it; a deleted one leaves them at their time, no longer following it', async () => {
    const g = await makeStudio(app);
    const c = await g.clientFor('maker');
    const up = await c.upload(`/api/tutorials/${g.tutorial.id}/recordings`, 'file', clip, 'steps.mp4');
    await processRecording(up.body.id);
    const ch = (await c.post(`/api/recordings/${up.body.id}/chapters`, { title: 'Fold the flaps', startMs: 2000 })).body;
    const step = (atMs: number, chapterId: string | null, title: string) => ({
      type: 'step',
      attrs: { atMs, chapterId },
      content: [{ type: 'stepTitle', content: [{ type: 'text', text: title }] }],
    });
    const doc = { type: 'doc', content: [step(2000, ch.id, 'Fold the flaps'), step(4000, null, 'Close the box')] };
    expect((await c.put(`/api/tutorials/${g.tutorial.id}/article`, { doc, version: 0 })).status).toBe(200);
    const steps = async () =>
      ((await c.get(`/api/tutorials/${g.tutorial.id}/article`)).body.doc.content as { attrs: { atMs: number; chapterId: string | null } }[]).map((n) => [
        n.attrs.atMs,
        n.attrs.chapterId,
      ]);
    await c.patch(`/api/chapters/${ch.id}`, { startMs: 2500 });
    expect(await steps()).toEqual([
      [2500, ch.id],
      [4000, null],
    ]);
    expect((await c.delete(`/api/chapters/${ch.id}`)).status).toBe(204);
    expect(await steps()).toEqual([
      [2500, null],
      [4000, null],
    ]);
    const revisions = (await c.get(`/api/tutorials/${g.tutorial.id}/revisions`)).body.revisions as { note: string }[];
    expect(revisions.map((r) => r.note)).toContain('Chapter “Fold the flaps” deleted: its steps keep their time');
  });
});

describe('stills', () => {
  it('pulls the exact frame at a time: its colour is the colour of that second', async () => {
    const id = await readyRecording();
    const c = await f.clientFor('maker');
    const res = await c.post(`/api/recordings/${id}/stills`, { atMs: 2500, mode: 'exact' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ atMs: 2500, width: 160, height: 120 });
    const rec = await Recording.findByPk(id);
    const file = path.join(config.mediaDir, `recordings/${rec!.id}/stills/${res.body.id}.jpg`);
    expect(nearestStep(await pixelAt(file, 80, 60))).toBe('blue');
    const img = await c.get(res.body.url);
    expect(img.status).toBe(200);
    expect(img.headers['content-type']).toBe('image/jpeg');
  });
  it('sharpest nearby stays within a second; caption and alt are saved; delete removes it', async () => {
    const id = await readyRecording();
    const c = await f.clientFor('maker');
    const res = await c.post(`/api/recordings/${id}/stills`, { atMs: 1500, mode: 'sharpest' });
    expect(res.status).toBe(201);
    expect(Math.abs(res.body.atMs - 1500)).toBeLessThanOrEqual(1000);
    expect((await c.post(`/api/recordings/${id}/stills`, { atMs: 99_000 })).status).toBe(400);
    expect((await c.post(`/api/recordings/${id}/stills`, { atMs: -1 })).status).toBe(400);
    const upd = await c.patch(`/api/stills/${res.body.id}`, { caption: 'The scored base', alt: 'A blue card base on a mat' });
    expect(upd.body).toMatchObject({ caption: 'The scored base', alt: 'A blue card base on a mat' });
    expect((await c.get(`/api/recordings/${id}/stills`)).body.stills).toHaveLength(1);
    expect((await c.delete(`/api/stills/${res.body.id}`)).status).toBe(204);
    expect((await c.get(res.body.url)).status).toBe(404);
  });
});
