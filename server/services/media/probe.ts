import { execFile } from 'node:child_process';
import { stat } from 'node:fs/promises';
import { FFPROBE_PATH, ffmpegCommand, isUrl, runFfmpeg, tetheredCommand } from './ffmpeg';
import { MediaError, shortDetail } from './media-error';

/** What the footage is. Width and height are as displayed, after any rotation a phone recorded. */
export type MediaInfo = {
  durationMs: number;
  width: number;
  height: number;
  /** Frames per second (average rate, e.g. 29.97). */
  frameRate: number;
  videoCodec: string;
  audioCodec: string | null;
  hasAudio: boolean;
  sizeBytes: number;
  /** ffprobe's demuxer name, e.g. "mov,mp4,m4a,3gp,3g2,mj2" or "matroska,webm". */
  formatName: string;
};

type ProbeStream = {
  codec_type?: string;
  codec_name?: string;
  width?: number;
  height?: number;
  avg_frame_rate?: string;
  r_frame_rate?: string;
  duration?: string;
  disposition?: { attached_pic?: number };
  tags?: Record<string, string>;
  side_data_list?: { rotation?: number }[];
};
type ProbeOutput = { streams?: ProbeStream[]; format?: { format_name?: string; duration?: string; size?: string } };

const UNREADABLE = 'This file could not be read as a video';
// Demuxers that take a still picture or a text file for a one-frame "video".
const STILL_FORMATS = /(^|,)(image2|[a-z0-9]+_pipe|tty|apng|gif)(,|$)/;

/**
 * Reads duration, size, frame rate and codecs with the system ffprobe. Rejects with a MediaError
 * when the file is missing, is not a video ffprobe can read, or holds no video stream.
 */
export async function probe(path: string): Promise<MediaInfo> {
  // A file in object storage is read through its URL; ffprobe's answer says its size.
  const size = isUrl(path)
    ? -1
    : await stat(path).then(
        (s) => (s.isFile() ? s.size : null),
        () => null,
      );
  if (size === null) throw new MediaError('unreadable', `${UNREADABLE}: the file was not found`);
  if (size === 0) throw new MediaError('unreadable', `${UNREADABLE}: the file is empty`);

  const data = await runProbe(path);
  const streams = data.streams ?? [];
  const formatName = data.format?.format_name ?? '';
  const video = streams.find((s) => s.codec_type === 'video' && !s.disposition?.attached_pic);
  const audio = streams.find((s) => s.codec_type === 'audio');

  if (!video) {
    throw new MediaError('not-a-video', audio ? 'This file holds only sound, no video' : `${UNREADABLE}: it has no video stream`);
  }
  if (STILL_FORMATS.test(formatName) || video.codec_name === 'ansi') {
    throw new MediaError('not-a-video', 'This file is a picture or a text file, not a video', { detail: formatName });
  }
  if (!video.width || !video.height) throw new MediaError('unreadable', `${UNREADABLE}: the video has no picture size`);

  const quarterTurn = Math.abs(rotation(video)) % 180 === 90;
  const frameRate = rate(video.avg_frame_rate) ?? rate(video.r_frame_rate) ?? 0;
  const durationMs = seconds(data.format?.duration) ?? seconds(video.duration) ?? (await demuxDurationMs(path, frameRate));

  return {
    durationMs,
    width: quarterTurn ? video.height : video.width,
    height: quarterTurn ? video.width : video.height,
    frameRate: Math.round(frameRate * 1000) / 1000,
    videoCodec: video.codec_name ?? 'unknown',
    audioCodec: audio?.codec_name ?? null,
    hasAudio: Boolean(audio),
    sizeBytes: Number(data.format?.size) || Math.max(0, size),
    formatName,
  };
}

function runProbe(path: string): Promise<ProbeOutput> {
  // -v error rather than quiet: on failure the one error line is the reason we pass on.
  const args = ['-v', 'error', '-print_format', 'json', '-show_format', '-show_streams', path];
  return new Promise((resolve, reject) => {
    execFile(...tetheredCommand(FFPROBE_PATH, args), { maxBuffer: 16 * 1024 * 1024, timeout: 60_000 }, (err, stdout, stderr) => {
      if (err) {
        const detail = (err as NodeJS.ErrnoException).code === 'ENOENT' ? `ffprobe is not installed at ${FFPROBE_PATH}` : shortDetail(stderr, [path]);
        reject(new MediaError('unreadable', `${UNREADABLE}: ${detail}`, { detail, cause: err }));
        return;
      }
      try {
        resolve(JSON.parse(stdout) as ProbeOutput);
      } catch (cause) {
        reject(new MediaError('unreadable', `${UNREADABLE}: ffprobe gave no readable answer`, { cause }));
      }
    });
  });
}

/**
 * Files recorded straight to a stream (a browser's MediaRecorder webm, a pipe) carry no duration;
 * reading the packets without decoding finds the last timestamp quickly.
 */
async function demuxDurationMs(path: string, frameRate: number): Promise<number> {
  let lastMs = -1;
  const command = ffmpegCommand(path).outputOptions(['-map', '0:v:0', '-c', 'copy', '-f', 'null']).output('-');
  await runFfmpeg(command, UNREADABLE, {
    paths: [path],
    onStderr: (line) => {
      const m = /time=\s*(\d+):(\d{2}):(\d{2}(?:\.\d+)?)/.exec(line);
      if (m) lastMs = ((Number(m[1]) * 60 + Number(m[2])) * 60 + Number(m[3])) * 1000;
    },
  }).catch((e: MediaError) => {
    throw new MediaError('unreadable', e.reason, { detail: e.detail, cause: e });
  });
  if (lastMs < 0) throw new MediaError('unreadable', `${UNREADABLE}: its length could not be found`);
  // The last timestamp is when the last frame starts; it is shown for one frame more.
  return Math.round(lastMs + (frameRate > 0 ? 1000 / frameRate : 0));
}

function seconds(s: string | undefined): number | null {
  const n = Number(s);
  return s !== undefined && s !== 'N/A' && Number.isFinite(n) && n > 0 ? Math.round(n * 1000) : null;
}

function rate(s: string | undefined): number | null {
  const m = /^(\d+)\/(\d+)$/.exec(s ?? '');
  if (!m || Number(m[1]) === 0 || Number(m[2]) === 0) return null;
  return Number(m[1]) / Number(m[2]);
}

function rotation(stream: ProbeStream): number {
  const fromSideData = stream.side_data_list?.find((d) => typeof d.rotation === 'number')?.rotation;
  return fromSideData ?? (Number(stream.tags?.rotate) || 0);
}
