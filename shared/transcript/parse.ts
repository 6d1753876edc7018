/**
 * Timed transcripts: WebVTT, SRT, or plain lines that start with a time. Runs in the browser too,
 * so no Node APIs. Every error names the 1-based line it found the problem on.
 *
 * Why our own parser: the registry's parsers report cue numbers or nothing at all instead of line
 * numbers, skip STYLE/REGION blocks or plain timed lines, or (node-webvtt 2) need Node 22.
 */
import { formatTimestamp, fractionToMs, parseTimestamp } from './timestamp';

export { formatTimestamp, parseTimestamp };

export type TranscriptFormat = 'vtt' | 'srt' | 'plain';

export type TranscriptCue = {
  /** 0-based position in `cues` (after sorting by start). */
  index: number;
  startMs: number;
  endMs: number;
  /** Spoken words with markup, voice names and ruby annotations removed; lines joined with "\n". */
  text: string;
  /** The WebVTT cue identifier, when the file gives one. */
  identifier?: string;
};

/**
 * Something the reader did that the person should know about, though the file was read: a header
 * skipped, a cue the WebVTT parser skips, a setting it ignores. `line` is 1-based; the message
 * starts with "line N: " (or "lines N-M: ").
 */
export type TranscriptNotice = { line: number; message: string };

/** `notices` is there only when the reader has something to say. */
export type ParsedTranscript = { format: TranscriptFormat; cues: TranscriptCue[]; notices?: TranscriptNotice[] };

/** A transcript that cannot be read; `line` is 1-based and the message starts with "line N: ". */
export class TranscriptParseError extends Error {
  line: number;
  /** The message without its "line N: " prefix, for a UI that shows the line number itself. */
  problem: string;

  constructor(line: number, problem: string) {
    super(`line ${line}: ${problem}`);
    this.name = 'TranscriptParseError';
    this.line = line;
    this.problem = problem;
  }
}

/**
 * Like parseTranscript, but a file the reader could take no timed line from is refused: it throws at the first
 * notice's line (the reason the cues were skipped), or at line 1 when there was nothing to skip.
 */
export function parseUsableTranscript(text: string): ParsedTranscript {
  const parsed = parseTranscript(text);
  if (parsed.cues.length > 0) return parsed;
  const why = parsed.notices?.[0];
  throw why
    ? new TranscriptParseError(why.line, `no timed line could be read (${why.message})`)
    : new TranscriptParseError(1, 'the transcript has no timed lines');
}

/** How long the last plain-text cue lasts, since nothing after it says when it ends. */
export const PLAIN_LAST_CUE_MS = 5000;

type RawCue = { startMs: number; endMs: number; text: string; identifier?: string };
type Block = { start: number; lines: string[] }; // start: 0-based index into the file's lines

/**
 * Parses a timed transcript, telling the format from its content: a `WEBVTT` first line is WebVTT,
 * a number line followed by a timing line is SRT, anything else is plain timed lines.
 * Cues come back sorted by start time. Throws TranscriptParseError naming the line at fault.
 */
export function parseTranscript(text: string): ParsedTranscript {
  const notices: TranscriptNotice[] = [];
  const unmarked = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // WebVTT line terminators are CRLF, LF or a lone CR; SRT and plain files use the same in practice.
  const lines = unmarked.split(/\r\n|\r|\n/);
  // The W3C parser turns NUL into U+FFFD before anything else; PostgreSQL text cannot hold NUL either.
  const nulLine = lines.findIndex((l) => l.includes('\0'));
  if (nulLine >= 0) {
    const count = unmarked.split('\0').length - 1;
    for (let i = nulLine; i < lines.length; i++) lines[i] = lines[i].replace(/\0/g, '\uFFFD');
    notices.push(notice(nulLine + 1, nulLine + 1, `${count === 1 ? 'a NUL character was' : `${count} NUL characters were`} replaced by U+FFFD (�)`));
  }
  const first = lines.findIndex((l) => l.trim() !== '');
  if (first < 0) throw new TranscriptParseError(1, 'the file is empty');

  const { format, start } = detectFormat(lines, first, notices);
  const raw = format === 'vtt' ? parseVtt(lines, notices) : format === 'srt' ? parseSrt(lines, start) : parsePlain(lines, start);
  // Array.prototype.sort is stable, so cues that start together keep the file's order.
  const cues = raw
    .slice()
    .sort((a, b) => a.startMs - b.startMs)
    .map((c, index) => ({ index, ...c }));
  return notices.length > 0 ? { format, cues, notices: notices.sort((a, b) => a.line - b.line) } : { format, cues };
}

