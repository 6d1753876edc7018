import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import ffmpeg from 'fluent-ffmpeg';
import { MediaError, shortDetail } from './media-error';

/** The system binaries (Debian's ffmpeg); FFMPEG_PATH / FFPROBE_PATH point a worker elsewhere. */
export const FFMPEG_PATH = process.env.FFMPEG_PATH || '/usr/bin/ffmpeg';
export const FFPROBE_PATH = process.env.FFPROBE_PATH || '/usr/bin/ffprobe';

ffmpeg.setFfmpegPath(FFMPEG_PATH);
ffmpeg.setFfprobePath(FFPROBE_PATH);

/**
 * Media tools run tied to this process's life (`setpriv --pdeathsig KILL`, util-linux, in every
 * Debian): when the server or worker dies, its ffmpeg and ffprobe die too instead of working on for
 * nobody. Without setpriv (another system) they run as they are.
 */
const SETPRIV = '/usr/bin/setpriv';
const TETHERED_FFMPEG = fileURLToPath(new URL('./bin/ffmpeg-tethered', import.meta.url));
const tethered = existsSync(SETPRIV) && existsSync(TETHERED_FFMPEG);
// the wrapper script reads the real binary from here
process.env.CARDWRIGHT_FFMPEG = FFMPEG_PATH;

/** The executable and arguments that run `tool args` tied to this process's life. */
export function tetheredCommand(tool: string, args: readonly string[]): [string, string[]] {
  return tethered ? [SETPRIV, ['--pdeathsig', 'KILL', '--', tool, ...args]] : [tool, [...args]];
}

export type FfmpegCommand = ffmpeg.FfmpegCommand;

/** A fluent-ffmpeg command bound to the system ffmpeg, with no input (lavfi graphs) or one input file. */
export function ffmpegCommand(input?: string): FfmpegCommand {
  const command = input === undefined ? ffmpeg() : ffmpeg(input);
  return command.setFfmpegPath(tethered ? TETHERED_FFMPEG : FFMPEG_PATH);
}

/**
 * Runs a prepared command; failures become a MediaError whose reason starts with `failure`.
 * `onStderr` sees every stderr line (fluent-ffmpeg splits on CR too, so progress lines arrive one by one).
 */
export function runFfmpeg(command: FfmpegCommand, failure: string, options: { onStderr?: (line: string) => void; paths?: string[] } = {}): Promise<void> {
  return new Promise((resolve, reject) => {
    if (!existsSync(FFMPEG_PATH)) {
      reject(new MediaError('failed', `ffmpeg is not installed at ${FFMPEG_PATH}`));
      return;
    }
    if (options.onStderr) command.on('stderr', options.onStderr);
    command.on('error', (err: Error, _stdout: string | null, stderr: string | null) => {
      const detail = shortDetail(stderr || err.message, options.paths);
      reject(new MediaError('failed', `${failure}: ${detail}`, { detail, cause: err }));
    });
    command.on('end', () => resolve());
    command.run();
  });
}

/** An input that ffmpeg reads over HTTP (a presigned URL of a file in object storage) rather than from this disk. */
export const isUrl = (input: string) => /^https?:\/\//i.test(input);

/** An input as ffmpeg is given it: a URL as it is, a path made absolute. */
export function sourceOf(input: string): string {
  return isUrl(input) ? input : resolve(input);
}

/** Seconds as ffmpeg reads them, to the microsecond. */
export function seconds(ms: number): string {
  return (Math.round(ms * 1000) / 1_000_000).toFixed(6);
}

/** Rounds down to an even number of at least 2 (yuv420p and libx264 need even sizes). */
export function even(n: number): number {
  return Math.max(2, Math.floor(n / 2) * 2);
}
