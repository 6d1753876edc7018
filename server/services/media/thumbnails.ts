import { existsSync } from 'node:fs';
import { mkdir, readdir, unlink } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { even, ffmpegCommand, runFfmpeg, sourceOf } from './ffmpeg';
import { MediaError } from './media-error';
import { probe } from './probe';

export type ThumbnailOptions = {
  /** How many thumbnails across the whole video (default 100). */
  count?: number;
  /** Or one thumbnail every this many milliseconds. */
  everyMs?: number;
  /** Tile width in pixels (default 160); the height follows the aspect ratio. */
  width?: number;
};

/**
 * Scrub thumbnails as sprite sheets: JPEGs of up to 10 x 10 tiles, filled left to right, top to
 * bottom. Thumbnail i is tile i % perSheet of files[floor(i / perSheet)] and shows the frame on
 * screen at atMs[i] = i * interval. A last sheet that is not full keeps the grid, with black cells.
 */
export type ThumbnailSheets = {
  files: string[];
  atMs: number[];
  columns: number;
  rows: number;
  perSheet: number;
  tileWidth: number;
  tileHeight: number;
};

const GRID = 10;

/**
 * Makes scrub thumbnails in one ffmpeg run (fps filter rounding up, so each tile is the frame shown
 * at its time, then scale and tile). It decodes the whole input: give it the 720p preview rather than
 * a 4K original when both exist.
 */
export async function makeThumbnails(input: string, outputDir: string, options: ThumbnailOptions = {}): Promise<ThumbnailSheets> {
  if (options.count !== undefined && options.everyMs !== undefined) {
    throw new MediaError('bad-input', 'Ask for a number of thumbnails or a spacing between them, not both');
  }
  const source = sourceOf(input);
  const dir = resolve(outputDir);
  const info = await probe(source);

  const frameMs = info.frameRate > 0 ? 1000 / info.frameRate : 40;
  let intervalMs: number;
  let count: number;
  if (options.everyMs !== undefined) {
    if (!(options.everyMs > 0)) throw new MediaError('bad-input', 'The spacing between thumbnails must be more than 0');
    intervalMs = Math.max(1, Math.round(options.everyMs));
    count = Math.max(1, Math.ceil(info.durationMs / intervalMs));
  } else {
    const wanted = Math.floor(options.count ?? 100);
    if (!(wanted >= 1)) throw new MediaError('bad-input', 'Ask for at least one thumbnail');
    // No more thumbnails than frames, or neighbours would repeat.
    count = Math.max(1, Math.min(wanted, Math.floor(info.durationMs / frameMs)));
    intervalMs = Math.max(1, Math.round(info.durationMs / count));
  }
  const atMs = Array.from({ length: count }, (_, i) => i * intervalMs);

  const tileWidth = even(options.width ?? 160);
  const tileHeight = even(Math.round((tileWidth * info.height) / info.width));
  const columns = Math.min(GRID, count);
  const rows = Math.min(GRID, Math.ceil(count / columns));
  const perSheet = columns * rows;
  const sheets = Math.ceil(count / perSheet);

  await mkdir(dir, { recursive: true });
  // Sheets left by an earlier, longer run must not pass for this run's output.
  for (const old of (await readdir(dir)).filter((f) => /^thumbs-\d{3,}\.jpg$/.test(f))) {
    await unlink(join(dir, old)).catch(() => undefined);
  }
  const command = ffmpegCommand(source)
    .inputOptions(['-hide_banner'])
    .outputOptions([
      '-map',
      '0:v:0',
      '-an',
      '-sn',
      '-fps_mode',
      'passthrough',
      '-vf',
      [
        `fps=fps=1000/${intervalMs}:start_time=0:round=up`,
        `select='lt(n,${count})'`,
        `scale=${tileWidth}:${tileHeight}:flags=area`,
        `tile=${columns}x${rows}`,
      ].join(','),
      '-q:v',
      '5',
      '-f',
      'image2',
    ])
    .output(join(dir, 'thumbs-%03d.jpg'));
  await runFfmpeg(command, 'The thumbnails could not be made', { paths: [source, dir] });

  const files = Array.from({ length: sheets }, (_, i) => join(dir, `thumbs-${String(i + 1).padStart(3, '0')}.jpg`));
  const missing = files.find((f) => !existsSync(f));
  if (missing) throw new MediaError('failed', 'The thumbnails could not be made: ffmpeg wrote fewer sheets than expected');
  return { files, atMs, columns, rows, perSheet, tileWidth, tileHeight };
}
