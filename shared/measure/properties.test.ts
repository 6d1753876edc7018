import Fraction from 'fraction.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatLength, length, sameLength, type LengthUnit } from './length';
import { extractMentions, extractMentionsFromCues } from './mentions';
import { parseLength } from './parse-length';

const unitArb = fc.constantFrom<LengthUnit>('in', 'mm', 'cm');
const rulerLike = fc
  .tuple(fc.integer({ min: 0, max: 2000 }), fc.constantFrom(1, 2, 4, 8, 16, 32, 64), unitArb)
  .map(([n, d, u]) => length(new Fraction(n, d), u));
const anyRational = fc
  .tuple(fc.bigInt({ min: 0n, max: 10n ** 18n }), fc.bigInt({ min: 1n, max: 10n ** 12n }), unitArb)
  .map(([n, d, u]) => length(new Fraction(n, d), u));

describe('display form round trip (property)', () => {
  it('parsing the display form of a ruler length gives the same length', () => {
    fc.assert(
      fc.property(rulerLike, (l) => {
        const back = parseLength(formatLength(l));
        expect(back, formatLength(l)).not.toBeNull();
        expect(sameLength(back!, l), formatLength(l)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it('parsing the display form of any rational length gives the same length', () => {
    fc.assert(
      fc.property(anyRational, (l) => {
        const back = parseLength(formatLength(l));
        expect(back, formatLength(l)).not.toBeNull();
        expect(sameLength(back!, l), formatLength(l)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});

// Words the grammar cares about, to make inputs that reach deep into it.
const VOCAB = [
  'a',
  'an',
  'and',
  'by',
  'x',
  '×',
  'at',
  'score',
  'it',
  'circle',
  'across',
  'diameter',
  'in',
  'inch',
  'inches',
  'mm',
  'cm',
  'half',
  'quarter',
  'quarters',
  'third',
  'eighths',
  'sixteenths',
  'thirty',
  'second',
  'seconds',
  'sixty',
  'fourths',
  'point',
  'one',
  'two',
  'ten',
  'nine',
  'twenty',
  'hundred',
  'of',
  'about',
  'just',
  'over',
  'a little bit more than',
  'sorry',
  'no',
  'um',
  'like',
  'you know',
  'the',
  'wide',
  'long',
  'minutes',
  '$4.99',
  '3:15',
  '10',
  '9/16',
  '0/0',
  '1/0',
  '3½',
  '⅝',
  '"',
  "'",
  '.',
  ',',
  '-',
  '16ths',
  '1.75',
  '.5',
  '99999999999999999999',
  '%',
  'or so',
  'ish',
  'i mean',
  '\n',
  '',
  '🙂',
];
const phraseArb = fc.array(fc.constantFrom(...VOCAB), { maxLength: 40 }).map((ws) => ws.join(' '));
const gluedArb = fc.array(fc.constantFrom(...VOCAB), { maxLength: 20 }).map((ws) => ws.join(''));

describe('never throws (property)', () => {
  const noThrow = (text: string) => {
    const ms = extractMentions(text);
    for (const m of ms) {
      expect(text.slice(m.start, m.end)).toBe(m.text);
      expect(m.values.length).toBeGreaterThan(0);
      for (const v of m.values) expect(v.value.s >= 0n || v.value.n === 0n).toBe(true);
    }
    parseLength(text);
    extractMentionsFromCues([
      { startMs: 0, endMs: 1, text },
      { startMs: 1, endMs: 2, text },
    ]);
  };

  it('on arbitrary unicode strings', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (s) => noThrow(s)),
      { numRuns: 3000 },
    );
  });

  it('on phrases made of the grammar’s own words', () => {
    fc.assert(
      fc.property(phraseArb, (s) => noThrow(s)),
      { numRuns: 3000 },
    );
  });

  it('on the grammar’s words glued together', () => {
    fc.assert(
      fc.property(gluedArb, (s) => noThrow(s)),
      { numRuns: 2000 },
    );
  });
});
