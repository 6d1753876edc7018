import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { activeCueIndex, lastStartingAtOrBefore, nearestThumbnail, tileAt, tileBackground } from './timeline';

describe('lastStartingAtOrBefore', () => {
  // Cross-checked against a plain linear scan (findLastIndex) over random sorted lists.
  it('agrees with a linear scan', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(100_000), { maxLength: 60 }), fc.integer({ min: -10, max: 110_000 }), (xs, t) => {
        const sorted = [...xs].sort((a, b) => a - b);
        expect(lastStartingAtOrBefore(sorted, t)).toBe(sorted.findLastIndex((s) => s <= t));
      }),
    );
  });
});

describe('activeCueIndex', () => {
  // WebVTT cue timing: a cue is shown from its start time up to, not including, its end time
  // (W3C WebVTT, "cue end time"); between cues nothing is spoken.
  const cues = [
    { startMs: 0, endMs: 4000 },
    { startMs: 4000, endMs: 9500 },
    { startMs: 10_000, endMs: 15_000 },
  ];
  it('takes the cue whose span holds the time, start inclusive and end exclusive', () => {
    expect(activeCueIndex(cues, 0)).toBe(0);
    expect(activeCueIndex(cues, 3999)).toBe(0);
    expect(activeCueIndex(cues, 4000)).toBe(1);
    expect(activeCueIndex(cues, 10_000)).toBe(2);
  });
  it('is -1 in a pause between cues and after the last', () => {
    expect(activeCueIndex(cues, 9700)).toBe(-1);
    expect(activeCueIndex(cues, 15_000)).toBe(-1);
    expect(activeCueIndex([], 0)).toBe(-1);
  });
});

describe('nearestThumbnail', () => {
  const at = [0, 2000, 4000, 6000];
  it('picks the closest tile, the earlier one on a tie', () => {
    expect(nearestThumbnail(at, -50)).toBe(0);
    expect(nearestThumbnail(at, 2999)).toBe(1);
    expect(nearestThumbnail(at, 3000)).toBe(1);
    expect(nearestThumbnail(at, 3001)).toBe(2);
    expect(nearestThumbnail(at, 99_000)).toBe(3);
    expect(nearestThumbnail([], 10)).toBe(-1);
  });
});

describe('sprite tiles', () => {
  // The API's layout: tile i is tile i % perSheet of sheet floor(i / perSheet), filled left to
  // right, then top to bottom (as ffmpeg's tile filter lays frames out).
  const sheets = { sheets: ['/a.jpg', '/b.jpg'], columns: 5, rows: 4, perSheet: 20, tileWidth: 160, tileHeight: 90 };
  it('finds sheet, column and row', () => {
    expect(tileAt(0, sheets)).toEqual({ sheet: 0, column: 0, row: 0 });
    expect(tileAt(7, sheets)).toEqual({ sheet: 0, column: 2, row: 1 });
    expect(tileAt(19, sheets)).toEqual({ sheet: 0, column: 4, row: 3 });
    expect(tileAt(23, sheets)).toEqual({ sheet: 1, column: 3, row: 0 });
  });
  it('scales the sheet and offsets it by whole tiles', () => {
    // At 45 px tall everything is half size: tiles 80 x 45, the sheet 400 x 180.
    expect(tileBackground(7, sheets, 45)).toEqual({
      width: 80,
      height: 45,
      backgroundImage: 'url("/a.jpg")',
      backgroundSize: '400px 180px',
      backgroundPosition: '-160px -45px',
    });
    expect(tileBackground(23, sheets, 90).backgroundImage).toBe('url("/b.jpg")');
  });
});
