import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatTimestamp, parseTimestamp, parseTranscript, TranscriptParseError, PLAIN_LAST_CUE_MS } from './parse';

const fixture = (name: string) => readFileSync(fileURLToPath(new URL(`../../tests/fixtures/transcripts/${name}`, import.meta.url)), 'utf8');

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
    expect(cues.map((c) => [c.index, c.text])).toEqual([
      [0, 'first'],
      [1, 'second'],
    ]);
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

/** Cues and notices of a file that is read, for the cases where the W3C parser skips or keeps with a note. */
const read = (text: string) => {
  const r = parseTranscript(text);
  return {
    cues: r.cues.map((c) => [c.startMs, c.endMs, c.text]),
    notices: (r.notices ?? []).map((n) => n.line),
    messages: (r.notices ?? []).map((n) => n.message),
  };
};

describe('WebVTT read as the W3C parser reads it ("WebVTT parser algorithm"), with notices naming lines', () => {
  it("a cue whose timing cannot be read ('00:01 -> 00:04') is skipped, and the notice names its lines", () => {
    const r = read(fixture('broken-timing.vtt'));
    expect(r.cues).toEqual([[0, 1000, 'Hello and welcome.']]);
    expect(r.notices).toEqual([6]);
    expect(r.messages[0]).toBe(
      "lines 6-8: skipped 'fold-step': text with no cue timing (a cue timing needs '-->' between two times like 00:01.000 --> 00:04.000)",
    );
  });

  it('a cue whose end is not after its start is kept with a notice (the parser keeps it; the rule is for authors)', () => {
    const r = read('WEBVTT\n\n00:05.000 --> 00:04.000\nOops\n\n00:06.000 --> 00:06.000\nSame\n');
    expect(r.cues).toEqual([
      [5000, 4000, 'Oops'],
      [6000, 6000, 'Same'],
    ]);
    expect(r.messages).toEqual([
      'line 3: the cue ends (00:04.000) before it starts (00:05.000); it is kept as written, but a player never shows it',
      'line 6: the cue ends at the same time it starts (00:06.000); it is kept as written, but a player never shows it',
    ]);
  });

  it('timestamps: two-digit minutes and seconds below 60, three fraction digits; a cue that breaks this is skipped (spec: collect a WebVTT timestamp)', () => {
    for (const bad of ['0:01.000 --> 00:04.000', '00:01.00 --> 00:04.000', '00:61.000 --> 01:04.000', '00:01,000 --> 00:04,000', '00:01.000 --> 00:04']) {
      const r = read(`WEBVTT\n\n${bad}\nx\n\n00:05.000 --> 00:06.000\ny`);
      expect(r.cues, bad).toEqual([[5000, 6000, 'y']]);
      expect(r.notices, bad).toEqual([3]);
      expect(r.messages[0], bad).toMatch(/^lines 3-4: skipped a cue: the (start|end) time should look like 00:01\.000/);
    }
    // Hours may have one digit, or more than two ("1:02:03.000", "100:00:00.000")
    expect(parseTranscript('WEBVTT\n\n1:02:03.000 --> 1:02:04.000\nx').cues[0].startMs).toBe(3_723_000);
    expect(parseTranscript('WEBVTT\n\n100:00:00.000 --> 100:00:01.000\nx').cues[0].startMs).toBe(360_000_000);
  });

  it('settings that cannot be read are ignored, not fatal; the cue and its text stay (spec: parse the WebVTT cue settings)', () => {
    const r = parseTranscript('WEBVTT\n\n00:01.000 --> 00:04.000 Fold it align:middle position:10%\nFold the flap.\n');
    expect(r.cues.map((c) => [c.startMs, c.endMs, c.text])).toEqual([[1000, 4000, 'Fold the flap.']]);
    expect(r.notices).toEqual([{ line: 3, message: expect.stringMatching(/^line 3: ignored cue settings that cannot be read: 'Fold', 'it', 'align:middle'/) }]);
  });

  it('STYLE after the first cue is skipped with a notice (spec: style blocks count only before any cue)', () => {
    const text = 'WEBVTT\n\n00:00.000 --> 00:01.000\nHi\n\nSTYLE\n::cue { color: red }\n';
    const r = read(text);
    expect(r.cues).toEqual([[0, 1000, 'Hi']]);
    expect(r.messages).toEqual(['lines 6-7: skipped a STYLE block: STYLE and REGION blocks count only before the first cue']);
    expect(read(text.replace('STYLE\n::cue { color: red }', 'REGION\nid:a')).messages[0]).toMatch(/skipped a REGION block/);
  });

  it('a NOTE line straight before a timing becomes that cue’s identifier, as the parser reads it, with a notice', () => {
    const r = parseTranscript('WEBVTT\n\nNOTE about the lid\n00:01.000 --> 00:02.000\nx\n');
    expect(r.cues).toEqual([{ index: 0, startMs: 1000, endMs: 2000, text: 'x', identifier: 'NOTE about the lid' }]);
    expect(r.notices?.[0]?.line).toBe(3);
  });

  it('text after a blank line inside a cue is skipped, and the notice names its line (spec: a blank line ends the block)', () => {
    const r = read('WEBVTT\n\n00:01.000 --> 00:04.000\nScore the strip\n\nat one inch\n');
    expect(r.cues).toEqual([[1000, 4000, 'Score the strip']]);
    expect(r.messages).toEqual(["line 6: skipped 'at one inch': text with no cue timing (a blank line ends a cue, so text after one needs its own timing)"]);
  });

  it('a wrong signature is refused at line 1; a lower-case one says why (spec: "WEBVTT" then space, tab or line end)', () => {
    expect(parseError('WEBVTTX\n\n00:00.000 --> 00:01.000\nx').line).toBe(1);
    expect(parseError('WEBVTT-\n\n00:00.000 --> 00:01.000\nx').line).toBe(1);
    expect(parseError('webvtt\n\n00:00.000 --> 00:01.000\nx').message).toMatch(/capitals/);
    expect(parseError('\n\nWEBVTT\n').line).toBe(3);
  });

  it('cue timings with no header and no cue number are refused on their line', () => {
    expect(parseError('\n00:00.000 --> 00:01.000\nHello').line).toBe(2);
  });
});

