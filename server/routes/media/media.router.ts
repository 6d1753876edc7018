import { Router, type Response } from 'express';
import { z } from 'zod';
import { Recording, Still } from '../../models';
import { validate } from '../../middlewares/validate';
import { notFound } from '../../lib/http-error';
import { canSeeMedia } from '../../services/access';
import { storage } from '../../services/storage';
import { blogImageKey } from '../../services/blog-images';

const recordingFile = z.object({ id: z.uuid(), file: z.enum(['preview.mp4', 'poster.jpg']) });
const thumbFile = z.object({ id: z.uuid(), file: z.string().regex(/^[a-z0-9_-]+\.jpg$/i) });
const stillFile = z.object({ id: z.uuid() });
const blogFile = z.object({ id: z.uuid(), file: z.string().regex(/^[a-z0-9_-]+\.jpg$/i) });

/** Streams a stored file; sendFile answers Range requests with 206 so video seeking works. */
function send(res: Response, key: string, type: string) {
  res.type(type);
  res.sendFile(storage.localPath(key), { maxAge: '1h', acceptRanges: true, dotfiles: 'deny' });
}

/**
 * Media under /media. Every file is looked up by id in the database and only then mapped to a
 * storage key made by the server: no part of the request path reaches the file system. Drafts'
 * media answer 404 to anyone who may not read the tutorial.
 */
export function mediaRouter() {
  const r = Router();

  r.get('/recordings/:id/:file', validate({ params: recordingFile }), async (req, res) => {
    const rec = await Recording.findByPk(req.params.id as string);
    if (!rec || !(await canSeeMedia(req, rec.tutorialId))) throw notFound('File');
    const key = req.params.file === 'preview.mp4' ? rec.previewKey : rec.posterKey;
    if (!key) throw notFound('File');
    send(res, key, req.params.file === 'preview.mp4' ? 'video/mp4' : 'image/jpeg');
  });

  r.get('/recordings/:id/thumbs/:file', validate({ params: thumbFile }), async (req, res) => {
    const rec = await Recording.findByPk(req.params.id as string);
    if (!rec || !(await canSeeMedia(req, rec.tutorialId))) throw notFound('File');
    const key = rec.thumbnails?.keys.find((k) => k.endsWith(`/${req.params.file}`));
    if (!key) throw notFound('File');
    send(res, key, 'image/jpeg');
  });

  r.get('/stills/:id.jpg', validate({ params: stillFile }), async (req, res) => {
    const still = await Still.findByPk(req.params.id as string, { include: [{ model: Recording, as: 'recording', attributes: ['tutorialId'] }] });
    if (!still || !(await canSeeMedia(req, still.recording!.tutorialId))) throw notFound('File');
    send(res, still.fileKey, 'image/jpeg');
  });

  // Resized stills for blog HTML pasted elsewhere; made by the HTML export, public once published.
  r.get('/blog/:id/:file', validate({ params: blogFile }), async (req, res) => {
    if (!(await canSeeMedia(req, req.params.id as string))) throw notFound('File');
    const key = blogImageKey(req.params.id as string, req.params.file as string);
    if (!(await storage.exists(key))) throw notFound('File');
    send(res, key, 'image/jpeg');
  });

  return r;
}