function notice(from: number, to: number, what: string): TranscriptNotice {
  return { line: from, message: `${from === to ? `line ${from}` : `lines ${from}-${to}`}: ${what}` };
}

/** At most this many untimed lines before the first timed one are taken for a title or header. */
const MAX_HEADER_LINES = 10;

/**
 * The format, and the line its cues start on. A title, a "Transcript:" label or blank lines before
 * the first timed line of an SRT or plain file are skipped with a notice; a WebVTT file must start
 * with its signature.
 */
function detectFormat(lines: string[], first: number, notices: TranscriptNotice[]): { format: TranscriptFormat; start: number } {
  const head = lines[first].trim();
  if (first === 0 && lines[0].startsWith('WEBVTT')) return { format: 'vtt', start: 0 };
  if (/^webvtt/i.test(head)) {
    throw new TranscriptParseError(
      first + 1,
      first > 0 ? `'WEBVTT' must be the very first line of a WebVTT file` : `a WebVTT file must start with 'WEBVTT' in capitals, found '${clip(head)}'`,
    );
  }
  let untimed = 0;
  let lastUntimed = first;
  for (let i = first; i < lines.length; i++) {
    const line = lines[i].trim();
    if (line === '') continue;
    const next = lines[i + 1]?.trim() ?? '';
    let format: TranscriptFormat | null = null;
    if (/^\d+$/.test(line) && (next.includes('-->') || /^\d+:\d/.test(next))) format = 'srt';
    else if (line.includes('-->')) {
      throw new TranscriptParseError(i + 1, `found a cue timing with nothing before it: start a WebVTT file with a 'WEBVTT' line, or number SRT cues from 1`);
    } else if (/^webvtt\b/i.test(line)) {
      throw new TranscriptParseError(i + 1, `'WEBVTT' must be the very first line of a WebVTT file`);
    } else if (/^\[?\d+:/.test(line) || /^\[\d/.test(line)) format = 'plain';
    if (format) {
      if (untimed > 0)
        notices.push(
          notice(
            first + 1,
            lastUntimed + 1,
            `skipped ${untimed === 1 ? 'a title or header line' : `${untimed} title or header lines`} before the first timed line ('${clip(head)}')`,
          ),
        );
      return { format, start: i };
    }
    untimed++;
    lastUntimed = i;
    if (untimed > MAX_HEADER_LINES) break;
  }
  // No timed line soon enough: report the first line, as the plain reader would.
  return { format: 'plain', start: first };
}

// ---------------------------------------------------------------------------------------------
// WebVTT (W3C, "WebVTT: The Web Video Text Tracks Format")

const VTT_EXAMPLE = '00:01.000 --> 00:04.000';

/** ASCII whitespace as the WebVTT parser skips it: tab, line feed, form feed, carriage return, space. */
const VTT_SPACE = /[\t\n\f\r ]/;
const isVttSpace = (c: string | undefined) => c !== undefined && VTT_SPACE.test(c);

/**
 * The W3C "WebVTT parser algorithm", line by line so every notice names its line: the signature,
 * an optional header, then blocks; a block is a cue when its first or second line holds "-->", a
 * style sheet or region when it starts with STYLE or REGION before any cue, and otherwise skipped
 * (NOTE comments among them). Where the algorithm drops a cue we say which lines and why.
 */
function parseVtt(lines: string[], notices: TranscriptNotice[]): RawCue[] {
  // Signature: "WEBVTT", then a space, a tab or the end of the line (the BOM is already gone).
  if (!/^WEBVTT(?:[ \t].*)?$/.test(lines[0])) {
    throw new TranscriptParseError(1, `a WebVTT file must start with 'WEBVTT' followed by a space, a tab or the end of the line, found '${clip(lines[0])}'`);
  }
  const cues: RawCue[] = [];
  let pos = 1;
  // Header: lines straight after the signature; a "-->" line ends it (collect a block "in header").
  if (pos < lines.length && lines[pos] !== '') pos = collectVttBlock(lines, pos, true, false, notices).next;
  let seenCue = false;
  for (;;) {
    while (pos < lines.length && lines[pos] === '') pos++;
    if (pos >= lines.length) break;
    const block = collectVttBlock(lines, pos, false, seenCue, notices);
    if (block.cue) {
      cues.push(block.cue);
      seenCue = true;
    }
    pos = block.next;
  }
  return cues;
}

type VttBlock = { cue: RawCue | null; next: number };

/** "collect a WebVTT block": reads from line `from` (0-based); `next` is where the next block starts. */
function collectVttBlock(lines: string[], from: number, inHeader: boolean, seenCue: boolean, notices: TranscriptNotice[]): VttBlock {
  let i = from;
  let lineCount = 0;
  let seenArrow = false;
  let buffer: string[] = [];
  let cue: RawCue | null = null;
  let failed: string | null = null;
  let setup: 'STYLE' | 'REGION' | null = null;
  let setupRefused: string | null = null;
  let timingLine = -1;
  let lastLine = from + 1;
  for (;;) {
    const line = lines[i];
    lineCount++;
    i++;
    if (line.includes('-->')) {
      if (!inHeader && (lineCount === 1 || (lineCount === 2 && !seenArrow))) {
        seenArrow = true;
        timingLine = i - 1;
        lastLine = i;
        const identifier = buffer.join('\n');
        const timing = vttTimingAndSettings(line, i, notices);
        if (typeof timing === 'string') {
          cue = null;
          failed = timing;
        } else {
          cue = { startMs: timing.startMs, endMs: timing.endMs, text: '' };
          if (identifier !== '') cue.identifier = identifier;
          if (lineCount === 2 && startsWithWord(identifier, 'NOTE')) {
            notices.push(
              notice(
                from + 1,
                i,
                `a timing straight after a NOTE line makes a cue, with 'NOTE…' as its name (the W3C parser reads it so); put a blank line after a comment`,
              ),
            );
          }
          buffer = [];
        }
      } else {
        // a "-->" line inside a block starts the next block (cue text cannot contain "-->")
        i--;
        break;
      }
    } else if (line === '') {
      break;
    } else {
      if (!inHeader && lineCount === 2) {
        const kind = /^(STYLE|REGION)[\t\n\f\r ]*$/.exec(buffer.join('\n'))?.[1] as 'STYLE' | 'REGION' | undefined;
        if (kind && !seenCue) {
          setup = kind;
          buffer = [];
        } else if (kind) setupRefused = kind;
      }
      buffer.push(line);
      lastLine = i;
    }
    if (i >= lines.length) break;
  }
  const last = lastLine; // 1-based number of the block's last line
  if (cue) {
    cue.text = vttText(buffer);
    if (cue.endMs <= cue.startMs) {
      notices.push(
        notice(
          timingLine + 1,
          timingLine + 1,
          cue.endMs === cue.startMs
            ? `the cue ends at the same time it starts (${formatVtt(cue.startMs)}); it is kept as written, but a player never shows it`
            : `the cue ends (${formatVtt(cue.endMs)}) before it starts (${formatVtt(cue.startMs)}); it is kept as written, but a player never shows it`,
        ),
      );
    }
    return { cue, next: i };
  }
  if (inHeader || setup) return { cue: null, next: i };
  const firstLine = lines[from];
  if (failed !== null) {
    notices.push(notice(from + 1, Math.max(last, from + 1), `skipped a cue: ${failed}`));
  } else if (setupRefused) {
    notices.push(notice(from + 1, Math.max(last, from + 1), `skipped a ${setupRefused} block: STYLE and REGION blocks count only before the first cue`));
  } else if (!startsWithWord(firstLine, 'NOTE')) {
    const hint =
      looksLikeTiming(firstLine) || (lines[from + 1] !== undefined && looksLikeTiming(lines[from + 1]) && lines[from + 1] !== '')
        ? ` (a cue timing needs '-->' between two times like ${VTT_EXAMPLE})`
        : ' (a blank line ends a cue, so text after one needs its own timing)';
    notices.push(notice(from + 1, Math.max(last, from + 1), `skipped '${clip(firstLine.trim())}': text with no cue timing${hint}`));
  }
  return { cue: null, next: i };
}

/**
 * "collect WebVTT cue timings and settings": the start, "-->", the end, each with optional
 * whitespace around; settings after the end that cannot be read are ignored with a notice.
 * Returns why it failed when the timings cannot be read.
 */
function vttTimingAndSettings(line: string, lineNo: number, notices: TranscriptNotice[]): { startMs: number; endMs: number } | string {
  let p = 0;
  const skipSpace = () => {
    while (isVttSpace(line[p])) p++;
  };
  skipSpace();
  const start = vttTimestampAt(line, p);
  if (typeof start === 'string') return `the start time ${start} (line ${lineNo}: '${clip(line.trim())}')`;
  p = start.end;
  skipSpace();
  if (!line.startsWith('-->', p)) return `expected '-->' after the start time (line ${lineNo}: '${clip(line.trim())}')`;
  p += 3;
  skipSpace();
  const end = vttTimestampAt(line, p);
  if (typeof end === 'string') return `the end time ${end} (line ${lineNo}: '${clip(line.trim())}')`;
  const unread = line
    .slice(end.end)
    .split(/[\t\n\f\r ]+/)
    .filter((setting) => setting !== '' && !readableSetting(setting));
  if (unread.length > 0) {
    notices.push(
      notice(
        lineNo,
        lineNo,
        `ignored ${unread.length === 1 ? 'a cue setting' : 'cue settings'} that cannot be read: ${unread.map((u) => `'${clip(u, 30)}'`).join(', ')} (settings are name:value, e.g. align:start; cue text goes on the next line)`,
      ),
    );
  }
  return { startMs: withinRange(start.ms, lineNo), endMs: withinRange(end.ms, lineNo) };
}

/** The spec's cue settings with values it can read; anything else is ignored by the parser. */
function readableSetting(setting: string): boolean {
  const colon = setting.indexOf(':');
  if (colon <= 0 || colon === setting.length - 1) return false;
  const name = setting.slice(0, colon);
  const value = setting.slice(colon + 1);
  const pct = /^\d+(?:\.\d+)?%$/;
  switch (name) {
    case 'vertical':
      return value === 'rl' || value === 'lr';
    case 'line': {
      const [at, align, ...rest] = value.split(',');
      return rest.length === 0 && (pct.test(at) || /^-?\d+(?:\.\d+)?$/.test(at)) && (align === undefined || ['start', 'center', 'end'].includes(align));
    }
    case 'position': {
      const [at, align, ...rest] = value.split(',');
      return rest.length === 0 && pct.test(at) && (align === undefined || ['line-left', 'center', 'line-right', 'auto'].includes(align));
    }
    case 'size':
      return pct.test(value);
    case 'align':
      return ['start', 'center', 'end', 'left', 'right'].includes(value);
    case 'region':
      return !value.includes('-->');
    default:
      // unknown names are ignored by the spec's parser without harm; say so all the same
      return false;
  }
}

/**
 * "collect a WebVTT timestamp" from position `p`: [hours:]mm:ss.ttt, where a first field that is
 * not two digits or is over 59 is hours. Returns the time and where it ended, or why it failed.
 */
function vttTimestampAt(s: string, p: number): { ms: number; end: number } | string {
  const digitsAt = (k: number) => {
    let e = k;
    while (e < s.length && s.charCodeAt(e) >= 48 && s.charCodeAt(e) <= 57) e++;
    return s.slice(k, e);
  };
  const shape = 'should look like 00:01.000 or 01:02:03.000 (minutes and seconds 00-59, three digits after the dot)';
  const d1 = digitsAt(p);
  if (d1 === '') return shape;
  let k = p + d1.length;
  const hoursFirst = d1.length !== 2 || Number(d1) > 59;
  if (s[k] !== ':') return shape;
  const d2 = digitsAt(++k);
  if (d2.length !== 2) return shape;
  k += 2;
  let hours = 0;
  let minutes: number;
  let seconds: number;
  if (hoursFirst || s[k] === ':') {
    if (s[k] !== ':') return shape;
    const d3 = digitsAt(++k);
    if (d3.length !== 2) return shape;
    k += 2;
    hours = Number(d1);
    minutes = Number(d2);
    seconds = Number(d3);
  } else {
    minutes = Number(d1);
    seconds = Number(d2);
  }
  if (s[k] !== '.') return shape;
  const frac = digitsAt(++k);
  if (frac.length !== 3) return shape;
  k += 3;
  if (minutes > 59 || seconds > 59) return shape;
  return { ms: ((hours * 60 + minutes) * 60 + seconds) * 1000 + Number(frac), end: k };
}

function vttText(lines: string[]): string {
  return cleanLines(lines, (l) =>
    decodeEntities(
      l
        // Ruby annotations are pronunciation help, not words spoken.
        .replace(/<rt(?:[.\s][^>]*)?>.*?(?:<\/rt>|(?=<\/ruby>)|$)/g, '')
        // Tags go, including <v Speaker> whose annotation is the speaker's name, and <00:01.500>.
        .replace(/<[^>]*>/g, ''),
    ),
  );
}

const ENTITIES: Record<string, string> = {
  amp: '&',
  lt: '<',
  gt: '>',
  quot: '"',
  apos: "'",
  nbsp: ' ',
  lrm: '',
  rlm: '',
};

function decodeEntities(s: string): string {
  return s.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, name: string) => {
    if (name[0] === '#') {
      const code = name[1] === 'x' || name[1] === 'X' ? parseInt(name.slice(2), 16) : parseInt(name.slice(1), 10);
      return code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return ENTITIES[name.toLowerCase()] ?? whole;
  });
}

function formatVtt(ms: number): string {
  const h = Math.floor(ms / 3_600_000);
  const rest = `${pad(Math.floor(ms / 60_000) % 60)}:${pad(Math.floor(ms / 1000) % 60)}.${pad(ms % 1000, 3)}`;
  return h > 0 ? `${pad(h)}:${rest}` : rest;
}

// ---------------------------------------------------------------------------------------------
// SRT (SubRip; no formal spec, the Matroska subtitle notes describe it)

const SRT_EXAMPLE = '00:00:01,000 --> 00:00:04,000';
const SRT_TIMESTAMP = /^(\d+):(\d{2}):(\d{2})[,.](\d{3})$/;

function parseSrt(lines: string[], start: number): RawCue[] {
  const cues: RawCue[] = [];
  for (const block of collectBlocks(lines, start)) {
    const L = block.lines;
    let j = 0;
    while (j < L.length) {
      // The cue number is only a counter: gaps and a missing number are tolerated, as players do.
      const numbered = /^\d+$/.test(L[j].trim());
      const t = numbered ? j + 1 : j;
      if (t >= L.length) {
        throw new TranscriptParseError(block.start + j + 1, `expected a cue timing like ${SRT_EXAMPLE} after cue number ${L[j].trim()}, found a blank line`);
      }
      if (!L[t].includes('-->')) {
        const problem =
          numbered || looksLikeTiming(L[t])
            ? `expected a cue timing like ${SRT_EXAMPLE}, found '${clip(L[t].trim())}'`
            : `expected a cue number and a timing like ${SRT_EXAMPLE}, found '${clip(L[t].trim())}'` +
              (block.start > 0 ? ' (a blank line ends a cue, so text after one needs its own number and timing)' : '');
        throw new TranscriptParseError(block.start + t + 1, problem);
      }
      const { startMs, endMs } = srtTiming(L[t], block.start + t + 1);
      // A timing line inside the text means a blank line is missing; start the next cue there,
      // taking the number line above it along.
      let k = t + 1;
      while (k < L.length && !L[k].includes('-->')) k++;
      const textEnd = k < L.length && k - 1 > t && /^\d+$/.test(L[k - 1].trim()) ? k - 1 : k;
      cues.push({ startMs, endMs, text: srtText(L.slice(t + 1, textEnd)) });
      j = textEnd;
    }
  }
  return cues;
}

function srtTiming(line: string, lineNo: number): { startMs: number; endMs: number } {
  const arrow = line.indexOf('-->');
  const left = line.slice(0, arrow).trim();
  // Some writers add "X1:... Y2:..." display coordinates after the end time; they are ignored.
  const right = /^[ \t]*(\S*)/.exec(line.slice(arrow + 3))![1];
  const startMs = withinRange(srtTimestamp(left, lineNo, 'start'), lineNo);
  const endMs = withinRange(srtTimestamp(right, lineNo, 'end'), lineNo);
  checkOrder(startMs, endMs, lineNo, formatSrt);
  return { startMs, endMs };
}

function srtTimestamp(s: string, lineNo: number, which: 'start' | 'end'): number {
  const m = SRT_TIMESTAMP.exec(s);
  const minutes = m ? Number(m[2]) : 0;
  const seconds = m ? Number(m[3]) : 0;
  if (!m || minutes > 59 || seconds > 59) {
    const found = s === '' ? 'nothing' : `'${clip(s)}'`;
    throw new TranscriptParseError(
      lineNo,
      `the ${which} time should look like 00:00:01,000 (hours:minutes:seconds,milliseconds; minutes and seconds 00-59), found ${found}`,
    );
  }
  return ((Number(m[1]) * 60 + minutes) * 60 + seconds) * 1000 + Number(m[4]);
}

function srtText(lines: string[]): string {
  return cleanLines(lines, (l) =>
    l
      .replace(/<\/?(?:i|b|u|s|font)\b[^>]*>/gi, '')
      // {\an8}-style position overrides that some SRT writers copy over from ASS.
      .replace(/\{\\[^}]*\}/g, ''),
  );
}

