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

export type ParsedTranscript = { format: TranscriptFormat; cues: TranscriptCue[] };

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
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // WebVTT line terminators are CRLF, LF or a lone CR; SRT and plain files use the same in practice.
  const lines = body.split(/\r\n|\r|\n/);
  const first = lines.findIndex((l) => l.trim() !== '');
  if (first < 0) throw new TranscriptParseError(1, 'the file is empty');

  const format = detectFormat(lines, first);
  const raw = format === 'vtt' ? parseVtt(lines) : format === 'srt' ? parseSrt(lines) : parsePlain(lines);
  // Array.prototype.sort is stable, so cues that start together keep the file's order.
  const cues = raw
    .slice()
    .sort((a, b) => a.startMs - b.startMs)
    .map((c, index) => ({ index, ...c }));
  return { format, cues };
}

function detectFormat(lines: string[], first: number): TranscriptFormat {
  const head = lines[first].trim();
  if (first === 0 && lines[0].startsWith('WEBVTT')) return 'vtt';
  if (/^webvtt/i.test(head)) {
    throw new TranscriptParseError(
      first + 1,
      first > 0
        ? `'WEBVTT' must be the very first line of a WebVTT file`
        : `a WebVTT file must start with 'WEBVTT' in capitals, found '${clip(head)}'`,
    );
  }
  const next = lines[first + 1]?.trim() ?? '';
  if (/^\d+$/.test(head) && (next.includes('-->') || /^\d+:\d/.test(next))) return 'srt';
  if (head.includes('-->')) {
    throw new TranscriptParseError(
      first + 1,
      `found a cue timing with nothing before it: start a WebVTT file with a 'WEBVTT' line, or number SRT cues from 1`,
    );
  }
  return 'plain';
}

// ---------------------------------------------------------------------------------------------
// WebVTT (W3C, "WebVTT: The Web Video Text Tracks Format")

const VTT_EXAMPLE = '00:01.000 --> 00:04.000';
const VTT_TIMESTAMP = /^(?:(\d+):)?(\d{2}):(\d{2})\.(\d{3})$/;

function parseVtt(lines: string[]): RawCue[] {
  // Signature: "WEBVTT", then a space, a tab or the end of the line (the BOM is already gone).
  if (!/^WEBVTT(?:[ \t].*)?$/.test(lines[0])) {
    throw new TranscriptParseError(
      1,
      `a WebVTT file must start with 'WEBVTT' followed by a space, a tab or the end of the line, found '${clip(lines[0])}'`,
    );
  }
  // Lines straight after the signature are header text (old files put "Kind:" and "Language:" there);
  // as in the spec's parser, a timing line ends the header even without a blank line.
  let i = 1;
  while (i < lines.length && !isBlank(lines[i]) && !lines[i].includes('-->')) i++;

  const cues: RawCue[] = [];
  for (const block of collectBlocks(lines, i)) {
    const L = block.lines;
    if (startsWithWord(L[0], 'NOTE')) {
      refuseArrow(block, 'a NOTE comment');
      continue;
    }
    const isSetupBlock = startsWithWord(L[0], 'STYLE') || startsWithWord(L[0], 'REGION');
    // A block "STYLE" + timing line is a cue whose identifier happens to be STYLE (spec parser order).
    if (isSetupBlock && !L[0].includes('-->') && !(L[1] ?? '').includes('-->')) {
      const kind = L[0].trim().split(/\s/)[0];
      if (cues.length > 0) {
        throw new TranscriptParseError(block.start + 1, `${kind} blocks must come before the first cue`);
      }
      refuseArrow(block, `a ${kind} block`);
      continue;
    }
    cues.push(...vttCues(block));
  }
  return cues;
}

function vttCues(block: Block): RawCue[] {
  const L = block.lines;
  const out: RawCue[] = [];
  let j = 0;
  while (j < L.length) {
    let identifier: string | undefined;
    let t = j;
    if (!L[j].includes('-->')) {
      if (j + 1 < L.length && L[j + 1].includes('-->')) {
        identifier = L[j].trim();
        t = j + 1;
      } else {
        throw missingVttTiming(block, j);
      }
    }
    const { startMs, endMs } = vttTiming(L[t], block.start + t + 1);
    // Cue text runs to the end of the block; a line with "-->" in it starts the next cue, as in the
    // spec's parser (text cannot contain "-->").
    let k = t + 1;
    while (k < L.length && !L[k].includes('-->')) k++;
    const cue: RawCue = { startMs, endMs, text: vttText(L.slice(t + 1, k)) };
    if (identifier) cue.identifier = identifier;
    out.push(cue);
    j = k;
  }
  return out;
}

