import { describe, expect, it } from 'vitest';
import { inches, millimetres, serializeLength } from './length';
import { expandScoreStep, groupScoreLines } from './score-steps';

// Worked by hand: a 3 in flap scored every 1/4 in has lines at 1/4, 1/2, ... 2 3/4 (11 lines; 3 is the edge).
describe('expandScoreStep', () => {
  it('fills the piece from the first line by the step, stopping short of the far edge', () => {
    const lines = expandScoreStep(inches([1, 4]), inches([1, 4]), inches(3)).map(serializeLength);
    expect(lines).toHaveLength(11);
    expect(lines[0]).toBe('1/4 in');
    expect(lines[10]).toBe('11/4 in');
  });

  it('starts where it was said to, and keeps metric steps exact (25.4 mm = 1 in, NIST SP 811)', () => {
    expect(expandScoreStep(inches(1), inches([1, 2]), inches(3)).map(serializeLength)).toEqual(['1 in', '3/2 in', '2 in', '5/2 in']);
    expect(expandScoreStep(millimetres(10), millimetres(10), inches(2)).map(serializeLength)).toEqual(['10 mm', '20 mm', '30 mm', '40 mm', '50 mm']);
  });

  it('gives nothing for a zero step or a first line outside, and stops at the cap', () => {
    expect(expandScoreStep(inches(1), inches(0), inches(3))).toEqual([]);
    expect(expandScoreStep(inches(4), inches(1), inches(3))).toEqual([]);
    expect(expandScoreStep(inches([1, 32]), inches([1, 32]), inches(12), 50)).toHaveLength(50);
  });
});

describe('groupScoreLines', () => {
  const line = (at: number | [number, number], axis: 'width' | 'height' = 'height') => ({ axis, at: inches(at) });

  it('shows three or more evenly spaced lines on one side as one repeat', () => {
    const g = groupScoreLines([line([1, 4]), line([1, 2]), line([3, 4]), line(1)]);
    expect(g).toHaveLength(1);
    expect(g[0]).toMatchObject({ kind: 'every', axis: 'height' });
    if (g[0]!.kind === 'every')
      expect([serializeLength(g[0]!.step), serializeLength(g[0]!.from), serializeLength(g[0]!.to), g[0]!.lines.length]).toEqual([
        '1/4 in',
        '1/4 in',
        '1 in',
        4,
      ]);
  });

  it('leaves a plain score list, and lines on the other side, as they are', () => {
    expect(groupScoreLines([line(2), line(4)]).map((x) => x.kind)).toEqual(['line', 'line']);
    expect(groupScoreLines([line(1), line(2), line(3, 'width')]).map((x) => x.kind)).toEqual(['line', 'line', 'line']);
    expect(groupScoreLines([line(1), line(2), line(3), line(7)]).map((x) => x.kind)).toEqual(['every', 'line']);
  });
});
