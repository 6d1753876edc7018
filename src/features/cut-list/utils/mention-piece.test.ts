import { describe, expect, it } from 'vitest';
import { makeFromMention, nameFromMention, scoreLinesFromMention } from './mention-piece';
import type { LengthDto, MentionDto } from '../api/types';

// The exact stored form and the written form differ, so the tests see which one each action sends.
const STORED: Record<string, string> = { '4 1/4 in': '17/4 in', '5 1/2 in': '11/2 in', '6 3/8 in': '51/8 in', '10 9/16 in': '169/16 in', '1/2 in': '1/2 in', '4 3/4 in': '19/4 in', '1 in': '1 in', '2 in': '2 in', '3 in': '3 in' };
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
  dismissed: false,
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
    expect(makeFromMention(mention('length', ['10 9/16 in']))).toEqual({ kind: 'prefill', piece: { name: 'Strip said at 2:05', saidAtMs: 125_000, shape: 'rect', width: '10 9/16 in' } });
    expect(makeFromMention(mention('score', ['1 in', '2 in']))).toBeNull();
  });
});

describe('scoreLinesFromMention', () => {
  it('makes one score line per value on the chosen axis', () => {
    expect(scoreLinesFromMention(mention('score', ['1/2 in', '4 3/4 in']), 'height')).toEqual([
      { axis: 'height', at: '1/2 in' },
      { axis: 'height', at: '19/4 in' },
    ]);
    expect(scoreLinesFromMention(mention('size', ['1 in', '2 in']), 'width')).toEqual([]);
  });

  it('names pieces by the time they were said (m:ss)', () => {
    expect(nameFromMention(mention('diameter', ['3 in'], { startMs: 3_725_000 }))).toBe('Circle said at 1:02:05');
  });
});
