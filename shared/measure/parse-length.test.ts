import { describe, expect, it } from 'vitest';
import { serializeLength } from './length';
import { parseLength, readLength } from './parse-length';

// Phrase table for M1: each spoken or written form and the exact length it means.
// Values are plain arithmetic on the words (e.g. ten and nine sixteenths = 169/16).
const TABLE: [string, string][] = [
  // whole numbers in words, with and without hyphens, any case
  ['twenty-four inches', '24 in'],
  ['twenty four inches', '24 in'],
  ['Ninety-Nine mm', '99 mm'],
  ['seventy three', '73 in'],
  ['thirteen', '13 in'],
  ['one hundred and twenty millimetres', '120 mm'],
  // "a" / "an" for one
  ['an inch', '1 in'],
  ['a centimetre', '1 cm'],
  ['a quarter', '1/4 in'],
  ['an eighth', '1/8 in'],
  // fractions in words, singular or plural whatever the numerator
  ['nine sixteenths', '9/16 in'],
  ['thirteen sixteenth', '13/16 in'],
  ['three-sixteenths', '3/16 in'],
  ['one half', '1/2 in'],
  ['two thirds', '2/3 in'],
  ['three quarters', '3/4 in'],
  ['three fourths', '3/4 in'],
  ['a fourth', '1/4 in'],
  ['five eighths', '5/8 in'],
  ['seven eighth', '7/8 in'],
  ['fifteen sixteenths', '15/16 in'],
  ['one thirty-second', '1/32 in'],
  ['three thirty-seconds', '3/32 in'],
  ['eleven thirty second', '11/32 in'],
  ['thirty-one thirty-seconds', '31/32 in'],
  ['five sixty-fourths', '5/64 in'],
  ['a sixty-fourth', '1/64 in'],
  ['3 16ths', '3/16 in'],
  ['5 32nds', '5/32 in'],
  // mixed numbers
  ['ten and nine sixteenths', '169/16 in'],
  ['Ten And Nine Sixteenths', '169/16 in'],
  ['two and a half', '5/2 in'],
  ['TWO AND A HALF INCHES', '5/2 in'],
  ['an inch and a quarter', '5/4 in'],
  ['two inches and three eighths', '19/8 in'],
  ['5 and 3 fourths', '23/4 in'],
  ['four three-eighths', '35/8 in'],
  ['10 9/16', '169/16 in'],
  ['10-9/16', '169/16 in'],
  ['10 and 9/16', '169/16 in'],
  ['3½', '7/2 in'],
  ['6 ¾', '27/4 in'],
  ['⅝', '5/8 in'],
  ['1.75', '7/4 in'],
  ['.5 in', '1/2 in'],
  ['one point five', '3/2 in'],
  ['one point seven five', '7/4 in'],
  ['point two five inches', '1/4 in'],
  // half and quarter shorthand
  ['half an inch', '1/2 in'],
  ['a half inch', '1/2 in'],
  ['half-inch', '1/2 in'],
  ['quarter inch', '1/4 in'],
  ['a quarter inch', '1/4 in'],
  ['a sixteenth of an inch', '1/16 in'],
  ['three quarters of an inch', '3/4 in'],
  ['a quarter of an inch', '1/4 in'],
  ['half a centimetre', '1/2 cm'],
  ['an eighth inch', '1/8 in'],
  ['a half an inch', '1/2 in'],
  ['a quarter-inch', '1/4 in'],
  ['three-quarter inch', '3/4 in'],
  ['one-and-a-half inches', '3/2 in'],
  // units, short and long, both spellings
  ['4 inch', '4 in'],
  ['4 inches', '4 in'],
  ['4 in', '4 in'],
  ['4 in.', '4 in'],
  ['4in', '4 in'],
  ['4″', '4 in'],
  ['4"', '4 in'],
  ['4 1/4"', '17/4 in'],
  ['13 mm', '13 mm'],
  ['6mm', '6 mm'],
  ['13 millimetres', '13 mm'],
  ['13 millimeters', '13 mm'],
  ['13 millimetre', '13 mm'],
  ['2.5 cm', '5/2 cm'],
  ['2 centimetres', '2 cm'],
  ['2 centimeters', '2 cm'],
  ['2 Centimeter', '2 cm'],
  // spoken messiness
  ['um ten and uh nine sixteenths', '169/16 in'],
  ['four inch inch', '4 in'],
];

describe('readLength: phrase table (M1)', () => {
  it.each(TABLE)('%s -> %s', (input, stored) => {
    const l = parseLength(input);
    expect(l).not.toBeNull();
    expect(serializeLength(l!)).toBe(stored);
  });
});

describe('readLength: units and flags', () => {
  it('uses the default unit when none is said', () => {
    expect(serializeLength(parseLength('12')!)).toBe('12 in');
    expect(serializeLength(parseLength('12', { defaultUnit: 'mm' })!)).toBe('12 mm');
    expect(serializeLength(parseLength('ten and a half', { defaultUnit: 'cm' })!)).toBe('21/2 cm');
    expect(readLength('12')!.explicitUnit).toBe(false);
    expect(readLength('12 mm')!.explicitUnit).toBe(true);
  });

  it('marks approximate lengths', () => {
    for (const p of [
      'about',
      'around',
      'roughly',
      'approximately',
      'probably',
      'just over',
      'just under',
      'a little more than',
      'a little bit more than',
      'a little longer than',
      'a little bit longer than',
    ]) {
      const r = readLength(`${p} 4 inches`);
      expect(r, p).not.toBeNull();
      expect(r!.approx, p).toBe(true);
      expect(serializeLength(r!.length)).toBe('4 in');
    }
    expect(readLength('4 inches')!.approx).toBe(false);
    expect(readLength('4 inches or so')!.approx).toBe(true);
  });
});

describe('readLength: not one length', () => {
  it.each([
    '',
    '   ',
    'abc',
    'four by six',
    'ten minutes',
    '$4.99',
    '3:15',
    '5 gems',
    'two pieces and a half',
    'half',
    'in',
    '4 ft',
    "4'",
    '50%',
    'fold in half',
  ])('%j -> null', (input) => {
    expect(parseLength(input)).toBeNull();
  });
});
