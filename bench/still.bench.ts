/**
 * Pulling a still: one 1080p frame at 3:37 of a 5-minute H.264 file, through the media service
 * (grabFrame) against the plain ffmpeg command line, in the same run. Target: the service within
 * 1.3x of the command line (our 2-core reference machine: about 0.19 s with input seek).
 *
 *   npx tsx bench/still.bench.ts [--runs 9]
 *
 * The source is made once with testsrc2 (ultrafast, a keyframe every 4 s) and cached in bench/out/.
 */
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdir, rename, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { FFMPEG_PATH } from '@server/services/media/ffmpeg';
import { grabFrame } from '@server/services/media/frames';

const run = promisify(execFile);
const OUT = fileURLToPath(new URL('./out/', import.meta.url));
const SOURCE = join(OUT, 'still-5min-1080p.mp4');
/** The cached 5-minute 1080p source, shared with the API bench. */
export const STILL_SOURCE = SOURCE;
const AT_MS = 217_000; // 3:37
const TARGET_RATIO = 1.3;

/** Makes the 5-minute 1080p source unless a complete one is cached. */
export async function ensureStillSource(): Promise<void> {
  if (existsSync(SOURCE) && (await stat(SOURCE)).size > 1_000_000) return;
  await mkdir(OUT, { recursive: true });
  const partial = `${SOURCE}.part`;
  const started = performance.now();
  console.log('making a 5-minute 1920x1080 H.264 source (once; cached in bench/out/) ...');
  await run(FFMPEG_PATH, [
    '-v',
    'error',
    '-y',
    '-f',
    'lavfi',
    '-i',
    'testsrc2=s=1920x1080:r=25:d=300',
    '-c:v',
    'libx264',
    '-preset',
    'ultrafast',
    '-crf',
    '32',
    '-g',
    '100',
    '-pix_fmt',
    'yuv420p',
    '-f',
    'mp4',
    partial,
  ]);
  await rename(partial, SOURCE);
  console.log(`  made in ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

async function time(fn: () => Promise<unknown>): Promise<number> {
  const t = performance.now();
  await fn();
  return performance.now() - t;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

export type StillBenchResult = { serviceMs: number; commandLineMs: number; ratio: number; target: number; pass: boolean };

/** Runs the comparison and prints the figures; `runs` timed rounds after one warm-up of each. */
export async function benchStill(runs = 9): Promise<StillBenchResult> {
  await ensureStillSource();
  const viaService = join(OUT, 'still-service.jpg');
  const viaCli = join(OUT, 'still-cli.jpg');
  const service = () => grabFrame(SOURCE, AT_MS, viaService);
  // The documented command line, plus -y so it can overwrite its own output.
  const commandLine = () => run(FFMPEG_PATH, ['-y', '-ss', String(AT_MS / 1000), '-i', SOURCE, '-frames:v', '1', '-q:v', '2', viaCli]);

  // Warm-up: page cache for the file, and fluent-ffmpeg's one-off capability checks.
  const firstServiceMs = await time(service);
  await commandLine();
  const s: number[] = [];
  const c: number[] = [];
  // Alternate so that both see the same machine load.
  for (let i = 0; i < runs; i++) {
    s.push(await time(service));
    c.push(await time(commandLine));
  }
  const serviceMs = median(s);
  const commandLineMs = median(c);
  const ratio = serviceMs / commandLineMs;
  const pass = ratio <= TARGET_RATIO;
  const size = await grabFrame(SOURCE, AT_MS, viaService);
  console.log(`still at 3:37 of a 5-minute ${size.width}x${size.height} H.264 file, median of ${runs}:`);
  console.log(`  ffmpeg command line  ${commandLineMs.toFixed(0).padStart(6)} ms  (min ${Math.min(...c).toFixed(0)}, max ${Math.max(...c).toFixed(0)})`);
  console.log(`  grabFrame service    ${serviceMs.toFixed(0).padStart(6)} ms  (min ${Math.min(...s).toFixed(0)}, max ${Math.max(...s).toFixed(0)})`);
  console.log(`  first service call in this process ${firstServiceMs.toFixed(0)} ms (includes fluent-ffmpeg's one-off capability checks)`);
  console.log(`  ratio ${ratio.toFixed(2)}x, target <= ${TARGET_RATIO}x: ${pass ? 'PASS' : 'FAIL'}`);
  return { serviceMs, commandLineMs, ratio, target: TARGET_RATIO, pass };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const i = process.argv.indexOf('--runs');
  const runs = i > 0 ? Number(process.argv[i + 1]) : 9;
  void benchStill(runs).then((r) => {
    if (!r.pass) process.exitCode = 1;
  });
}
