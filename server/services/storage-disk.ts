import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readFile, rename, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { randomUUID } from 'node:crypto';
import { Transform, type Readable } from 'node:stream';
import { config } from '../config';
import type { Storage, StoredRead } from './storage';

const SAFE_KEY = /^[a-z0-9][a-z0-9/_.-]*$/i;

/** Keys are made by the server, never taken from a request; this guard keeps it that way. */
export function checkKey(key: string): string {
  if (!SAFE_KEY.test(key) || key.includes('..') || key.includes('//')) throw new Error(`Unsafe storage key: ${key}`);
  return key;
}

/** Counts the bytes that pass, for the size of a streamed upload. */
export function byteCounter(): Transform & { bytes: number } {
  const t = new Transform({
    transform(chunk: Buffer, _enc, done) {
      t.bytes += chunk.length;
      done(null, chunk);
    },
  }) as Transform & { bytes: number };
  t.bytes = 0;
  return t;
}

/** Files under config.mediaDir: one machine's disk, the default store. */
export function diskStorage(root = config.mediaDir): Storage {
  const full = (key: string) => path.join(root, checkKey(key));
  const scratch = async () => {
    const dir = path.join(root, 'tmp');
    await mkdir(dir, { recursive: true });
    return dir;
  };
  return {
    kind: 'disk',
    localPath: full,
    inputFor: async (key) => full(key),
    stagingPath: full,
    async commit(key) {
      // written in place already; a missing file is a bug in the caller, said here rather than later
      await stat(full(key));
    },
    async putStream(key, body) {
      // Into the scratch folder first, then one rename: nobody ever reads a half-written file under the key.
      const part = path.join(await scratch(), `put-${randomUUID()}`);
      const counter = byteCounter();
      try {
        await pipeline(body, counter, createWriteStream(part));
        await mkdir(path.dirname(full(key)), { recursive: true });
        await rename(part, full(key));
      } catch (e) {
        await rm(part, { force: true });
        throw e;
      }
      return counter.bytes;
    },
    async put(key, data) {
      await mkdir(path.dirname(full(key)), { recursive: true });
      await writeFile(full(key), data);
    },
    async exists(key) {
      return stat(full(key)).then(
        (s) => s.isFile(),
        () => false,
      );
    },
    async size(key) {
      return (await stat(full(key))).size;
    },
    async remove(key) {
      await rm(full(key), { recursive: true, force: true });
    },
    read: (key) => readFile(full(key)),
    imageSource: async (key) => full(key),
    async open(key, o = {}): Promise<StoredRead> {
      // The media router serves disk files with sendFile; this is for callers that want a stream.
      const s = await stat(full(key));
      const m = /^bytes=(\d*)-(\d*)$/.exec(o.range ?? '');
      if (!m || (m[1] === '' && m[2] === '')) {
        return { status: 200, body: createReadStream(full(key)), length: s.size, total: s.size, contentRange: null, etag: null, lastModified: s.mtime };
      }
      const start = m[1] === '' ? Math.max(0, s.size - Number(m[2])) : Number(m[1]);
      const end = m[1] === '' || m[2] === '' ? s.size - 1 : Math.min(Number(m[2]), s.size - 1);
      if (start >= s.size || start > end) {
        return { status: 416, body: null, length: null, total: s.size, contentRange: `bytes */${s.size}`, etag: null, lastModified: s.mtime };
      }
      const body: Readable = createReadStream(full(key), { start, end });
      return { status: 206, body, length: end - start + 1, total: s.size, contentRange: `bytes ${start}-${end}/${s.size}`, etag: null, lastModified: s.mtime };
    },
  };
}
