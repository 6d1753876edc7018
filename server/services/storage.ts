import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, rename, rm, stat } from 'node:fs/promises';
import path from 'node:path';
import { config } from '../config';

/**
 * Where media files live, behind keys like "recordings/<id>/preview.mp4". This local-disk store is
 * the only one today; an S3-compatible store can implement the same interface when one server is
 * not enough (ffmpeg then works on a local copy, and `localPath` downloads first).
 */
export interface Storage {
  /** A file path ffmpeg and sendFile can use. */
  localPath(key: string): string;
  /** Moves a finished file (e.g. a multer upload) under a key. */
  adopt(file: string, key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
  size(key: string): Promise<number>;
  remove(keyOrPrefix: string): Promise<void>;
  /** A scratch folder for work in progress, on the same disk so renames are cheap. */
  tmpDir(): Promise<string>;
  createReadStream(key: string): NodeJS.ReadableStream;
  createWriteStream(key: string): NodeJS.WritableStream;
}

const SAFE_KEY = /^[a-z0-9][a-z0-9/_.-]*$/i;

/** Keys are made by the server, never taken from a request; this guard keeps it that way. */
function checkKey(key: string): string {
  if (!SAFE_KEY.test(key) || key.includes('..') || key.includes('//')) throw new Error(`Unsafe storage key: ${key}`);
  return key;
}

/** Files under config.mediaDir. */
export function localStorage(root = config.mediaDir): Storage {
  const full = (key: string) => path.join(root, checkKey(key));
  return {
    localPath: full,
    async adopt(file, key) {
      await mkdir(path.dirname(full(key)), { recursive: true });
      await rename(file, full(key));
    },
    async exists(key) {
      return stat(full(key)).then(() => true, () => false);
    },
    async size(key) {
      return (await stat(full(key))).size;
    },
    async remove(key) {
      await rm(full(key), { recursive: true, force: true });
    },
    async tmpDir() {
      const dir = path.join(root, 'tmp');
      await mkdir(dir, { recursive: true });
      return dir;
    },
    createReadStream: (key) => createReadStream(full(key)),
    createWriteStream: (key) => createWriteStream(full(key)),
  };
}

export const storage = localStorage();
