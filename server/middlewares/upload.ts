import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { unlink } from 'node:fs/promises';
import path from 'node:path';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { config } from '../config';
import { HttpError } from '../lib/http-error';

const formatBytes = (n: number) =>
  n >= 1024 ** 3 ? `${(n / 1024 ** 3).toFixed(n % 1024 ** 3 ? 1 : 0)} GB` : n >= 1024 ** 2 ? `${Math.round(n / 1024 ** 2)} MB` : `${Math.max(1, Math.round(n / 1024))} KB`;

/**
 * One file in multipart field `file`, streamed to a generated name in the media scratch folder
 * (never held in memory, OWASP File Upload). A refused or interrupted upload leaves no file:
 * multer removes partial files on error, and handlers remove refused ones.
 */
export function singleUpload(opts: { maxBytes?: number; what: string }): RequestHandler {
  const maxBytes = opts.maxBytes ?? config.maxUploadBytes;
  const dir = path.join(config.mediaDir, 'tmp');
  mkdirSync(dir, { recursive: true });
  const upload = multer({
    storage: multer.diskStorage({ destination: dir, filename: (_req, _file, cb) => cb(null, `upload-${randomUUID()}`) }),
    limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 10 },
  }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, `The ${opts.what} is larger than the ${formatBytes(maxBytes)} limit`));
        return next(new HttpError(400, `The upload could not be read (${err.message}); send one file in the field "file"`));
      }
      if (err) return next(new HttpError(400, 'The upload was interrupted or malformed; nothing was saved'));
      if (!req.file) return next(new HttpError(400, `Choose a ${opts.what} to upload (multipart field "file")`, { issues: [{ path: 'file', message: 'Required' }] }));
      // If the handler fails later, the scratch file must not stay behind.
      res.on('finish', () => {
        if (req.file && res.statusCode >= 400) unlink(req.file.path).catch(() => {});
      });
      next();
    });
  };
}

/** Removes the uploaded scratch file (after a refusal or once it has been moved). */
export async function discardUpload(req: Request): Promise<void> {
  if (req.file) await unlink(req.file.path).catch(() => {});
}
