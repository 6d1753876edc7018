import type { Readable } from 'node:stream';
import { config } from '../config';
import { diskStorage } from './storage-disk';

/**
 * Where media files live, behind keys like "recordings/<id>/preview.mp4": on this disk
 * (`storage-disk.ts`, the default) or in an S3-compatible bucket (`storage-s3.ts`, STORAGE=s3),
 * so app servers and workers on several machines share one store (docs/decisions/013).
 */
/** An uploaded file waiting in the scratch folder: its path there, the name the person gave it and its size. */
export type ScratchFile = { path: string; originalName: string; size: number };

/** Where a streamed upload is stored, decided from its first bytes (the file's own signature); throw to refuse it. */
export type UploadPlace = (head: Buffer, originalName: string) => Promise<{ key: string; contentType: string }>;
/** An upload stored under its key: the name the person gave it, its type as its bytes say, its size. */
export type StoredUpload = { key: string; contentType: string; originalName: string; size: number };

/** One stored file opened for an HTTP answer: the bytes asked for and the headers that describe them. */
export type StoredRead = {
  /** 200 for the whole file, 206 for a range, 304 when the caller's copy is current, 416 for a range past the end. */
  status: 200 | 206 | 304 | 416;
  body: Readable | null;
  /** Bytes in this answer. */
  length: number | null;
  /** The file's full size. */
  total: number | null;
  contentRange: string | null;
  etag: string | null;
  lastModified: Date | null;
};

export interface Storage {
  readonly kind: 'disk' | 's3';
  /**
   * What ffmpeg and ffprobe open to read a stored file: its path on this disk, or a presigned
   * HTTP URL that they read with ranges (input seek fetches only the bytes near the time).
   */
  inputFor(key: string): Promise<string>;
  /**
   * A path on this machine where a file meant for `key` is written (ffmpeg output, a generated
   * demo video). On disk it is the file's own place; for a bucket a scratch copy that `commit` uploads.
   */
  stagingPath(key: string): string;
  /** Stores what was written at `stagingPath(key)` under the key (a no-op on disk). */
  commit(key: string, contentType?: string): Promise<void>;
  /** Streams a body to a key without holding it all in memory (a multipart upload in a bucket). Resolves with the bytes stored. */
  putStream(key: string, body: Readable, contentType?: string): Promise<number>;
  /** Stores bytes under a key. */
  put(key: string, data: Buffer, contentType?: string): Promise<void>;
  exists(key: string): Promise<boolean>;
  size(key: string): Promise<number>;
  /** Removes a file, or every file under `prefix/`, and any scratch copy of it. */
  remove(keyOrPrefix: string): Promise<void>;
  /** A small file's bytes (stills for exports). */
  read(key: string): Promise<Buffer>;
  /** What sharp reads for an image: a path on disk, or the bytes from a bucket. */
  imageSource(key: string): Promise<string | Buffer>;
  /** Opens a file (or one byte range of it, "bytes=a-b") for an HTTP answer. */
  open(key: string, o?: { range?: string; ifNoneMatch?: string }): Promise<StoredRead>;
  /** The path on this disk, for the disk store only (Express's sendFile serves ranges and conditional GETs from it). */
  localPath(key: string): string | null;
}

/** The store config.storage picks; the S3 driver (and the AWS SDK) loads only when asked for. */
async function chooseStorage(): Promise<Storage> {
  if (config.storage.driver === 's3') {
    const { s3Storage } = await import('./storage-s3');
    return s3Storage(config.storage.s3);
  }
  return diskStorage();
}

export const storage: Storage = await chooseStorage();
