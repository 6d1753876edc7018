import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { unlink } from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import type { Request, Response } from 'express';
import multer from 'multer';
import { config } from '../config';
import { BadRequestError, DomainError, InvalidInputError, TooLargeError } from '../lib/errors';
import { storage, type ScratchFile, type StoredUpload, type UploadPlace } from '../services/storage';

const formatBytes = (n: number) =>
  n >= 1024 ** 3
    ? `${(n / 1024 ** 3).toFixed(n % 1024 ** 3 ? 1 : 0)} GB`
    : n >= 1024 ** 2
      ? `${Math.round(n / 1024 ** 2)} MB`
      : `${Math.max(1, Math.round(n / 1024))} KB`;

export const limitMessage = (what: string, maxBytes: number) => `The ${what} is larger than the ${formatBytes(maxBytes)} limit`;

/**
 * Receives one file in multipart field `file`, streamed to a generated name in the media scratch
 * folder (never held in memory, OWASP File Upload). Handlers call it after authorizing, so nobody
 * without the right can fill the disk. A refused or interrupted upload leaves no file: multer
 * removes partial files on error, and the scratch file goes if the answer is an error.
 */
export function receiveFile(req: Request, res: Response, opts: { maxBytes?: number; what: string }): Promise<ScratchFile> {
  const maxBytes = opts.maxBytes ?? config.maxUploadBytes;
  const dir = path.join(config.mediaDir, 'tmp');
  mkdirSync(dir, { recursive: true });
  const upload = multer({
    storage: multer.diskStorage({ destination: dir, filename: (_req, _file, cb) => cb(null, `upload-${randomUUID()}`) }),
    limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 10 },
    // file names as sent: browsers send UTF-8 without saying so, which busboy would read as latin1
    defParamCharset: 'utf8',
  }).single('file');
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return reject(new TooLargeError(limitMessage(opts.what, maxBytes)));
        return reject(new BadRequestError(`The upload could not be read (${err.message}); send one file in the field "file"`));
      }
      if (err) return reject(new BadRequestError('The upload was interrupted or malformed; nothing was saved'));
      const file = req.file;
      if (!file) return reject(new InvalidInputError([{ path: 'file', message: 'Required' }], `Choose a ${opts.what} to upload (multipart field "file")`));
      // If the handler fails later, the scratch file must not stay behind.
      res.on('finish', () => {
        if (res.statusCode >= 400) unlink(file.path).catch(() => {});
      });
      resolve({ path: file.path, originalName: file.originalname, size: file.size });
    });
  });
}

/** Enough of the start of a file for its signature: file-type's own sample size for streams (4100 bytes). */
export const HEAD_BYTES = 4100;

/**
 * A multer storage engine that streams the file straight to the media store (a multipart upload
 * to a bucket, or a scratch file renamed on disk): no full copy in memory or on this machine's
 * disk. The first bytes decide the key, so a file that is not what it should be is refused
 * before anything is stored.
 */
function storeEngine(place: UploadPlace): multer.StorageEngine {
  return {
    _handleFile(_req, file, cb) {
      const handle = async () => {
        const it = file.stream[Symbol.asyncIterator]() as AsyncIterator<Buffer>;
        const head: Buffer[] = [];
        let headBytes = 0;
        let ended = false;
        let where: Awaited<ReturnType<UploadPlace>> | null = null;
        // Each chunk that arrives gets a try: most signatures sit in the first bytes, and a small
        // file still arriving never has to wait for a full sample.
        while (!where) {
          const next = await it.next();
          if (next.done) ended = true;
          else {
            head.push(next.value);
            headBytes += next.value.length;
          }
          try {
            where = await place(Buffer.concat(head), file.originalname);
          } catch (e) {
            if (!ended && headBytes < HEAD_BYTES) continue;
            // read the rest so the answer reaches a browser that is still sending
            if (!ended) for (let n = await it.next(); !n.done; n = await it.next());
            throw e;
          }
        }
        const first = Buffer.concat(head);
        const body = Readable.from(
          (async function* () {
            yield first;
            if (ended) return;
            for (let n = await it.next(); !n.done; n = await it.next()) yield n.value;
          })(),
        );
        const size = await storage.putStream(where.key, body, where.contentType);
        return { key: where.key, contentType: where.contentType, size };
      };
      handle().then(
        (info) => cb(null, info as unknown as Partial<Express.Multer.File>),
        (e: Error) => cb(e),
      );
    },
    _removeFile(_req, file, cb) {
      const key = (file as unknown as { key?: string }).key;
      (key ? storage.remove(key) : Promise.resolve()).then(
        () => cb(null),
        (e: Error) => cb(e),
      );
    },
  };
}

/**
 * Receives one file in multipart field `file` and streams it to the media store under the key
 * `place` picks from its first bytes. Call it after authorizing. A refused, oversized or
 * interrupted upload leaves nothing stored, and neither does an error answer after it.
 */
export function receiveUpload(req: Request, res: Response, opts: { maxBytes?: number; what: string; place: UploadPlace }): Promise<StoredUpload> {
  const maxBytes = opts.maxBytes ?? config.maxUploadBytes;
  const upload = multer({
    storage: storeEngine(opts.place),
    limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 10 },
    defParamCharset: 'utf8',
  }).single('file');
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return reject(new TooLargeError(limitMessage(opts.what, maxBytes)));
        return reject(new BadRequestError(`The upload could not be read (${err.message}); send one file in the field "file"`));
      }
      // the engine's own refusal (a file that is not what it should be) goes out as it is
      if (err instanceof DomainError) return reject(err);
      if (err) return reject(new BadRequestError('The upload was interrupted or malformed; nothing was saved'));
      const file = req.file as (Express.Multer.File & { key?: string; contentType?: string }) | undefined;
      if (!file?.key) return reject(new InvalidInputError([{ path: 'file', message: 'Required' }], `Choose a ${opts.what} to upload (multipart field "file")`));
      const key = file.key;
      res.on('finish', () => {
        if (res.statusCode >= 400) storage.remove(key).catch(() => {});
      });
      resolve({ key, contentType: file.contentType ?? 'application/octet-stream', originalName: file.originalname, size: file.size });
    });
  });
}
