import { readFile, unlink } from 'node:fs/promises';
import { resolve } from 'node:path';
import { Writable } from 'node:stream';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { even, ffmpegCommand, runFfmpeg, seconds, sourceOf } from './ffmpeg';
import { readJpegSize } from './jpeg-size';
import { MediaError } from './media-error';
import { probe } from './probe';
import { laplacianVariance } from './sharpness';

/**
 * Saves the frame at `atMs` as a full-resolution JPEG (quality -q:v 2). Seeks on the input (`-ss`
 * before `-i`), which jumps to the keyframe before the time and decodes forward to it: ffmpeg keeps
 * the first frame whose timestamp is at or after `atMs`. No probe first, so it costs one ffmpeg run.
 */
export async function grabFrame(input: string, atMs: number, output: string): Promise<{ width: number; height: number }> {
  if (!Number.isFinite(atMs) || atMs < 0) throw new MediaError('bad-input', 'A still needs a time of 0:00 or later');
  const source = sourceOf(input);
  const target = resolve(output);
  // ffmpeg writes nothing when the time is past the end; a file left from before must not pass for it.
  await unlink(target).catch(() => undefined);
  const command = ffmpegCommand(source)
    .inputOptions(['-hide_banner', '-ss', seconds(atMs)])
    .outputOptions(['-map', '0:v:0', '-frames:v', '1', '-q:v', '2', '-an', '-sn', '-f', 'image2', '-update', '1'])
    .output(target);
  await runFfmpeg(command, `The frame at ${formatTimestamp(atMs)} could not be pulled`, { paths: [source, target] });
  const bytes = await readFile(target).catch(() => null);
  const size = bytes && readJpegSize(bytes);
  if (!size) {
    throw new MediaError('no-frame', `There is no frame at ${formatTimestamp(atMs)}: the video ends before that`);
  }
  return size;
}

/** `within`: frames outside these times are never looked at (a chapter's start and the next chapter's). */
export type SharpestOptions = { windowMs?: number; within?: { fromMs: number; toMs: number } };
export type SharpestStill = { atMs: number; score: number; width: number; height: number };

/** Frames whose scores are this close to the best count as equally sharp; the nearest one wins. */
const SHARP_TIE = 0.02;
const SCORE_WIDTH = 320;

/**
 * Saves the least blurred frame within ±windowMs of `atMs` (clamped to the video). One ffmpeg run
 * decodes the window at 320 px wide to raw greyscale piped out; each frame is scored by the variance
 * of its Laplacian; then the winner is grabbed at full resolution. Among frames within 2% of the best
 * score the one nearest `atMs` is kept. `atMs` in the result is a whole millisecond that grabFrame
 * maps back to the same frame.
 */
export async function grabSharpest(input: string, atMs: number, output: string, { windowMs = 1000, within }: SharpestOptions = {}): Promise<SharpestStill> {
  if (!Number.isFinite(atMs) || atMs < 0) throw new MediaError('bad-input', 'A still needs a time of 0:00 or later');
  const source = sourceOf(input);
  const info = await probe(source);
  const frameMs = info.frameRate > 0 ? 1000 / info.frameRate : 40;
  // The last frame starts one frame before the end; asking for later finds nothing.
  const lastMs = Math.max(0, info.durationMs - frameMs);
  const lo = within ? Math.max(0, within.fromMs) : 0;
  const hi = within ? Math.min(info.durationMs, within.toMs) : info.durationMs;
  const center = Math.max(lo, Math.min(atMs, lastMs, hi));
  const fromMs = Math.max(lo, center - Math.max(0, windowMs));
  const toMs = Math.max(fromMs + frameMs, Math.min(hi, center + Math.max(0, windowMs)));

  const width = Math.min(SCORE_WIDTH, even(info.width));
  const height = even(Math.round((width * info.height) / info.width));
  const frameBytes = width * height;

  const scores: number[] = [];
  const times: number[] = [];
  const frame = new Uint8Array(frameBytes);
  let filled = 0;
  const sink = new Writable({
    // fluent-ffmpeg treats a 'close' on its output stream as a failure if ffmpeg has not exited yet.
    emitClose: false,
    write(chunk: Buffer, _encoding, done) {
      let offset = 0;
      while (offset < chunk.length) {
        const n = Math.min(frameBytes - filled, chunk.length - offset);
        frame.set(chunk.subarray(offset, offset + n), filled);
        filled += n;
        offset += n;
        if (filled === frameBytes) {
          scores.push(laplacianVariance(frame, width, height));
          filled = 0;
        }
      }
      done();
    },
  });
  const finished = new Promise<void>((ok) => sink.on('finish', ok));

  const command = ffmpegCommand(source)
    // -t on the input side trims before the filters, so showinfo sees exactly the frames piped out.
    .inputOptions(['-hide_banner', '-ss', seconds(fromMs), '-t', seconds(Math.max(frameMs, toMs - fromMs))])
    .outputOptions([
      '-map',
      '0:v:0',
      '-an',
      '-sn',
      // One output frame per decoded frame, so frame i of the pipe is showinfo line i.
      '-fps_mode',
      'passthrough',
      '-vf',
      `scale=${width}:${height}:flags=area,format=gray,showinfo`,
      '-f',
      'rawvideo',
    ])
    .output(sink, { end: true });
  await runFfmpeg(command, `The frames near ${formatTimestamp(center)} could not be read`, {
    paths: [source],
    onStderr: (line) => {
      const m = /\bn:\s*\d+\s+pts:\s*-?\d+\s+pts_time:\s*(-?[\d.]+(?:e[-+]?\d+)?)/.exec(line);
      if (m) times.push(fromMs + Number(m[1]) * 1000);
    },
  });
  await finished;

  const count = Math.min(scores.length, times.length || scores.length);
  if (count === 0) {
    const size = await grabFrame(source, Math.floor(center), output);
    return { atMs: Math.floor(center), score: 0, ...size };
  }
  const timeOf = (i: number) => (times.length ? times[i] : fromMs + i * frameMs);
  let best = 0;
  for (let i = 1; i < count; i++) if (scores[i] > scores[best]) best = i;
  const floor = scores[best] * (1 - SHARP_TIE);
  let pick = best;
  for (let i = 0; i < count; i++) {
    if (scores[i] >= floor && Math.abs(timeOf(i) - center) < Math.abs(timeOf(pick) - center)) pick = i;
  }
  // Rounding down keeps the seek between this frame and the one before it, so grabFrame (first
  // frame at or after the time) lands on this very frame.
  const pickedMs = Math.max(0, Math.floor(timeOf(pick)));
  const size = await grabFrame(source, pickedMs, output);
  return { atMs: pickedMs, score: Math.round(scores[pick] * 100) / 100, ...size };
}