// Conformance cases modelled on web-platform-tests, webvtt/parsing/file-parsing/tests (signature,
// nulls, whitespace, arrows, ids, header, timings, settings files; recalled from memory and written
// small, in our own words). Each expectation follows the W3C "WebVTT parser algorithm" step named.
describe('WebVTT conformance (web-platform-tests webvtt/parsing/file-parsing, from memory)', () => {
  it('signature: space, tab or line end after WEBVTT; BOM allowed; anything else refused (parser steps 4-6)', () => {
    expect(parseTranscript('WEBVTT \n\n00:00.000 --> 00:01.000\na').cues).toHaveLength(1);
    expect(parseTranscript('WEBVTT\tx\n\n00:00.000 --> 00:01.000\na').cues).toHaveLength(1);
    expect(parseTranscript('\uFEFFWEBVTT\n\n00:00.000 --> 00:01.000\na').cues).toHaveLength(1);
    expect(parseError('WEBVTTwith text\n\n00:00.000 --> 00:01.000\na').line).toBe(1);
    expect(parseError('\uFEFF\uFEFFWEBVTT\n\n00:00.000 --> 00:01.000\na').line).toBe(1);
  });

  it('nulls: every U+0000 becomes U+FFFD, in cue text and identifiers (parser step 1)', () => {
    const r = parseTranscript('WEBVTT\n\nid\0\n00:00.000 --> 00:01.000\nfo\0ld\0\n');
    expect(r.cues[0]).toMatchObject({ identifier: 'id\uFFFD', text: 'fo\uFFFDld\uFFFD' });
    expect(r.notices).toEqual([{ line: 3, message: 'line 3: 3 NUL characters were replaced by U+FFFD (�)' }]);
    expect(JSON.stringify(r)).not.toContain('\\u0000');
  });

  it('whitespace: tab, form feed and spaces around "-->" and before settings (collect cue timings: skip ASCII whitespace)', () => {
    const r = read('WEBVTT\n\n00:00.000\t-->\f00:01.000\n a\n\n\f00:02.000-->00:03.000\tline:0\nb\n\n00:04.000 \t --> \t 00:05.000 \f align:start\nc\n');
    expect(r.cues).toEqual([
      [0, 1000, 'a'],
      [2000, 3000, 'b'],
      [4000, 5000, 'c'],
    ]);
    expect(r.notices).toEqual([]);
    // a no-break space is not the spec's whitespace: that cue is skipped
    expect(read('WEBVTT\n\n00:00.000\u00a0--> 00:01.000\nx\n').cues).toEqual([]);
  });

  it('arrows: a "-->" on the line after a cue’s text starts the next cue; the text line before it stays text (block loop)', () => {
    const r = parseTranscript('WEBVTT\n\n00:00.000 --> 00:01.000\none\nnot an id\n00:01.000 --> 00:02.000\ntwo\n');
    expect(r.cues.map((c) => [c.text, c.identifier])).toEqual([
      ['one\nnot an id', undefined],
      ['two', undefined],
    ]);
  });

  it('ids: any text without "-->" on the line before the timing, including "NOTE"-free words and numbers (cue identifier)', () => {
    const r = parseTranscript('WEBVTT\n\nfirst cut\n00:00.000 --> 00:01.000\na\n\n12\n00:01.000 --> 00:02.000\nb\n\n00:02.000 --> 00:03.000\nc\n');
    expect(r.cues.map((c) => c.identifier)).toEqual(['first cut', '12', undefined]);
  });

  it('header: lines after the signature up to a blank line are not cues; a timing line ends the header (collect a block in header)', () => {
    expect(read('WEBVTT\nKind: captions\nsome header text\n\n00:00.000 --> 00:01.000\na\n').cues).toEqual([[0, 1000, 'a']]);
    expect(read('WEBVTT\nheader\n00:00.000 --> 00:01.000\na\n').cues).toEqual([[0, 1000, 'a']]);
  });

  it('timings: a cue timing on the third line of a block ends the block there (line count rule)', () => {
    const r = read('WEBVTT\n\nline one\nline two\n00:00.000 --> 00:01.000\na\n');
    expect(r.cues).toEqual([[0, 1000, 'a']]);
    expect(r.notices).toEqual([3]);
  });

  it('whitespace-only lines do not end a block: only an empty line does (block loop)', () => {
    expect(read('WEBVTT\n\n00:00.000 --> 00:01.000\na\n   \nb\n').cues).toEqual([[0, 1000, 'a\nb']]);
  });

  it('a file of only the signature, or a signature and header, has no cues and is not refused', () => {
    expect(parseTranscript('WEBVTT')).toEqual({ format: 'vtt', cues: [] });
    expect(parseTranscript('WEBVTT\nKind: captions\n')).toEqual({ format: 'vtt', cues: [] });
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
    expect(cues.map((c) => [c.startMs, c.text])).toEqual([
      [360_000_000, 'one'],
      [360_001_000, 'two'],
    ]);
  });

  it('a bad timing, a number with no timing, and stray text are reported on their lines', () => {
    expect(parseError('1\n00:00:01,000 -> 00:00:04,000\nHi\n').line).toBe(2);
    const e = parseError('1\n00:00:01,000 --> 00:00:04,000\nHi\n\n2\nThere\n');
    expect(e.line).toBe(6);
    expect(e.message).toBe("line 6: expected a cue timing like 00:00:01,000 --> 00:00:04,000, found 'There'");
    expect(parseError('1\n00:00:01,000 --> 00:00:04,000\nHi\n\nand more\n').line).toBe(5);
    expect(parseError('1\n00:00:04,000 --> 00:00:01,000\nHi\n').message).toBe('line 2: the cue ends (00:00:01,000) before it starts (00:00:04,000)');
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
    expect(plainCues('[0:00] You need\n12 x 12 cardstock\n1.5 in strips').map((c) => c.text)).toEqual(['You need\n12 x 12 cardstock\n1.5 in strips']);
  });

  it('a broken time names its line: "1:7x", seconds over 59, unmatched brackets', () => {
    const e = parseError(fixture('broken-time.txt'));
    expect(e.line).toBe(3);
    expect(e.message).toBe("line 3: expected a time like 0:00, [1:05] or 1:02:03 at the start of the line, found '1:7x'");
    expect(parseError('0:00 a\n\n1:75 b').line).toBe(3);
    expect(parseError('0:00 a\n[1:05 b').message).toMatch(/brackets do not match/);
    expect(parseError('0:00 a\n1:05x b').line).toBe(2);
  });

  it('a title or header before the first timed line is skipped with a notice (issue 11)', () => {
    const r = parseTranscript(fixture('text-before-time.txt'));
    expect(r.cues.map((c) => c.text)).toEqual(['Welcome.']);
    expect(r.notices).toEqual([{ line: 1, message: "line 1: skipped a title or header line before the first timed line ('Round gift box, part one')" }]);
    const labelled = parseTranscript('# Session 3 transcript\n\nTranscript:\n0:00 Cut the base.\n0:04 Score it.');
    expect(labelled.cues.map((c) => c.text)).toEqual(['Cut the base.', 'Score it.']);
    expect(labelled.notices?.[0]?.message).toMatch(/^lines 1-3: skipped 2 title or header lines/);
  });

  it('an SRT file with a title line is read too', () => {
    const r = parseTranscript('Session 3 transcript\n\n1\n00:00:01,000 --> 00:00:02,000\nCut it.\n');
    expect(r.format).toBe('srt');
    expect(r.cues.map((c) => [c.startMs, c.text])).toEqual([[1000, 'Cut it.']]);
    expect(r.notices?.[0]?.line).toBe(1);
  });

  it('text with no timed line at all is refused at its first line', () => {
    const e = parseError('Round gift box, part one\nWelcome.\n');
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/^line 1: expected a time like 0:00/);
  });

  it('lines in the middle that claim a time but break it still get the line-numbered error', () => {
    expect(parseError('# Title\n0:00 a\n0:7x b').line).toBe(3);
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

describe('times past the stored range', () => {
  // Times are stored in PostgreSQL integer columns: 2^31 - 1 ms (PostgreSQL manual, "Numeric Types") is about 596 h 31 min.
  it('names the line of a time past 2^31 ms in WebVTT, SRT and plain lines', () => {
    expect(parseError('WEBVTT\n\n1:00.000 --> 2:00.000\nHi\n\n600:00:00.000 --> 600:00:01.000\nLate\n').line).toBe(6);
    expect(parseError('1\n00:00:01,000 --> 596:31:24,000\nLate\n').line).toBe(2);
    const plain = parseError('0:00 Hi\n\n35791:24 Late\n');
    expect(plain.line).toBe(3);
    expect(plain.message).toMatch(/^line 3: .*past the longest recording/);
  });

  it('keeps a last plain cue just under the limit within range', () => {
    const { cues } = parseTranscript('596:31:23 Late\n');
    expect(cues[0].startMs).toBe(2_147_483_000);
    expect(cues[0].endMs).toBeLessThanOrEqual(2 ** 31 - 1);
  });
});
