import { createReadStream } from 'node:fs';
import { rm } from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { config, type Config } from '../config';
import { NotFoundError } from '../lib/errors';
import { byteCounter, checkKey } from './storage-disk';
import type { Storage, StoredRead } from './storage';

type S3Settings = Config['storage']['s3'];

// package.json pins the SDK at 3.1175 (and the presigner at 3.1169), which run on Node 20; the
// SDK's notice that later versions will need Node 22 would otherwise print in every process.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** Parts of a multipart upload: S3's smallest part is 5 MiB; two in flight keep memory near 16 MB whatever the file's size. */
const PART_BYTES = 8 * 1024 * 1024;
const PARTS_IN_FLIGHT = 2;
/**
 * How long ffmpeg's presigned URL stays good: as long as the longest job may run (a six-hour
 * recording's preview reads the source to its end), since ffmpeg asks for new ranges as it goes.
 */
const INPUT_URL_SECONDS = 6 * 3600;

/** The SDK client for a store: AWS itself, or any S3-compatible endpoint (MinIO, Ceph, the local fake). */
export function s3Client(s: S3Settings): S3Client {
  return new S3Client({
    region: s.region,
    endpoint: s.endpoint,
    forcePathStyle: s.forcePathStyle,
    credentials: s.accessKeyId && s.secretAccessKey ? { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey } : undefined,
    // Checksums only where S3 requires them: the SDK's default trailing checksums (aws-chunked
    // bodies) are not understood by every S3-compatible store, the local fake among them.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

const statusOf = (e: unknown) => (e instanceof S3ServiceException ? e.$metadata.httpStatusCode : undefined);
const isMissing = (e: unknown) => statusOf(e) === 404 || (e instanceof S3ServiceException && (e.name === 'NotFound' || e.name === 'NoSuchKey'));

/** Media in one S3-compatible bucket; `scratchRoot` (this machine's disk) holds ffmpeg's output until it is uploaded. */
export function s3Storage(s: S3Settings, scratchRoot = config.mediaDir, client = s3Client(s)): Storage {
  const Bucket = s.bucket;
  const staging = (key: string) => path.join(scratchRoot, 'staging', checkKey(key));

  const putStream = async (key: string, body: Readable, contentType?: string) => {
    const counter = byteCounter();
    body.on('error', (e) => counter.destroy(e));
    const upload = new Upload({
      client,
      params: { Bucket, Key: checkKey(key), Body: body.pipe(counter), ContentType: contentType },
      partSize: PART_BYTES,
      queueSize: PARTS_IN_FLIGHT,
      // a failed upload leaves no parts behind to pay for
      leavePartsOnError: false,
    });
    await upload.done();
    return counter.bytes;
  };

  const removeExact = (key: string) => client.send(new DeleteObjectCommand({ Bucket, Key: key }));
  const read = async (key: string) => {
    const got = await client.send(new GetObjectCommand({ Bucket, Key: checkKey(key) }));
    return Buffer.from(await got.Body!.transformToByteArray());
  };
  const size = async (key: string) => (await client.send(new HeadObjectCommand({ Bucket, Key: checkKey(key) }))).ContentLength ?? 0;

  return {
    kind: 's3',
    localPath: () => null,
    inputFor: (key) => getSignedUrl(client, new GetObjectCommand({ Bucket, Key: checkKey(key) }), { expiresIn: INPUT_URL_SECONDS }),
    stagingPath: staging,
    async commit(key, contentType) {
      await putStream(key, createReadStream(staging(key)), contentType);
      await rm(staging(key), { force: true });
    },
    putStream,
    async put(key, data, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: checkKey(key), Body: data, ContentType: contentType }));
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: checkKey(key) }));
        return true;
      } catch (e) {
        if (isMissing(e)) return false;
        throw e;
      }
    },
    size,
    async remove(keyOrPrefix) {
      const key = checkKey(keyOrPrefix.replace(/\/+$/, ''));
      await removeExact(key);
      // then everything under "key/", a page of up to 1,000 keys at a time
      let token: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, Prefix: `${key}/`, ContinuationToken: token }));
        const keys = (page.Contents ?? []).flatMap((o) => (o.Key ? [{ Key: o.Key }] : []));
        if (keys.length) await client.send(new DeleteObjectsCommand({ Bucket, Delete: { Objects: keys, Quiet: true } }));
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
      await rm(staging(key), { recursive: true, force: true });
    },
    read,
    imageSource: read,
    async open(key, o = {}): Promise<StoredRead> {
      // One range only (what video players ask for); anything else gets the whole file, as HTTP allows.
      let range = o.range && /^bytes=\d*-\d*$/.test(o.range) && o.range !== 'bytes=-' ? o.range : undefined;
      // A suffix range ("the last N bytes") is spelt out from the size: not every S3-compatible store reads it right.
      const suffix = range && /^bytes=-(\d+)$/.exec(range);
      if (suffix) {
        const total = await size(key).catch((e: unknown) => {
          throw isMissing(e) ? new NotFoundError('File') : e;
        });
        range = `bytes=${Math.max(0, total - Number(suffix[1]))}-${Math.max(0, total - 1)}`;
      }
      try {
        const got = await client.send(new GetObjectCommand({ Bucket, Key: checkKey(key), Range: range, IfNoneMatch: o.ifNoneMatch }));
        const total = got.ContentRange ? Number(got.ContentRange.split('/')[1]) : (got.ContentLength ?? null);
        return {
          status: got.ContentRange ? 206 : 200,
          body: got.Body as Readable,
          length: got.ContentLength ?? null,
          total: Number.isFinite(total) ? total : null,
          contentRange: got.ContentRange ?? null,
          etag: got.ETag ?? null,
          lastModified: got.LastModified ?? null,
        };
      } catch (e) {
        const status = statusOf(e);
        if (isMissing(e)) throw new NotFoundError('File');
        if (status === 304) return { status: 304, body: null, length: null, total: null, contentRange: null, etag: o.ifNoneMatch ?? null, lastModified: null };
        if (status === 416) {
          const total = await size(key);
          return { status: 416, body: null, length: null, total, contentRange: `bytes */${total}`, etag: null, lastModified: null };
        }
        throw e;
      }
    },
  };
}
