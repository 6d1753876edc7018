import { describe, expect, it } from 'vitest';
import { findMatches, splitByMatches, stepMatch } from './cue-search';

describe('findMatches', () => {
  const texts = ['Score the box at one inch.', 'No match here', 'Box lid, then the BOX base'];
  it('finds every case-insensitive occurrence in reading order, with offsets into the original text', () => {
    const m = findMatches(texts, 'box');
    expect(m).toEqual([
      { cue: 0, start: 10, end: 13 },
      { cue: 2, start: 0, end: 3 },
      { cue: 2, start: 18, end: 21 },
    ]);
    // Cross-check against String.prototype.indexOf on lower-cased ASCII text.
    for (const x of m) expect(texts[x.cue].toLowerCase().indexOf('box', x.start)).toBe(x.start);
  });
  it('treats the query as plain text, not a pattern', () => {
    expect(findMatches(['1/2 in (12.7 mm)', 'a.b'], '(12.7')).toEqual([{ cue: 0, start: 7, end: 12 }]);
    expect(findMatches(['axb'], 'a.b')).toEqual([]);
  });
  it('keeps offsets right where lower-casing would change the length', () => {
    // "İ" (U+0130) lower-cases to two code units ("i̇"), which would shift every later offset.
    const text = 'İstanbul paper box';
    const [m] = findMatches([text], 'box');
    expect(text.slice(m.start, m.end)).toBe('box');
  });
  it('finds nothing for a blank query', () => {
    expect(findMatches(texts, '   ')).toEqual([]);
  });
});

describe('splitByMatches', () => {
  it('cuts the text into plain and matched parts that join back to the original', () => {
    const text = 'Box lid, then the BOX base';
    const parts = splitByMatches(
      text,
      [
        { start: 0, end: 3 },
        { start: 18, end: 21 },
      ],
      4,
    );
    expect(parts).toEqual([
      { text: 'Box', match: 4 },
      { text: ' lid, then the ', match: null },
      { text: 'BOX', match: 5 },
      { text: ' base', match: null },
    ]);
    expect(parts.map((p) => p.text).join('')).toBe(text);
  });
});

describe('stepMatch', () => {
  it('steps forward and back, wrapping at both ends', () => {
    expect(stepMatch(-1, 5, 1)).toBe(0);
    expect(stepMatch(-1, 5, -1)).toBe(4);
    expect(stepMatch(4, 5, 1)).toBe(0);
    expect(stepMatch(0, 5, -1)).toBe(4);
    expect(stepMatch(2, 5, 1)).toBe(3);
    expect(stepMatch(0, 0, 1)).toBe(-1);
  });
});
