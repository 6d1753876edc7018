import { createHash, randomBytes } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fakeS3Settings } from '../../tests/harness/s3';
import { grabFrame } from './media/frames';
import { probe } from './media/probe';
import { colourSteps, nearestStep, pixelAt, tempDir } from './media/test-clips';
import { s3Client, s3Storage } from './storage-s3';

// The local S3 fake (s3rver) that `npm test` starts on loopback; each run gets its own key prefix.
const settings = fakeS3Settings();
let dir: string;
let store: ReturnType<typeof s3Storage>;
/** The commands the driver sent, by name (an SDK middleware records them). */
const sent: string[] = [];
const run = `test-${randomBytes(4).toString('hex')}`;
const md5 = (b: Buffer) => createHash('md5').update(b).digest('hex');
const text = async (r: Readable | null) => {
  const chunks: Buffer[] = [];
  for await (const c of r!) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
};

beforeAll(async () => {
  dir = await tempDir();
  const client = s3Client(settings);
  client.middlewareStack.add(
    (next, context) => (args) => {
      sent.push(context.commandName ?? '');
      return next(args);
    },
    { step: 'initialize', name: 'recordCommands' },
  );
  store = s3Storage(settings, dir, client);
});
afterAll(async () => {
  await store.remove(run);
  await rm(dir, { recursive: true, force: true });
});

describe('the S3 storage driver against the local fake', () => {
  it('streams a 20 MB body up as a multipart upload in bounded parts and reads back the same bytes', async () => {
    const data = randomBytes(20 * 1024 * 1024 + 123);
    const key = `${run}/big.bin`;
    // a stream of 64 KB chunks, as a request body arrives
    const body = Readable.from(
      (function* () {
        for (let i = 0; i < data.length; i += 65536) yield data.subarray(i, i + 65536);
      })(),
    );
    expect(await store.putStream(key, body, 'application/octet-stream')).toBe(data.length);
    expect(await store.size(key)).toBe(data.length);
    expect(md5(await store.read(key))).toBe(md5(data));
    // in 8 MiB parts (S3's smallest is 5 MiB, AWS S3 User Guide "Multipart upload limits"): 20 MB makes 3 parts, never one whole PUT
    expect(sent.filter((c) => c === 'UploadPartCommand')).toHaveLength(3);
    expect(sent).toContain('CompleteMultipartUploadCommand');
    expect(sent).not.toContain('PutObjectCommand');
  });

  it('answers one byte range with 206 and Content-Range (RFC 9110 §14.4), a suffix range, and 416 past the end', async () => {
    const data = randomBytes(1000);
    const key = `${run}/range.bin`;
    await store.put(key, data);
    const mid = await store.open(key, { range: 'bytes=100-199' });
    expect(mid).toMatchObject({ status: 206, length: 100, total: 1000, contentRange: 'bytes 100-199/1000' });
    expect((await text(mid.body)).equals(data.subarray(100, 200))).toBe(true);
    const tail = await store.open(key, { range: 'bytes=-10' });
    expect(tail).toMatchObject({ status: 206, contentRange: 'bytes 990-999/1000' });
    expect((await text(tail.body)).equals(data.subarray(990))).toBe(true);
    const whole = await store.open(key);
    expect(whole).toMatchObject({ status: 200, length: 1000 });
    await text(whole.body);
    expect(await store.open(key, { range: 'bytes=5000-' })).toMatchObject({ status: 416, contentRange: 'bytes */1000' });
  });

  it('knows what exists, and removes a key with everything under it but nothing beside it', async () => {
    await store.put(`${run}/rec/a.jpg`, Buffer.from('a'));
    await store.put(`${run}/rec/thumbs/1.jpg`, Buffer.from('1'));
    await store.put(`${run}/rec-other/b.jpg`, Buffer.from('b'));
    expect(await store.exists(`${run}/rec/a.jpg`)).toBe(true);
    expect(await store.exists(`${run}/rec/none.jpg`)).toBe(false);
    await store.remove(`${run}/rec`);
    expect(await store.exists(`${run}/rec/a.jpg`)).toBe(false);
    expect(await store.exists(`${run}/rec/thumbs/1.jpg`)).toBe(false);
    expect(await store.exists(`${run}/rec-other/b.jpg`)).toBe(true);
  });

  it('stores a staged file and removes the scratch copy', async () => {
    const key = `${run}/staged/still.jpg`;
    const staged = store.stagingPath(key);
    expect(staged.startsWith(dir)).toBe(true);
    await import('node:fs/promises').then((fs) => fs.mkdir(path.dirname(staged), { recursive: true }));
    await writeFile(staged, 'jpeg bytes');
    await store.commit(key, 'image/jpeg');
    expect((await store.read(key)).toString()).toBe('jpeg bytes');
    await expect(readFile(staged)).rejects.toThrow();
  });

  it('ffprobe and ffmpeg read a stored video through its presigned URL: the same facts and the same frame as from disk', async () => {
    const clip = await colourSteps(dir);
    const key = `${run}/rec/source.mp4`;
    await store.putStream(key, createReadStream(clip), 'video/mp4');
    const url = await store.inputFor(key);
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/cardwright-test\/.*X-Amz-Signature=/);
    const [fromUrl, fromDisk] = await Promise.all([probe(url), probe(clip)]);
    expect(fromUrl).toEqual(fromDisk);
    // frame at 2.5 s of the colour steps: the third colour, exact to the frame (input seek over HTTP ranges)
    const a = path.join(dir, 'from-url.jpg');
    const b = path.join(dir, 'from-disk.jpg');
    await grabFrame(url, 2500, a);
    await grabFrame(clip, 2500, b);
    expect(md5(await readFile(a))).toBe(md5(await readFile(b)));
    expect(nearestStep(await pixelAt(a, 80, 60))).toBe(nearestStep(await pixelAt(b, 80, 60)));
  });
});
