import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { Recording, Still } from '../models';
import { HttpError } from '../lib/http-error';
import { grabFrame, grabSharpest, MediaError } from './media';
import { storage } from './storage';

/**
 * Pulls a still from the full-resolution source: the exact frame at the time (input seek), or the
 * sharpest frame within a second of it. Refuses times outside the video with 400.
 */
export async function pullStill(recording: Recording, atMs: number, mode: 'exact' | 'sharpest'): Promise<Still> {
  if (recording.durationMs === null) throw new HttpError(409, 'The video is still being read; try again in a moment');
  if (atMs > recording.durationMs) {
    throw new HttpError(400, 'atMs: That time is after the end of the video', { issues: [{ path: 'atMs', message: 'After the end of the video' }] });
  }
  const id = randomUUID();
  const fileKey = `recordings/${recording.id}/stills/${id}.jpg`;
  const out = storage.localPath(fileKey);
  await mkdir(path.dirname(out), { recursive: true });
  const source = storage.localPath(recording.sourceKey);
  try {
    if (mode === 'sharpest') {
      const r = await grabSharpest(source, atMs, out);
      return await Still.create({ id, recordingId: recording.id, atMs: r.atMs, requestedMs: atMs, mode, fileKey, width: r.width, height: r.height, sharpness: r.score });
    }
    const r = await grabFrame(source, atMs, out);
    return await Still.create({ id, recordingId: recording.id, atMs, requestedMs: atMs, mode, fileKey, width: r.width, height: r.height, sharpness: null });
  } catch (e) {
    await storage.remove(fileKey);
    if (e instanceof MediaError) throw new HttpError(e.code === 'bad-input' || e.code === 'no-frame' ? 400 : 422, e.reason);
    throw e;
  }
}
