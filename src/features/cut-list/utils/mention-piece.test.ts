import { describe, expect, it } from 'vitest';
import { makeFromMention, nameFromMention, pickFromRange } from './mention-piece';
import type { LengthDto, MentionDto } from '@shared/schemas/piece';

// The exact stored form and the written form differ, so the tests see which one each action sends.
const STORED: Record<string, string> = {
  '4 1/4 in': '17/4 in',
  '5 1/2 in': '11/2 in',
  '6 3/8 in': '51/8 in',
  '10 9/16 in': '169/16 in',
  '1/2 in': '1/2 in',
  '4 3/4 in': '19/4 in',
  '1 in': '1 in',
  '2 in': '2 in',
  '3 in': '3 in',
};
const len = (display: string): LengthDto => ({ value: STORED[display]!, inches: 0, mm: 0, display, mmDisplay: '' });
const mention = (kind: MentionDto['kind'], values: string[], extra: Partial<MentionDto> = {}): MentionDto => ({
  key: 'k',
  kind,
  text: 'words',
  approx: false,
  corrected: false,
  startMs: 125_000,
  endMs: 128_000,
  values: values.map(len),
  every: null,
  count: null,
  dismissed: false,
  proposal: null,
  scoreOf: null,
  uses: [],
  ...extra,
});

// Scenario of our own: a hexagon treat box's side panel said as "four and a quarter by five and a half".
describe('makeFromMention', () => {
  it('turns a size into a rectangle with both sides and the time it was said', () => {
    expect(makeFromMention(mention('size', ['4 1/4 in', '5 1/2 in']))).toEqual({
      kind: 'create',
      piece: { name: 'Piece said at 2:05', saidAtMs: 125_000, shape: 'rect', width: '17/4 in', height: '11/2 in', notes: '' },
    });
  });

  it('turns a diameter into a circle and keeps "about" in the notes', () => {
    const r = makeFromMention(mention('diameter', ['6 3/8 in'], { approx: true, text: 'about six and three eighths across' }));
    expect(r).toMatchObject({ kind: 'create', piece: { shape: 'circle', width: '51/8 in', notes: 'Said as “about six and three eighths across”' } });
  });

  it('only prefills the width for a single length, and makes nothing of a score list', () => {
    expect(makeFromMention(mention('length', ['10 9/16 in']))).toEqual({
      kind: 'prefill',
      piece: { name: 'Strip said at 2:05', saidAtMs: 125_000, shape: 'rect', width: '10 9/16 in' },
    });
    expect(makeFromMention(mention('score', ['1 in', '2 in']))).toBeNull();
  });
});

describe('nameFromMention', () => {
  it('names pieces by the time they were said (m:ss)', () => {
    expect(nameFromMention(mention('diameter', ['3 in'], { startMs: 3_725_000 }))).toBe('Circle said at 1:02:05');
  });
});

// Issue 11: ranges, repeated score lines and counts from the engine's mention data.
describe('ranges, steps and counts', () => {
  const q = (display: string, value: string): LengthDto => ({ value, inches: 0, mm: 0, display, mmDisplay: '' });

  it('a range is never made into a piece at once; picking an end prefills the form and keeps the range in the notes', () => {
    const r = mention('range', [], { values: [q('1/4 in', '1/4 in'), q('3/8 in', '3/8 in')], text: 'somewhere from a quarter to three eighths' });
    expect(makeFromMention(r)).toBeNull();
    expect(pickFromRange(r, r.values[1]!)).toMatchObject({ width: '3/8 in', notes: 'Said as a range: “somewhere from a quarter to three eighths”' });
  });

  it('a count said before a size is the quantity of the piece (worked example: "three 4 by 6 mats")', () => {
    const m = mention('size', [], { values: [q('4 in', '4 in'), q('6 in', '6 in')], count: 3 });
    expect(makeFromMention(m)).toMatchObject({ kind: 'create', piece: { quantity: 3, width: '4 in', height: '6 in' } });
  });
});
