import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatTimestamp, parseTimestamp, parseTranscript, TranscriptParseError, PLAIN_LAST_CUE_MS } from './parse';

const fixture = (name: string) =>
  readFileSync(fileURLToPath(new URL(`../../tests/fixtures/transcripts/${name}`, import.meta.url)), 'utf8');

/** The error a parse throws, so a test can look at its line and message. */
function parseError(text: string): TranscriptParseError {
  try {
    parseTranscript(text);
  } catch (e) {
    if (e instanceof TranscriptParseError) return e;
    throw e;
  }
  throw new Error('expected the transcript to be refused');
}

const plainCues = (text: string) => parseTranscript(text).cues.map(({ startMs, endMs, text }) => ({ startMs, endMs, text }));

describe('WebVTT (W3C, "WebVTT: The Web Video Text Tracks Format")', () => {
  it('reads a two-voice caption file with cue settings; voice names stay out of the text (spec: voice spans, cue settings)', () => {
    const { format, cues } = parseTranscript(fixture('two-voices.vtt'));
    expect(format).toBe('vtt');
    expect(cues).toEqual([
      { index: 0, startMs: 0, endMs: 3500, text: 'Today we are making a round gift box.' },
      { index: 1, startMs: 3500, endMs: 7250, text: 'Will it hold a teacup?' },
      { index: 2, startMs: 7250, endMs: 11000, text: 'It will, if the wall strip\nwraps the whole circle.' },
      { index: 3, startMs: 11000, endMs: 13000, text: 'Ten and nine sixteenths inches, then.' },
    ]);
  });

  it('skips NOTE comment blocks between cues, keeps header text out, decodes &amp; (spec: comment blocks, character references)', () => {
    const { cues } = parseTranscript(fixture('note-between-cues.vtt'));
    expect(cues.map((c) => [c.startMs, c.endMs, c.text])).toEqual([
      [1000, 4000, 'Score the long strip at every inch.'],
      [3500, 8000, 'Then fold each panel & crease it\nwith a bone folder.'],
    ]);
  });

  it('reads a chapters file with cue identifiers and an hours field (spec: cue identifier, timestamps [hh:]mm:ss.ttt)', () => {
    const { cues } = parseTranscript(fixture('chapters.vtt'));
    expect(cues.map((c) => [c.identifier, c.startMs, c.endMs, c.text])).toEqual([
      ['intro', 0, 42_000, 'Welcome and supplies'],
      ['cutting', 42_000, 190_500, 'Cutting the base and the wall strip'],
      // 01:07:05.000 = 1 h 7 min 5 s = 4025 s
      ['assembly', 190_500, 4_025_000, 'Gluing the tabs and fitting the lid'],
    ]);
  });

  it('skips header lines, STYLE and REGION blocks before the first cue (spec: file structure, style and region blocks)', () => {
    const { cues } = parseTranscript(fixture('style-region.vtt'));
    expect(cues).toEqual([{ index: 0, startMs: 2000, endMs: 5000, text: 'Lay the cardstock on the mat.' }]);
  });

  it('accepts a BOM and CRLF line ends; numeric identifiers are kept (spec: optional U+FEFF, line terminators)', () => {
    const { format, cues } = parseTranscript(fixture('bom-crlf.vtt'));
    expect(format).toBe('vtt');
    expect(cues).toEqual([
      { index: 0, startMs: 500, endMs: 2000, text: 'Cut two circles\nof kraft cardstock.', identifier: '1' },
      { index: 1, startMs: 2000, endMs: 4750, text: 'Glue the first one down.', identifier: '2' },
    ]);
  });

  it('accepts lone CR line ends too (spec: a line terminator is CRLF, LF or CR)', () => {
    const { cues } = parseTranscript('WEBVTT\r\r00:01.000 --> 00:02.000\rFold.\r');
    expect(cues.map((c) => [c.startMs, c.text])).toEqual([[1000, 'Fold.']]);
  });

  it('accepts "WEBVTT" followed by a tab, or alone as the whole file (spec: signature)', () => {
    expect(parseTranscript('WEBVTT\tround box\n\n00:00.000 --> 00:01.000\nHi').cues).toHaveLength(1);
    expect(parseTranscript('WEBVTT')).toEqual({ format: 'vtt', cues: [] });
  });

  it('sorts cues by start when times go backwards between cues (spec parser keeps them; we sort)', () => {
    const { cues } = parseTranscript('WEBVTT\n\n00:05.000 --> 00:06.000\nsecond\n\n00:01.000 --> 00:02.000\nfirst\n');
    expect(cues.map((c) => [c.index, c.text])).toEqual([[0, 'first'], [1, 'second']]);
  });

  it('a timing line without a blank line before it starts a new cue (spec parser: "-->" ends the block)', () => {
    const { cues } = parseTranscript('WEBVTT\n00:00.000 --> 00:01.000\none\n00:01.000 --> 00:02.000\ntwo\n');
    expect(cues.map((c) => c.text)).toEqual(['one', 'two']);
  });

  it('drops ruby annotations and timestamp tags from the text (spec: ruby text span, timestamp tag)', () => {
    const { cues } = parseTranscript('WEBVTT\n\n00:00.000 --> 00:03.000\n<ruby>紙<rt>kami</rt></ruby> and <00:01.500>glue &lt;3');
    expect(cues[0].text).toBe('紙 and glue <3');
  });

  it('an empty cue payload is allowed (spec: cue payload may be empty)', () => {
    expect(parseTranscript('WEBVTT\n\n00:00.000 --> 00:01.000\n').cues[0].text).toBe('');
  });
});

