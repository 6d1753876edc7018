import { describe, expect, it } from 'vitest';
import { shortTitle, suggestChapters, titleFromLine } from './suggest-chapters';

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
      // Measurements in titles show as written (`1 in`), as the first draft's headings do.
      [48000, 'Score the six side walls at 1 in'],
      [80000, 'Glue the tabs'],
      [120000, 'Add the ribbon'],
    ]);
  });
  it('drops a cue phrase within 10 s of the last chapter (each chapter at least 10 s, from memory) and empty titles', () => {
    const s = suggestChapters(cues);
    expect(s.find((c) => c.startMs === 25000)).toBeUndefined();
  });
  it('moves an opening step phrase to 0:00 instead of adding an introduction', () => {
    expect(
      suggestChapters([
        { startMs: 2000, text: "Let's start by folding the card base" },
        { startMs: 40000, text: 'then we add the mat' },
      ]),
    ).toEqual([expect.objectContaining({ startMs: 0, title: 'Folding the card base' }), expect.objectContaining({ startMs: 40000, title: 'Add the mat' })]);
  });
  it('gives nothing for an empty transcript', () => {
    expect(suggestChapters([])).toEqual([]);
  });
});

// Our own lines, one per kind of step phrase the issue lists (common practice in spoken tutorials).
describe('step phrases', () => {
  it.each([
    ['First, trim the card base', 'first', 'Trim the card base'],
    ['Next up, the belly band', 'next up', 'The belly band'],
    ['Then we fold the flaps in', 'then we', 'Fold the flaps in'],
    ['Now we add the sentiment strip', 'now we', 'Add the sentiment strip'],
    ["Let's make the lid", "let's", 'Make the lid'],
    ["Once that's done, wrap the wall around the base", "once that's done", 'Wrap the wall around the base'],
    ['Okay, once the glue is dry, add the bow', 'once the glue is dry', 'Add the bow'],
    ['After that, punch the corners', 'after that', 'Punch the corners'],
    ['Moving on to the envelope', 'moving on', 'To the envelope'],
    ['Time to decorate the front', 'time to', 'Decorate the front'],
    ['Last but not least, stamp the sentiment', 'last but not least', 'Stamp the sentiment'],
  ])('"%s" opens a chapter (%s): "%s"', (line, phrase, title) => {
    const [, s] = suggestChapters([
      { startMs: 0, text: 'Hello and welcome' },
      { startMs: 30_000, text: line },
    ]);
    expect(s).toMatchObject({ startMs: 30_000, phrase, title });
  });
});

describe('chapter titles', () => {
  it('show measurements as written and never end inside one', () => {
    expect(shortTitle('cut the wall strips, two strips of kraft ten and nine sixteenths by two and a half inches')).toBe('Cut the wall strips');
    expect(shortTitle('cut two strips of kraft ten and nine sixteenths by two and a half inches')).toBe('Cut two strips of kraft 10 9/16 x 2 1/2 in');
    expect(shortTitle('score the panel at eighteen inches')).toBe('Score the panel at 18 in');
  });
  it('end at a word boundary, at most seven words, without a dangling "the"', () => {
    const t = shortTitle('glue the front panel onto the card base with the strong tape and press');
    expect(t.split(' ').length).toBeLessThanOrEqual(7);
    // never "onto the card" of "the card base": a phrase the limit would cut through is left out whole
    expect(t).toBe('Glue the front panel');
    expect(shortTitle('cut the tag front from the teal cardstock, three by five inches')).toBe('Cut the tag front');
    expect(shortTitle('add the bow to the')).toBe('Add the bow');
  });
  it('come from the line at the playhead, after the step phrase; nothing when the line names nothing', () => {
    expect(titleFromLine("So now we're going to score the tabs.")).toBe('Score the tabs');
    expect(titleFromLine('Glue the mat in the middle of the panel, pop it on the lid')).toBe('Glue the mat in the middle');
    expect(titleFromLine('Okay.')).toBe('');
  });
});