function formatSrt(ms: number): string {
  return `${pad(Math.floor(ms / 3_600_000))}:${pad(Math.floor(ms / 60_000) % 60)}:${pad(Math.floor(ms / 1000) % 60)},${pad(ms % 1000, 3)}`;
}

// ---------------------------------------------------------------------------------------------
// Plain lines that start with a time: [m:ss], m:ss, h:mm:ss, [h:mm:ss]

const PLAIN_TIME = /^(\[)?(\d+):(\d{2})(?::(\d{2}))?(?:[.,](\d{1,3}))?(\])?/;

function parsePlain(lines: string[], start: number): RawCue[] {
  const starts: { startMs: number; parts: string[] }[] = [];
  lines.forEach((raw, i) => {
    const line = raw.trim();
    if (line === '' || i < start) return;
    const lineNo = i + 1;
    const timed = plainTime(line, lineNo);
    if (timed) {
      starts.push({ startMs: timed.startMs, parts: timed.rest ? [timed.rest] : [] });
    } else if (starts.length === 0) {
      throw new TranscriptParseError(lineNo, `expected a time like 0:00, [1:05] or 1:02:03 at the start of the first line, found '${clip(line)}'`);
    } else {
      starts[starts.length - 1].parts.push(line);
    }
  });

  // Each cue ends where the next later one starts; the last one lasts PLAIN_LAST_CUE_MS.
  const byStart = starts.map((s, order) => ({ ...s, order })).sort((a, b) => a.startMs - b.startMs || a.order - b.order);
  const cues: RawCue[] = [];
  let nextDistinct = Number.POSITIVE_INFINITY;
  for (let i = byStart.length - 1; i >= 0; i--) {
    const s = byStart[i];
    if (i + 1 < byStart.length && byStart[i + 1].startMs > s.startMs) nextDistinct = byStart[i + 1].startMs;
    const endMs = Number.isFinite(nextDistinct) ? nextDistinct : Math.min(s.startMs + PLAIN_LAST_CUE_MS, MAX_TIME_MS + 1);
    cues.push({ startMs: s.startMs, endMs, text: cleanLines(s.parts, (l) => l) });
  }
  return cues.reverse();
}

