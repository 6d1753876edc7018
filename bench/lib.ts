/**
 * Small helpers shared by the bench/*.bench.ts scripts: time a function
 * several times and report the median, print a verdict against a target.
 */
import { fileURLToPath } from 'node:url';

export interface Timing {
  /** Median of the timed runs, in milliseconds. */
  median: number;
  min: number;
  max: number;
  runs: number;
  samples: number[];
}

/** The median of a list of numbers (NaN for none). */
export function median(xs: readonly number[]): number {
  if (xs.length === 0) return Number.NaN;
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

function summarize(samples: number[]): Timing {
  return { median: median(samples), min: Math.min(...samples), max: Math.max(...samples), runs: samples.length, samples };
}

/** Times a synchronous function `runs` times after `warmup` untimed calls (JIT, caches). */
export function timeSync(fn: () => unknown, runs = 7, warmup = 1): Timing {
  for (let i = 0; i < warmup; i++) fn();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    fn();
    samples.push(performance.now() - t);
  }
  return summarize(samples);
}

/** Times an async function the same way. */
export async function timeAsync(fn: () => Promise<unknown>, runs = 7, warmup = 1): Promise<Timing> {
  for (let i = 0; i < warmup; i++) await fn();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await fn();
    samples.push(performance.now() - t);
  }
  return summarize(samples);
}

/** "120 ms" with a precision that suits the size. */
export function ms(x: number): string {
  return `${x < 10 ? x.toFixed(2) : x < 100 ? x.toFixed(1) : x.toFixed(0)} ms`;
}

/** "OK" when under the target, otherwise "SLOW". */
export function verdict(value: number, target: number): 'OK' | 'SLOW' {
  return value < target ? 'OK' : 'SLOW';
}

/** True when the calling module is the script node was started with (not imported). */
export function isMain(importMetaUrl: string): boolean {
  return process.argv[1] !== undefined && fileURLToPath(importMetaUrl) === process.argv[1];
}

/** The value of `--name N` on the command line, or the fallback. */
export function numberArg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const v = i > 0 ? Number(process.argv[i + 1]) : Number.NaN;
  return Number.isFinite(v) && v > 0 ? v : fallback;
}

/** A small seeded random generator (mulberry32), so bench inputs are the same every run. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
