import { pipeline } from 'node:stream/promises';
import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { openRoute } from '../../lib/route';
import { NotFoundError } from '../../lib/errors';
import { loadMediaVisibility, loadRecordingMedia, loadStillMedia, type MediaVisibility } from '../../services/access';
import { storage } from '../../services/storage';
import { blogImageKey } from '../../services/publish/blog-images';

const recordingFile = z.object({ id: z.uuid(), file: z.enum(['preview.mp4', 'poster.jpg']) });
const thumbFile = z.object({ id: z.uuid(), file: z.string().regex(/^[a-z0-9_-]+\.jpg$/i) });
const stillFile = z.object({ id: z.uuid() });
const blogFile = z.object({ id: z.uuid(), file: z.string().regex(/^[a-z0-9_-]+\.jpg$/i) });

/**
 * Streams a stored file, answering Range requests with 206 so video seeking works: from disk
 * through sendFile, from a bucket by passing the one range on to it (docs/decisions/013: proxied,
 * so the access check, the cache rules and the origin stay the app's). Only a published
 * tutorial's media may sit in shared caches; a draft's are `private, no-store`.
 */
async function send(req: Request, res: Response, key: string, type: string, visibility: MediaVisibility) {
  res.type(type);
  res.set('Cache-Control', visibility === 'public' ? 'public, max-age=3600' : 'private, no-store');
  const local = storage.localPath(key);
  if (local) {
    res.sendFile(local, { cacheControl: false, acceptRanges: true, dotfiles: 'deny' });
    return;
  }
  const ifNoneMatch = req.get('if-none-match');
  const got = await storage.open(key, { range: req.get('range'), ifNoneMatch: ifNoneMatch && !/,/.test(ifNoneMatch) ? ifNoneMatch : undefined });
  res.set('Accept-Ranges', 'bytes');
  if (got.etag) res.set('ETag', got.etag);
  if (got.lastModified) res.set('Last-Modified', got.lastModified.toUTCString());
  if (got.contentRange) res.set('Content-Range', got.contentRange);
  res.status(got.status);
  if (!got.body || req.method === 'HEAD') {
    got.body?.destroy();
    res.end();
    return;
  }
  if (got.length !== null) res.set('Content-Length', String(got.length));
  // a viewer who leaves mid-video closes the response; the bucket's stream closes with it
  await pipeline(got.body, res).catch(() => got.body?.destroy());
}

/**
 * Media under /media. Every file is looked up by id in the database and only then mapped to a
 * storage key made by the server: no part of the request path reaches the file system. The
 * tutorial policy's `readMedia` decides who sees them; drafts' media answer 404 to anyone else.
 */
export function mediaRouter() {
  const r = Router();

  r.get(
    '/recordings/:id/:file',
    openRoute({ params: recordingFile }, async ({ params, user, req, res }) => {
      const { recording, visibility } = await loadRecordingMedia(user, params.id);
      const key = params.file === 'preview.mp4' ? recording.previewKey : recording.posterKey;
      if (!key) throw new NotFoundError('File');
      await send(req, res, key, params.file === 'preview.mp4' ? 'video/mp4' : 'image/jpeg', visibility);
    }),
  );

  r.get(
    '/recordings/:id/thumbs/:file',
    openRoute({ params: thumbFile }, async ({ params, user, req, res }) => {
      const { recording, visibility } = await loadRecordingMedia(user, params.id);
      const key = recording.thumbnails?.keys.find((k) => k.endsWith(`/${params.file}`));
      if (!key) throw new NotFoundError('File');
      await send(req, res, key, 'image/jpeg', visibility);
    }),
  );

  r.get(
    '/stills/:id.jpg',
    openRoute({ params: stillFile }, async ({ params, user, req, res }) => {
      const { still, visibility } = await loadStillMedia(user, params.id);
      await send(req, res, still.fileKey, 'image/jpeg', visibility);
    }),
  );

  // Resized stills for blog HTML pasted elsewhere; made by the HTML export, public once published.
  r.get(
    '/blog/:id/:file',
    openRoute({ params: blogFile }, async ({ params, user, req, res }) => {
      const visibility = await loadMediaVisibility(user, params.id);
      const key = blogImageKey(params.id, params.file);
      if (!(await storage.exists(key))) throw new NotFoundError('File');
      await send(req, res, key, 'image/jpeg', visibility);
    }),
  );

  return r;
}
