import { randomBytes } from 'node:crypto';
import { readFile, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { ffmpegCommand, runFfmpeg, seconds, sourceOf } from './ffmpeg';
import { readJpegSize } from './jpeg-size';
import { MediaError } from './media-error';
import { probe } from './probe';

/** Tallest preview and poster; taller sources are scaled down, smaller ones are left alone. */
export const PREVIEW_MAX_HEIGHT = 720;
/** Previews of 50/60 fps footage drop to this rate: half the encoding time, and plenty for watching. */
export const PREVIEW_MAX_FPS = 30;

// Height at most 720 and even; width follows the aspect ratio, rounded to even (-2).
const FIT_720 = `scale=-2:'trunc(min(${PREVIEW_MAX_HEIGHT},ih)/2)*2'`;

export type PreviewOptions = {
  /** Called with 0-100 as ffmpeg reports how far it has got (its time= over the duration). */
  onProgress?: (percent: number) => void;
  /** The source's duration if already known; otherwise it is probed. */
  durationMs?: number;
};

/**
 * Makes the light browser preview: H.264 (libx264, veryfast, CRF 26, yuv420p) with AAC sound,
 * at most 720 px tall, never upscaled, moov atom first (+faststart) so playback starts before the
 * download ends. Written to a temporary name and renamed, so `output` is never half a file.
 * Progress stops at ffmpeg's last report (about 100); the caller marks the job done when this resolves.
 */
export async function makePreview(input: string, output: string, options: PreviewOptions = {}): Promise<void> {
  const source = sourceOf(input);
  const target = resolve(output);
  const info = await probe(source);
  const durationMs = options.durationMs && options.durationMs > 0 ? options.durationMs : info.durationMs;
  const filters = info.frameRate > PREVIEW_MAX_FPS + 0.5 ? `fps=${PREVIEW_MAX_FPS},${FIT_720}` : FIT_720;
  const partial = join(dirname(target), `.${basename(target)}.${randomBytes(4).toString('hex')}.part`);

  const command = ffmpegCommand(source)
    .inputOptions(['-hide_banner'])
    .outputOptions([
      '-map',
      '0:v:0',
      '-map',
      '0:a:0?',
      '-sn',
      '-dn',
      '-vf',
      filters,
      // Keep the source's timestamps: phone recordings are often variable-rate and some report odd
      // nominal rates (90000 fps) that a constant-rate output would fill with duplicates.
      '-fps_mode',
      'vfr',
      '-c:v',
      'libx264',
      '-preset',
      'veryfast',
      '-crf',
      '26',
      '-pix_fmt',
      'yuv420p',
      '-profile:v',
      'high',
      '-c:a',
      'aac',
      '-b:a',
      '128k',
      '-ac',
      '2',
      '-movflags',
      '+faststart',
      // Sparse or late audio packets otherwise overflow the muxing queue on some phone files.
      '-max_muxing_queue_size',
      '1024',
      '-f',
      'mp4',
    ])
    .output(partial);

  let reported = -1;
  const onStderr = options.onProgress
    ? (line: string) => {
        const m = /time=\s*(\d+):(\d{2}):(\d{2}(?:\.\d+)?)/.exec(line);
        if (!m || durationMs <= 0) return;
        const doneMs = ((Number(m[1]) * 60 + Number(m[2])) * 60 + Number(m[3])) * 1000;
        const percent = Math.min(100, Math.floor((doneMs / durationMs) * 1000) / 10);
        if (percent > reported) {
          reported = percent;
          options.onProgress!(percent);
        }
      }
    : undefined;

  try {
    await runFfmpeg(command, 'The preview could not be made', { onStderr, paths: [source, partial] });
    await rename(partial, target);
  } catch (e) {
    await unlink(partial).catch(() => undefined);
    throw e;
  }
}

/**
 * Saves the poster JPEG, at most 720 px tall like the preview. By default it is taken at 10% of the
 * duration but not before 1 s (recordings often open on a fade or a hand over the lens), and for a
 * clip shorter than 2 s at its middle. Returns where it was taken and its size.
 */
export async function makePoster(input: string, output: string, atMs?: number): Promise<{ atMs: number; width: number; height: number }> {
  const source = sourceOf(input);
  const target = resolve(output);
  const info = await probe(source);
  const frameMs = info.frameRate > 0 ? 1000 / info.frameRate : 40;
  const wanted = atMs ?? Math.max(Math.min(1000, info.durationMs / 2), info.durationMs * 0.1);
  const at = Math.round(Math.max(0, Math.min(wanted, info.durationMs - frameMs)));

  await unlink(target).catch(() => undefined);
  const command = ffmpegCommand(source)
    .inputOptions(['-hide_banner', '-ss', seconds(at)])
    .outputOptions(['-map', '0:v:0', '-frames:v', '1', '-vf', FIT_720, '-q:v', '3', '-an', '-sn', '-f', 'image2', '-update', '1'])
    .output(target);
  await runFfmpeg(command, 'The poster could not be made', { paths: [source, target] });
  const size = readJpegSize((await readFile(target).catch(() => null)) ?? new Uint8Array());
  if (!size) throw new MediaError('no-frame', 'The poster could not be made: no frame was found at that time');
  return { atMs: at, ...size };
}
