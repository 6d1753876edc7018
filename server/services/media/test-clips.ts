/**
 * Tiny test recordings made with ffmpeg's lavfi sources, straight through the ffmpeg binary
 * (not through the code under test), plus pixel and container readers for checking results.
 */
import { execFile } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import sharp from 'sharp';
import { FFMPEG_PATH, FFPROBE_PATH } from './ffmpeg';

const run = promisify(execFile);

export const tempDir = () => mkdtemp(join(tmpdir(), 'cardwright-media-test-'));

/** Runs the system ffmpeg quietly with the given arguments; resolves to `output`. */
export async function ffmpegMake(output: string, args: string[]): Promise<string> {
  await run(FFMPEG_PATH, ['-v', 'error', '-y', ...args, output]);
  return output;
}

/** Fields of the first video stream, straight from ffprobe, as an independent check on probe(). */
export async function ffprobeVideo(file: string): Promise<Record<string, string>> {
  const { stdout } = await run(FFPROBE_PATH, ['-v', 'error', '-select_streams', 'v:0', '-show_entries', 'stream', '-of', 'json', file]);
  return JSON.parse(stdout).streams[0];
}

/** One colour a second, in this order; names are ffmpeg's colour names, values their RGB. */
export const STEPS: { name: string; rgb: [number, number, number] }[] = [
  { name: 'red', rgb: [255, 0, 0] },
  { name: 'lime', rgb: [0, 255, 0] },
  { name: 'blue', rgb: [0, 0, 255] },
  { name: 'yellow', rgb: [255, 255, 0] },
  { name: 'magenta', rgb: [255, 0, 255] },
];

/**
 * A 5 s, 160x120, 25 fps H.264 clip whose colour changes every second (STEPS), with a single
 * keyframe at 0 so that any seek has to decode forward to reach its frame.
 */
export function colourSteps(dir: string): Promise<string> {
  const sources = STEPS.map((s, i) => `color=c=${s.name}:s=160x120:r=25:d=1[c${i}]`).join(';');
  const inputs = STEPS.map((_, i) => `[c${i}]`).join('');
  return ffmpegMake(join(dir, 'steps.mp4'), [
    '-filter_complex',
    `${sources};${inputs}concat=n=${STEPS.length}:v=1:a=0[v]`,
    '-map',
    '[v]',
    '-c:v',
    'libx264',
    '-preset',
    'ultrafast',
    '-g',
    '1000',
    '-pix_fmt',
    'yuv420p',
  ]);
}

/** The RGB of one pixel of an image file (decoded by sharp). */
export async function pixelAt(file: string, x: number, y: number): Promise<[number, number, number]> {
  const { data, info } = await sharp(file).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const i = (y * info.width + x) * info.channels;
  return [data[i], data[i + 1], data[i + 2]];
}

/** Which of STEPS a colour is closest to (lossy video shifts colours a little, never across). */
export function nearestStep(rgb: [number, number, number]): string {
  let best = STEPS[0];
  let bestD = Infinity;
  for (const s of STEPS) {
    const d = s.rgb.reduce((sum, c, k) => sum + (c - rgb[k]) ** 2, 0);
    if (d < bestD) [best, bestD] = [s, d];
  }
  return best.name;
}

/** Top-level box types of an MP4 in file order (ISO/IEC 14496-12, 4.2: 32-bit size, type, 64-bit size when size is 1). */
export function topLevelBoxes(file: string): string[] {
  const b = readFileSync(file);
  const types: string[] = [];
  let at = 0;
  while (at + 8 <= b.length) {
    let size = b.readUInt32BE(at);
    const type = b.toString('latin1', at + 4, at + 8);
    if (size === 1) size = Number(b.readBigUInt64BE(at + 8));
    else if (size === 0) size = b.length - at;
    types.push(type);
    if (size < 8) break;
    at += size;
  }
  return types;
}
