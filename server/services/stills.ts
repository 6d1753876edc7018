import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import type { updateStillSchema } from '@shared/schemas/footage';
import { Chapter, type Recording, Still } from '../models';
import { BadRequestError, ConflictError, UnprocessableError } from '../lib/errors';
import { checkWithinVideo } from './recordings';
import { grabFrame, grabSharpest, MediaError } from './media';
import { storage } from './storage';
import { config } from '../config';
import { stillThroughQueue } from '../jobs/still-queue';

type StillOptions = { windowMs?: number; within?: { fromMs: number; toMs: number }; alt?: string };

/**
 * Pulls a still from the full-resolution source: the exact frame at the time (input seek), or the
 * sharpest frame within a second of it. Refuses times outside the video with 400. With WORKERS=off
 * the web process runs no ffmpeg: a queue worker makes the still while the request waits.
 */
export async function pullStill(recording: Recording, atMs: number, mode: 'exact' | 'sharpest', o: StillOptions = {}): Promise<Still> {
  if (recording.durationMs === null) throw new ConflictError('The video is still being read; try again in a moment');
  checkWithinVideo(recording, 'atMs', atMs);
  if (config.workersInProcess) return makeStill(recording, atMs, mode, o);
  const stillId = await stillThroughQueue({ recordingId: recording.id, atMs, mode, ...o });
  return (await Still.findByPk(stillId))!;
}

/** Runs ffmpeg for a still and keeps it (what pullStill does in process, and a queue worker does otherwise). */
export async function makeStill(recording: Recording, atMs: number, mode: 'exact' | 'sharpest', o: StillOptions = {}): Promise<Still> {
  const id = randomUUID();
  const fileKey = `recordings/${recording.id}/stills/${id}.jpg`;
  const out = storage.stagingPath(fileKey);
  await mkdir(path.dirname(out), { recursive: true });
  // From a bucket ffmpeg reads a presigned URL, seeking on the input: only the bytes near the time travel.
  const source = await storage.inputFor(recording.sourceKey);
  try {
    if (mode === 'sharpest') {
      // "Sharpest nearby" looks only inside the chapter the time falls in, never across its start.
      const within = o.within ?? (await chapterAround(recording, atMs));
      const r = await grabSharpest(source, atMs, out, { windowMs: o.windowMs, within });
      await storage.commit(fileKey, 'image/jpeg');
      return await Still.create({
        id,
        recordingId: recording.id,
        atMs: r.atMs,
        requestedMs: atMs,
        mode,
        fileKey,
        width: r.width,
        height: r.height,
        sharpness: r.score,
        ...(o.alt ? { alt: o.alt } : {}),
      });
    }
    const r = await grabFrame(source, atMs, out);
    await storage.commit(fileKey, 'image/jpeg');
    return await Still.create({ id, recordingId: recording.id, atMs, requestedMs: atMs, mode, fileKey, width: r.width, height: r.height, sharpness: null });
  } catch (e) {
    await storage.remove(fileKey);
    if (e instanceof MediaError) throw e.code === 'bad-input' || e.code === 'no-frame' ? new BadRequestError(e.reason) : new UnprocessableError(e.reason);
    throw e;
  }
}

/** The chapter a time falls in, from its start to the next chapter's (or the end); none when no chapter starts at or before it. */
export async function chapterAround(recording: Recording, atMs: number): Promise<{ fromMs: number; toMs: number } | undefined> {
  const chapters = await Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs'], order: [['startMs', 'ASC']] });
  let k = -1;
  chapters.forEach((c, i) => {
    if (c.startMs <= atMs) k = i;
  });
  if (k < 0) return undefined;
  return { fromMs: chapters[k]!.startMs, toMs: chapters[k + 1]?.startMs ?? recording.durationMs ?? Number.MAX_SAFE_INTEGER };
}

/** A recording's stills in time order. */
export function listStills(recordingId: string): Promise<Still[]> {
  return Still.findAll({ where: { recordingId }, order: [['atMs', 'ASC']] });
}

/** Deletes a still and its image. */
/** Changes a still's caption or alt text. */
export function updateStill(still: Still, input: z.output<typeof updateStillSchema>): Promise<Still> {
  return still.update(input);
}

export async function removeStill(still: Still): Promise<void> {
  await still.destroy();
  await storage.remove(still.fileKey);
}
