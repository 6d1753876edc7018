import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { Recording } from '../models';
import { storage } from '../services/storage';
import { MediaError, makePoster, makePreview, makeThumbnails, probe } from '../services/media';

/** Recording files live under one prefix, so deleting a recording is one remove. */
export const recordingKey = (id: string, name: string) => `recordings/${id}/${name}`;

/**
 * Probes the upload, then makes the 720p preview, the poster and scrub thumbnails, writing
 * progress to the row as it goes so the client can follow it. A file ffprobe cannot read ends as
 * `failed` with a reason a person can read; nothing else is touched.
 */
export async function processRecording(recordingId: string): Promise<void> {
  const rec = await Recording.findByPk(recordingId);
  if (!rec) return; // deleted while queued
  await rec.update({ status: 'processing', progress: 0, stage: 'Reading the video', error: null });
  try {
    const source = storage.localPath(rec.sourceKey);
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

    const previewKey = recordingKey(rec.id, 'preview.mp4');
    const previewPath = storage.localPath(previewKey);
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

    await rec.update({ previewKey, progress: 92, stage: 'Making the poster and thumbnails' });
    const posterKey = recordingKey(rec.id, 'poster.jpg');
    await makePoster(previewPath, storage.localPath(posterKey));
    const thumbsDir = storage.localPath(recordingKey(rec.id, 'thumbs'));
    // About one thumbnail every two seconds, between 10 and 200 of them.
    const count = Math.max(10, Math.min(200, Math.round(info.durationMs / 2000)));
    const sheets = await makeThumbnails(previewPath, thumbsDir, { count, width: 160 });
    await rec.update({
      posterKey,
      thumbnails: {
        keys: sheets.files.map((f) => recordingKey(rec.id, `thumbs/${path.basename(f)}`)),
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
    });
  } catch (e) {
    const reason = e instanceof MediaError ? e.reason : 'Processing stopped unexpectedly; try uploading the file again.';
    if (!(e instanceof MediaError)) console.error('[process-recording]', e);
    await Recording.update({ status: 'failed', error: reason, stage: null }, { where: { id: recordingId } });
  }
}