function plainTime(line: string, lineNo: number): { startMs: number; rest: string } | null {
  // Only a digit followed by a colon (or an opening bracket) claims to be a time, so text lines that
  // start with a number ("12 x 12 cardstock", "1.5 in strip") still continue the previous cue.
  const claimsTime = /^\[?\d+:/.test(line) || /^\[\d/.test(line);
  if (!claimsTime) return null;
  const broken = (why: string) =>
    new TranscriptParseError(lineNo, `expected a time like 0:00, [1:05] or 1:02:03 at the start of the line, found '${clip(line.split(/\s/)[0])}'${why}`);

  const m = PLAIN_TIME.exec(line);
  if (!m) throw broken('');
  const [token, open, a, b, c, frac, close] = m;
  if (Boolean(open) !== Boolean(close)) throw broken(' (the brackets do not match)');
  const after = line.slice(token.length);
  if (!close && after !== '' && !/^[\s\-–—]/.test(after)) throw broken('');
  const startMs = parseTimestamp(c === undefined ? `${a}:${b}` : `${a}:${b}:${c}`);
  if (startMs === null) throw broken(' (minutes and seconds must be 00-59)');
  const rest = after.replace(/^\s*(?:[-–—:]\s*)?/, '');
  return { startMs: withinRange(startMs + fractionToMs(frac), lineNo), rest };
}

// ---------------------------------------------------------------------------------------------
// Shared pieces

function collectBlocks(lines: string[], from: number): Block[] {
  const blocks: Block[] = [];
  let current: Block | null = null;
  for (let i = from; i < lines.length; i++) {
    if (isBlank(lines[i])) {
      current = null;
    } else if (current) {
      current.lines.push(lines[i]);
    } else {
      current = { start: i, lines: [lines[i]] };
      blocks.push(current);
    }
  }
  return blocks;
}

/**
 * The latest time a transcript may give: times are stored as 32-bit integers of milliseconds, and
 * 2^31 - 1 ms is about 596 hours, far past any recording. A time beyond it is refused with its line.
 */
export const MAX_TIME_MS = 2_147_483_647 - 1;

function withinRange(ms: number, lineNo: number): number {
  if (ms > MAX_TIME_MS) {
    const hours = Math.floor(ms / 3_600_000);
    throw new TranscriptParseError(lineNo, `the time ${hours.toLocaleString('en-US')} hours in is past the longest recording Cardwright takes (596 hours)`);
  }
  return ms;
}

function checkOrder(startMs: number, endMs: number, lineNo: number, show: (ms: number) => string) {
  if (endMs <= startMs) {
    throw new TranscriptParseError(
      lineNo,
      endMs === startMs
        ? `the cue ends at the same time it starts (${show(startMs)}); the end time must be later`
        : `the cue ends (${show(endMs)}) before it starts (${show(startMs)})`,
    );
  }
}

function cleanLines(lines: string[], clean: (line: string) => string): string {
  return lines
    .map((l) =>
      clean(l)
        .replace(/[ \t\u00a0]+/g, ' ')
        .trim(),
    )
    .filter((l) => l !== '')
    .join('\n');
}

function startsWithWord(line: string, word: string): boolean {
  return line === word || line.startsWith(`${word} `) || line.startsWith(`${word}\t`);
}

function looksLikeTiming(line: string): boolean {
  return /^\s*\d+:\d/.test(line) || /-+>|–>|—>|→/.test(line);
}

function isBlank(line: string): boolean {
  return line.trim() === '';
}

function clip(s: string, max = 60): string {
  return s.length > max ? `${s.slice(0, max - 1)}…` : s;
}

function pad(n: number, width = 2): string {
  return String(n).padStart(width, '0');
}
