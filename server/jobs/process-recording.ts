import { mkdir, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import { Op } from 'sequelize';
import { Recording } from '../models';
import { storage } from '../services/storage';
import { MediaError, makePoster, makePreview, makeThumbnails, probe } from '../services/media';

/** Recording files live under one prefix, so deleting a recording is one remove. */
export const recordingKey = (id: string, name: string) => `recordings/${id}/${name}`;

/**
 * How old a worker's heartbeat may get before its recording counts as abandoned (the worker died).
 * JOB_STALE_SECONDS sets it (60 by default; tests shorten it); heartbeats come three times as often.
 */
export const STALE_MS = () => Math.max(1, Number(process.env.JOB_STALE_SECONDS) || 60) * 1000;

/**
 * A run's lease: the moment until which it vouches for itself. It renews it three times per window, so the lease
 * runs out only when the process stopped (a crash, a kill, a power cut). Each process judges others by the lease
 * they wrote, never by its own window, so a test worker with a 3 s window leaves a 60 s worker's run alone.
 */
export const leaseFromNow = () => new Date(Date.now() + STALE_MS());

/** Where-clause part: a run with no lease, or one whose lease ran out. */
export const leaseRunOut = () => ({ leaseUntil: { [Op.or]: [{ [Op.is]: null }, { [Op.lt]: new Date() }] } });

const GENERATED = ['preview.mp4', 'poster.jpg', 'thumbs'];

/** Removes what a processing run wrote for a recording (half-written previews included); the upload stays. */
export async function clearGenerated(recordingId: string): Promise<void> {
  // ffmpeg's half-written files on this machine (on disk, beside the upload; for a bucket, in the scratch folder)
  const dir = storage.stagingPath(recordingKey(recordingId, 'x')).slice(0, -1);
  const names = await readdir(dir).catch(() => [] as string[]);
  await Promise.all(names.filter((n) => n.endsWith('.part') || GENERATED.includes(n)).map((n) => rm(path.join(dir, n), { recursive: true, force: true })));
  // and what a run stored before it died (a bucket's copies; on disk these went above)
  if (storage.kind !== 'disk') await Promise.all(GENERATED.map((n) => storage.remove(recordingKey(recordingId, n))));
}

/**
 * Probes the upload, then makes the 720p preview, the poster and scrub thumbnails, writing
 * progress to the row as it goes so the client can follow it. A file ffprobe cannot read ends as
 * `failed` with a reason a person can read; nothing else is touched. Another error (a full disk,
 * a lost database) is thrown so the queue tries again, and marks the recording failed only on the
 * last try. One worker at a time: the run claims the row, and keeps a heartbeat on it.
 */
export async function processRecording(recordingId: string, opts: { lastTry?: boolean } = {}): Promise<void> {
  const [claimed] = await Recording.update(
    { status: 'processing', progress: 0, stage: 'Reading the video', error: null, leaseUntil: leaseFromNow() },
    {
      where: {
        id: recordingId,
        [Op.or]: [{ status: 'uploaded' }, { status: 'processing', ...leaseRunOut() }],
      },
    },
  );
  // deleted while queued, done already, or a live worker has it
  if (!claimed) return;
  const rec = (await Recording.findByPk(recordingId))!;
  const beat = setInterval(() => void Recording.update({ leaseUntil: leaseFromNow() }, { where: { id: recordingId } }).catch(() => {}), STALE_MS() / 3);
  beat.unref();
  // a run that died half way may have left files behind; start from the upload alone
  await clearGenerated(recordingId);
  try {
    // ffmpeg reads the upload where it lies: a path on disk, or a presigned URL it reads by ranges
    const source = await storage.inputFor(rec.sourceKey);
    const info = await probe(source);
    if (!info.width || !info.height) throw new MediaError('not-a-video', 'This file has no video picture in it.');
    await rec.update({
      durationMs: info.durationMs,
      width: info.width,
      height: info.height,
      frameRate: info.frameRate,
      videoCodec: info.videoCodec,
      audioCodec: info.audioCodec,
      hasAudio: info.hasAudio,
      progress: 2,
      stage: 'Making the preview',
    });

    // Written on this machine first (in place on disk), then stored; poster and thumbnails come from the local preview.
    const previewKey = recordingKey(rec.id, 'preview.mp4');
    const previewPath = storage.stagingPath(previewKey);
    await mkdir(path.dirname(previewPath), { recursive: true });
    let written = 2;
    let pending: Promise<unknown> = Promise.resolve();
    await makePreview(source, previewPath, {
      durationMs: info.durationMs,
      onProgress: (p) => {
        // The preview is most of the work: 2-90 %. Write at most every 3 points.
        const overall = Math.min(90, Math.round(2 + p * 0.88));
        if (overall - written < 3) return;
        written = overall;
        pending = pending.then(() => Recording.update({ progress: overall }, { where: { id: rec.id } }));
      },
    });
    await pending;

    await Recording.update({ progress: 91, stage: 'Making the poster and thumbnails' }, { where: { id: rec.id } });
    const posterKey = recordingKey(rec.id, 'poster.jpg');
    await makePoster(previewPath, storage.stagingPath(posterKey));
    const thumbsDir = storage.stagingPath(recordingKey(rec.id, 'thumbs'));
    // About one thumbnail every two seconds, between 10 and 200 of them.
    const count = Math.max(10, Math.min(200, Math.round(info.durationMs / 2000)));
    const sheets = await makeThumbnails(previewPath, thumbsDir, { count, width: 160 });
    const thumbKeys = sheets.files.map((f) => recordingKey(rec.id, `thumbs/${path.basename(f)}`));
    await Recording.update({ progress: 96, stage: 'Storing the preview' }, { where: { id: rec.id } });
    await storage.commit(posterKey, 'image/jpeg');
    for (const key of thumbKeys) await storage.commit(key, 'image/jpeg');
    await storage.commit(previewKey, 'video/mp4');
    // a bucket's scratch folder for this recording has served its turn
    if (storage.kind !== 'disk') await rm(path.dirname(previewPath), { recursive: true, force: true });
    await rec.update({
      previewKey,
      posterKey,
      thumbnails: {
        keys: thumbKeys,
        atMs: sheets.atMs,
        columns: sheets.columns,
        rows: sheets.rows,
        perSheet: sheets.perSheet,
        tileWidth: sheets.tileWidth,
        tileHeight: sheets.tileHeight,
      },
      status: 'ready',
      progress: 100,
      stage: null,
      leaseUntil: null,
    });
  } catch (e) {
    if (e instanceof MediaError) {
      await Recording.update({ status: 'failed', error: e.reason, stage: null, leaseUntil: null }, { where: { id: recordingId } });
      return;
    }
    console.error('[process-recording]', e);
    if (opts.lastTry) {
      await Recording.update(
        { status: 'failed', error: 'Processing stopped unexpectedly; try uploading the file again.', stage: null, leaseUntil: null },
        { where: { id: recordingId } },
      ).catch(() => {});
      return;
    }
    await Recording.update(
      { status: 'uploaded', progress: 0, stage: 'Something went wrong; trying again shortly', leaseUntil: null },
      { where: { id: recordingId } },
    ).catch(() => {});
    throw e;
  } finally {
    clearInterval(beat);
  }
}
