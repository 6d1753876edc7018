import { describe, expect, it } from 'vitest';
import { suggestChapters } from './suggest-chapters';

// A transcript of our own invention (a hexagon treat box), the phrases makers commonly use (common practice).
const cues = [
  { startMs: 0, text: 'Hi everyone, welcome back to the studio' },
  { startMs: 6000, text: 'today we are making a hexagon treat box' },
  { startMs: 21000, text: "So first we're going to cut the base panel from kraft cardstock" },
  { startMs: 25000, text: 'next you want to, um' },
  { startMs: 48000, text: 'Next we need to score the six side walls at one inch' },
  { startMs: 80000, text: "now let's glue the tabs" },
  { startMs: 120000, text: 'and finally add the ribbon. That is it.' },
];

describe('suggestChapters', () => {
  it('opens with a chapter at 0:00 (a video chapter list starts at 0:00, from memory)', () => {
    expect(suggestChapters(cues)[0]).toMatchObject({ startMs: 0, title: 'Introduction' });
  });
  it('finds step phrases and makes short titles from the words after them', () => {
    expect(suggestChapters(cues).map((c) => [c.startMs, c.title])).toEqual([
      [0, 'Introduction'],
      [21000, 'Cut the base panel from kraft cardstock'],
      [48000, 'Score the six side walls at one inch'],
      [80000, 'Glue the tabs'],
      [120000, 'Add the ribbon'],
    ]);
  });
  it('drops a cue phrase within 10 s of the last chapter (each chapter at least 10 s, from memory) and empty titles', () => {
    const s = suggestChapters(cues);
    expect(s.find((c) => c.startMs === 25000)).toBeUndefined();
  });
  it('moves an opening step phrase to 0:00 instead of adding an introduction', () => {
    expect(suggestChapters([{ startMs: 2000, text: "Let's start by folding the card base" }, { startMs: 40000, text: 'then we add the mat' }])).toEqual([
      expect.objectContaining({ startMs: 0, title: 'Folding the card base' }),
      expect.objectContaining({ startMs: 40000, title: 'Add the mat' }),
    ]);
  });
  it('gives nothing for an empty transcript', () => {
    expect(suggestChapters([])).toEqual([]);
  });
});