function missingVttTiming(block: Block, j: number): TranscriptParseError {
  const L = block.lines;
  const expected = `expected a cue timing like ${VTT_EXAMPLE}`;
  if (looksLikeTiming(L[j])) {
    return new TranscriptParseError(block.start + j + 1, `${expected}, found '${clip(L[j].trim())}'`);
  }
  if (j + 1 < L.length && looksLikeTiming(L[j + 1])) {
    return new TranscriptParseError(block.start + j + 2, `${expected}, found '${clip(L[j + 1].trim())}'`);
  }
  const hint = j === 0 && block.start > 0 ? ' (a blank line ends a cue, so text after one needs its own timing)' : '';
  return new TranscriptParseError(block.start + j + 1, `${expected}, found '${clip(L[j].trim())}'${hint}`);
}

function vttTiming(line: string, lineNo: number): { startMs: number; endMs: number } {
  const arrow = line.indexOf('-->');
  const left = line.slice(0, arrow).trim();
  const right = /^[ \t]*(\S*)(.*)$/.exec(line.slice(arrow + 3))!;
  const startMs = vttTimestamp(left, lineNo, 'start');
  const endMs = vttTimestamp(right[1], lineNo, 'end');
  for (const setting of right[2].trim().split(/[ \t]+/).filter(Boolean)) {
    // Unknown names are ignored, as the spec's parser does; a word without a colon is most likely
    // cue text that slipped onto the timing line and would otherwise vanish.
    if (!/^[^:\s]+:\S+$/.test(setting)) {
      throw new TranscriptParseError(
        lineNo,
        `'${clip(setting)}' is not a cue setting (align:, position:, size:, line:, vertical:, region:); cue text goes on the next line`,
      );
    }
  }
  checkOrder(startMs, endMs, lineNo, formatVtt);
  return { startMs, endMs };
}

function vttTimestamp(s: string, lineNo: number, which: 'start' | 'end'): number {
  const m = VTT_TIMESTAMP.exec(s);
  const minutes = m ? Number(m[2]) : 0;
  const seconds = m ? Number(m[3]) : 0;
  if (!m || minutes > 59 || seconds > 59) {
    const found = s === '' ? `nothing` : `'${clip(s)}'`;
    throw new TranscriptParseError(
      lineNo,
      `the ${which} time should look like 00:01.000 or 01:02:03.000 (minutes and seconds 00-59, three digits after the dot), found ${found}`,
    );
  }
  return ((Number(m[1] ?? 0) * 60 + minutes) * 60 + seconds) * 1000 + Number(m[4]);
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
  amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: ' ', lrm: '', rlm: '',
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

function parseSrt(lines: string[]): RawCue[] {
  const cues: RawCue[] = [];
  for (const block of collectBlocks(lines, 0)) {
    const L = block.lines;
    let j = 0;
    while (j < L.length) {
      // The cue number is only a counter: gaps and a missing number are tolerated, as players do.
      const numbered = /^\d+$/.test(L[j].trim());
      const t = numbered ? j + 1 : j;
      if (t >= L.length) {
        throw new TranscriptParseError(
          block.start + j + 1,
          `expected a cue timing like ${SRT_EXAMPLE} after cue number ${L[j].trim()}, found a blank line`,
        );
      }
      if (!L[t].includes('-->')) {
        const problem = numbered || looksLikeTiming(L[t])
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
  const startMs = srtTimestamp(left, lineNo, 'start');
  const endMs = srtTimestamp(right, lineNo, 'end');
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

function parsePlain(lines: string[]): RawCue[] {
  const starts: { startMs: number; parts: string[] }[] = [];
  lines.forEach((raw, i) => {
    const line = raw.trim();
    if (line === '') return;
    const lineNo = i + 1;
    const timed = plainTime(line, lineNo);
    if (timed) {
      starts.push({ startMs: timed.startMs, parts: timed.rest ? [timed.rest] : [] });
    } else if (starts.length === 0) {
      throw new TranscriptParseError(
        lineNo,
        `expected a time like 0:00, [1:05] or 1:02:03 at the start of the first line, found '${clip(line)}'`,
      );
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
    const endMs = Number.isFinite(nextDistinct) ? nextDistinct : s.startMs + PLAIN_LAST_CUE_MS;
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
  return { startMs: startMs + fractionToMs(frac), rest };
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

function refuseArrow(block: Block, what: string) {
  const k = block.lines.findIndex((l) => l.includes('-->'));
  if (k >= 0) {
    throw new TranscriptParseError(
      block.start + k + 1,
      `${what} cannot contain '-->'; put a blank line between it and the next cue`,
    );
  }
}

function cleanLines(lines: string[], clean: (line: string) => string): string {
  return lines
    .map((l) => clean(l).replace(/[ \t\u00a0]+/g, ' ').trim())
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

