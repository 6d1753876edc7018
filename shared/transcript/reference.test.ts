import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { WebVTTParser } from 'webvtt-parser';
import SrtParser from 'srt-parser-2';
import { parseTranscript } from './parse';

// Our parser stays our own (ADR 002: line-numbered errors, runs in the browser); these tests read
// the same files with general-purpose parsers from the registry and expect the same cues at the
// same times: `webvtt-parser` (the W3C WebVTT validator's parser) and `srt-parser-2`.

const dir = fileURLToPath(new URL('../../tests/fixtures/transcripts/', import.meta.url));
const files = (ext: string) => readdirSync(dir).filter((f) => f.endsWith(ext));
const read = (name: string) => readFileSync(dir + name, 'utf8');
const ours = (text: string) => parseTranscript(text).cues.map((c) => ({ id: c.identifier ?? '', startMs: c.startMs, endMs: c.endMs }));
/** Cues in file order, as a parser that does not sort gives them. */
const byStart = <T extends { startMs: number }>(cues: T[]) => [...cues].sort((a, b) => a.startMs - b.startMs);

// Files whose cues the reference refuses along with the whole file (a broken signature) are left
// out; so is a NOTE line straight before a timing, which the validator treats as a comment while
// the W3C parser algorithm (and ours) makes it the cue's identifier.
const VTT_INLINE: [string, string][] = [
  ['settings and whitespace', 'WEBVTT\n\n00:00.000\t-->\f00:01.000 vertical:rl bogus\na\n\n00:01.000-->00:02.000\nb\n'],
  ['a timing that cannot be read is skipped by both', 'WEBVTT\n\n00:00.000 --> 00:01.000\na\n\n00:01.0 --> 00:02.000\nb\n\n00:02.000 --> 00:03.000\nc\n'],
  ['an end before its start is kept by both', 'WEBVTT\n\n00:05.000 --> 00:04.000\nback\n'],
  ['NUL in the text', 'WEBVTT\n\n00:00.000 --> 00:01.000\na\0b\n'],
  ['a cue timing without a blank line before it', 'WEBVTT\n\n00:00.000 --> 00:01.000\none\n00:01.000 --> 00:02.000\ntwo\n'],
  ['hours with three digits', 'WEBVTT\n\n100:00:00.000 --> 100:00:01.000\nx\n'],
];

describe('WebVTT: same cues and times as webvtt-parser (W3C validator)', () => {
  const reference = (text: string) =>
    new WebVTTParser().parse(text, 'metadata').cues.map((c) => ({ id: c.id, startMs: Math.round(c.startTime * 1000), endMs: Math.round(c.endTime * 1000) }));

  it.each(files('.vtt'))('fixture %s', (name) => {
    const text = read(name);
    expect(ours(text)).toEqual(byStart(reference(text)));
  });

  it.each(VTT_INLINE)('%s', (_, text) => {
    expect(ours(text)).toEqual(byStart(reference(text)));
  });

  it('the same cue text where there is no markup', () => {
    const text = read('lantern-messy.vtt');
    const ref = new WebVTTParser().parse(text, 'metadata').cues.map((c) => c.text);
    expect(parseTranscript(text).cues.map((c) => c.text)).toEqual(ref);
  });
});

describe('SRT: same cues and times as srt-parser-2', () => {
  const reference = (text: string) =>
    new SrtParser().fromSrt(text).map((c) => ({ startMs: Math.round(c.startSeconds * 1000), endMs: Math.round(c.endSeconds * 1000), text: c.text }));

  it.each(files('.srt'))('fixture %s', (name) => {
    const text = read(name);
    const mine = parseTranscript(text).cues.map((c) => ({ startMs: c.startMs, endMs: c.endMs }));
    // the reference splits blocks on LF only, keeps a BOM and reads only SRT's comma before the
    // milliseconds (a dot is our leniency): give it the plain SRT form of the same file
    const plain = text
      .replace(/^\uFEFF/, '')
      .replace(/\r\n?/g, '\n')
      .replace(/(\d\d:\d\d:\d\d)\.(\d{3})/g, '$1,$2');
    expect(mine).toEqual(reference(plain).map(({ startMs, endMs }) => ({ startMs, endMs })));
  });

  it('the same text where there is no markup', () => {
    const text = '1\n00:00:01,000 --> 00:00:02,500\nCut the base\nfour by four.\n\n2\n00:00:02,500 --> 00:00:04,000\nScore at two.\n';
    expect(parseTranscript(text).cues.map((c) => c.text)).toEqual(reference(text).map((c) => c.text));
  });
});