describe('WebVTT errors name the line (W3C WebVTT authoring rules)', () => {
  it("a timing written '00:01 -> 00:04' after an identifier is reported on its own line", () => {
    const e = parseError(fixture('broken-timing.vtt'));
    expect(e.line).toBe(7);
    expect(e.message).toBe("line 7: expected a cue timing like 00:01.000 --> 00:04.000, found '00:01 -> 00:04'");
  });

  it('an end time before the start time is an error (spec: end time must be greater than start time)', () => {
    const e = parseError('WEBVTT\n\n00:05.000 --> 00:04.000\nOops\n');
    expect(e.line).toBe(3);
    expect(e.message).toBe('line 3: the cue ends (00:04.000) before it starts (00:05.000)');
    expect(parseError('WEBVTT\n\n00:05.000 --> 00:05.000\nOops\n').line).toBe(3);
  });

  it('timestamps need two-digit minutes and seconds below 60 and exactly three fraction digits (spec: WebVTT timestamp)', () => {
    expect(parseError('WEBVTT\n\n0:01.000 --> 00:04.000\nx').line).toBe(3);
    expect(parseError('WEBVTT\n\n00:01.00 --> 00:04.000\nx').line).toBe(3);
    expect(parseError('WEBVTT\n\n00:61.000 --> 01:04.000\nx').line).toBe(3);
    expect(parseError('WEBVTT\n\n00:01,000 --> 00:04,000\nx').message).toMatch(/start time should look like 00:01\.000/);
    // Hours may have one digit in the spec's parser ("1:02:03.000" is read as hours).
    expect(parseTranscript('WEBVTT\n\n1:02:03.000 --> 1:02:04.000\nx').cues[0].startMs).toBe(3_723_000);
  });

  it('text pushed onto the timing line is caught instead of silently vanishing (spec: settings are name:value)', () => {
    const e = parseError('WEBVTT\n\n00:01.000 --> 00:04.000 Fold it\n');
    expect(e.line).toBe(3);
    expect(e.message).toMatch(/'Fold' is not a cue setting/);
  });

  it('STYLE after the first cue is an error (spec: style blocks only before the first cue)', () => {
    const text = 'WEBVTT\n\n00:00.000 --> 00:01.000\nHi\n\nSTYLE\n::cue { color: red }\n';
    const e = parseError(text);
    expect(e.line).toBe(6);
    expect(e.message).toBe('line 6: STYLE blocks must come before the first cue');
    expect(parseError(text.replace('STYLE\n::cue { color: red }', 'REGION\nid:a')).message).toMatch(/REGION blocks must come before/);
  });

  it('a NOTE running into a cue without a blank line is reported (spec: comments cannot contain "-->")', () => {
    const e = parseError('WEBVTT\n\nNOTE about the lid\n00:01.000 --> 00:02.000\nx\n');
    expect(e.line).toBe(4);
  });

  it('text after a blank line inside a cue is reported on that line (spec: cue payload has no blank lines)', () => {
    const e = parseError('WEBVTT\n\n00:01.000 --> 00:04.000\nScore the strip\n\nat one inch\n');
    expect(e.line).toBe(6);
    expect(e.message).toMatch(/found 'at one inch' \(a blank line ends a cue/);
  });

  it('a wrong signature is line 1; a lower-case one says why (spec: "WEBVTT" then space, tab or line end)', () => {
    expect(parseError('WEBVTTX\n\n00:00.000 --> 00:01.000\nx').line).toBe(1);
    expect(parseError('webvtt\n\n00:00.000 --> 00:01.000\nx').message).toMatch(/capitals/);
    expect(parseError('\n\nWEBVTT\n').line).toBe(3);
  });

  it('cue timings with no header and no cue number are refused on their line', () => {
    expect(parseError('\n00:00.000 --> 00:01.000\nHello').line).toBe(2);
  });
});

describe('SRT (SubRip / Matroska subtitle notes)', () => {
  it('reads numbered blocks with comma milliseconds, multi-line text, and strips <i>, <b>, <font>', () => {
    const { format, cues } = parseTranscript(fixture('gatefold-card.srt'));
    expect(format).toBe('srt');
    expect(cues).toEqual([
      { index: 0, startMs: 1000, endMs: 4200, text: 'Our gatefold birthday card starts\nwith an eight and a half by eleven sheet.' },
      { index: 1, startMs: 4200, endMs: 9000, text: 'Score at two and three quarters\nand at eight and a quarter.' },
      { index: 2, startMs: 9000, endMs: 12_500, text: 'Fold both flaps in.' },
    ]);
  });

  it('accepts a BOM, CRLF, and a dot instead of the comma', () => {
    const { format, cues } = parseTranscript(fixture('bom-crlf.srt'));
    expect(format).toBe('srt');
    expect(cues.map((c) => [c.startMs, c.endMs, c.text])).toEqual([
      [0, 2500, 'Trim the mat'],
      [2500, 5000, 'by an eighth on each side.'],
    ]);
  });

  it('hours past 99 and a missing blank line between cues are tolerated', () => {
    const { cues } = parseTranscript('1\n100:00:00,000 --> 100:00:01,000\none\n2\n100:00:01,000 --> 100:00:02,500\ntwo\n');
    expect(cues.map((c) => [c.startMs, c.text])).toEqual([[360_000_000, 'one'], [360_001_000, 'two']]);
  });

  it('a bad timing, a number with no timing, and stray text are reported on their lines', () => {
    expect(parseError('1\n00:00:01,000 -> 00:00:04,000\nHi\n').line).toBe(2);
    const e = parseError('1\n00:00:01,000 --> 00:00:04,000\nHi\n\n2\nThere\n');
    expect(e.line).toBe(6);
    expect(e.message).toBe("line 6: expected a cue timing like 00:00:01,000 --> 00:00:04,000, found 'There'");
    expect(parseError('1\n00:00:01,000 --> 00:00:04,000\nHi\n\nand more\n').line).toBe(5);
    expect(parseError('1\n00:00:04,000 --> 00:00:01,000\nHi\n').message).toBe(
      'line 2: the cue ends (00:00:01,000) before it starts (00:00:04,000)',
    );
    expect(parseError('1\n00:00:01,000 --> 00:00:04,000\nHi\n\n2\n').line).toBe(5);
  });
});

describe('Plain timed lines (Cardwright F3: [m:ss], m:ss, h:mm:ss, [h:mm:ss])', () => {
  it('reads all four time forms; untimed lines continue the cue; blank lines are skipped', () => {
    const { format, cues } = parseTranscript(fixture('plain-four-forms.txt'));
    expect(format).toBe('plain');
    expect(cues.map(({ startMs, endMs, text }) => ({ startMs, endMs, text }))).toEqual([
      { startMs: 0, endMs: 12_000, text: 'Welcome back to the studio.' },
      { startMs: 12_000, endMs: 65_000, text: 'First we cut the wall strip,\ntwelve inches long.' },
      { startMs: 65_000, endMs: 3_723_000, text: 'Now we score it at every half inch.' },
      // The last cue has nothing after it: it lasts PLAIN_LAST_CUE_MS (our rule).
      { startMs: 3_723_000, endMs: 3_723_000 + PLAIN_LAST_CUE_MS, text: 'That is the last tab glued.' },
    ]);
  });

  it('out-of-order lines are sorted and each cue ends at the next later start', () => {
    expect(plainCues('0:10 b\n0:00 a\n0:10 c\n0:20 d')).toEqual([
      { startMs: 0, endMs: 10_000, text: 'a' },
      { startMs: 10_000, endMs: 20_000, text: 'b' },
      { startMs: 10_000, endMs: 20_000, text: 'c' },
      { startMs: 20_000, endMs: 25_000, text: 'd' },
    ]);
  });

  it('lines that merely start with a number continue the previous cue', () => {
    expect(plainCues('[0:00] You need\n12 x 12 cardstock\n1.5 in strips').map((c) => c.text)).toEqual([
      'You need\n12 x 12 cardstock\n1.5 in strips',
    ]);
  });

  it('a broken time names its line: "1:7x", seconds over 59, unmatched brackets', () => {
    const e = parseError(fixture('broken-time.txt'));
    expect(e.line).toBe(3);
    expect(e.message).toBe("line 3: expected a time like 0:00, [1:05] or 1:02:03 at the start of the line, found '1:7x'");
    expect(parseError('0:00 a\n\n1:75 b').line).toBe(3);
    expect(parseError('0:00 a\n[1:05 b').message).toMatch(/brackets do not match/);
    expect(parseError('0:00 a\n1:05x b').line).toBe(2);
  });

  it('text before the first timed line is an error on that line', () => {
    const e = parseError(fixture('text-before-time.txt'));
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/^line 1: expected a time like 0:00/);
  });
});

