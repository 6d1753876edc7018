import { existsSync } from 'node:fs';
import ffmpeg from 'fluent-ffmpeg';
import { MediaError, shortDetail } from './media-error';

/** The system binaries (Debian's ffmpeg); FFMPEG_PATH / FFPROBE_PATH point a worker elsewhere. */
export const FFMPEG_PATH = process.env.FFMPEG_PATH || '/usr/bin/ffmpeg';
export const FFPROBE_PATH = process.env.FFPROBE_PATH || '/usr/bin/ffprobe';

ffmpeg.setFfmpegPath(FFMPEG_PATH);
ffmpeg.setFfprobePath(FFPROBE_PATH);

export type FfmpegCommand = ffmpeg.FfmpegCommand;

/** A fluent-ffmpeg command bound to the system ffmpeg, with no input (lavfi graphs) or one input file. */
export function ffmpegCommand(input?: string): FfmpegCommand {
  const command = input === undefined ? ffmpeg() : ffmpeg(input);
  return command.setFfmpegPath(FFMPEG_PATH);
}

/**
 * Runs a prepared command; failures become a MediaError whose reason starts with `failure`.
 * `onStderr` sees every stderr line (fluent-ffmpeg splits on CR too, so progress lines arrive one by one).
 */
export function runFfmpeg(
  command: FfmpegCommand,
  failure: string,
  options: { onStderr?: (line: string) => void; paths?: string[] } = {},
): Promise<void> {
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

/** Seconds as ffmpeg reads them, to the microsecond. */
export function seconds(ms: number): string {
  return (Math.round(ms * 1000) / 1_000_000).toFixed(6);
}

/** Rounds down to an even number of at least 2 (yuv420p and libx264 need even sizes). */
export function even(n: number): number {
  return Math.max(2, Math.floor(n / 2) * 2);
}
