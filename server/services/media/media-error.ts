/** What went wrong, in a form the API can map to a status: a bad file is the uploader's problem, a failure is ours. */
export type MediaErrorCode = 'unreadable' | 'not-a-video' | 'no-frame' | 'bad-input' | 'failed';

/**
 * A media operation that failed, with a `reason` a person can read ("This file could not be read as a
 * video: moov atom not found"). `detail` keeps a short technical line for logs, never a stderr dump.
 */
export class MediaError extends Error {
  readonly code: MediaErrorCode;
  readonly reason: string;
  readonly detail?: string;

  constructor(code: MediaErrorCode, reason: string, options: { detail?: string; cause?: unknown } = {}) {
    super(reason, options.cause === undefined ? undefined : { cause: options.cause });
    this.name = 'MediaError';
    this.code = code;
    this.reason = reason;
    this.detail = options.detail;
  }
}

const PROGRESS_LINE = /^\s*(frame|size)=|^\s*video:\d|^Press \[q\]|^\s*$/;

/**
 * The one or two lines of ffmpeg/ffprobe stderr that say what failed, without the file path that
 * ffmpeg prefixes ("/media/x.mp4: Invalid data found when processing input"), at most 200 characters.
 */
export function shortDetail(stderr: string, paths: string[] = []): string {
  const lines = stderr
    .split(/\r\n|\r|\n/)
    .map((l) => l.trim())
    .filter((l) => !PROGRESS_LINE.test(l));
  const errorish = lines.filter((l) => /error|invalid|not found|no such|unsupported|could not|cannot|failed|unknown|denied|corrupt/i.test(l));
  const picked = (errorish.length ? errorish : lines).slice(-2);
  let text = picked
    .map((l) => l.replace(/^\[[^\]]+\]\s*/, ''))
    .map((l) => paths.reduce((s, p) => (p ? s.split(`${p}: `).join('').split(p).join('the file') : s), l))
    .filter((l, i, all) => all.indexOf(l) === i)
    .join('; ');
  if (text.length > 200) text = `${text.slice(0, 199)}…`;
  return text || 'no details from ffmpeg';
}