describe('any format', () => {
  it('an empty file is refused at line 1', () => {
    for (const text of ['', '\n\n', '\uFEFF', '  \r\n']) expect(parseError(text).line).toBe(1);
  });

  it('the error is an Error with the line number and a "line N:" message', () => {
    const e = parseError('');
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe('TranscriptParseError');
    expect(e.message).toBe('line 1: the file is empty');
  });
});

describe('timestamps for chapter lists (video-platform chapter lines, from memory: 0:00, m:ss, h:mm:ss)', () => {
  it('formats m:ss below an hour and h:mm:ss from an hour, rounding down', () => {
    expect(formatTimestamp(0)).toBe('0:00');
    expect(formatTimestamp(65_999)).toBe('1:05');
    expect(formatTimestamp(3_599_999)).toBe('59:59');
    expect(formatTimestamp(3_723_000)).toBe('1:02:03');
    expect(() => formatTimestamp(-1)).toThrow(RangeError);
  });

  it('parses 1:05, 01:05.250, 1:02:03 and refuses the rest', () => {
    expect(parseTimestamp('1:05')).toBe(65_000);
    expect(parseTimestamp('01:05.250')).toBe(65_250);
    expect(parseTimestamp('1:02:03')).toBe(3_723_000);
    expect(parseTimestamp(' 00:00:01,5 ')).toBe(1500);
    expect(parseTimestamp('75:00')).toBe(4_500_000);
    for (const bad of ['', '1:5', '1:60', '1:60:00', '1:02:3', 'abc', '1:05.2500', '-1:00']) {
      expect(parseTimestamp(bad), bad).toBeNull();
    }
  });

  it('formatting then parsing gives the time back to the second', () => {
    for (const ms of [0, 59_000, 61_000, 3_600_000, 36_061_000]) expect(parseTimestamp(formatTimestamp(ms))).toBe(ms);
  });
});
