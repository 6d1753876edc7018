import type { JSONContent } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { validateDoc } from '../editor/validate-doc';
import { generateDraft, type DraftInput } from './generate-draft';

// A hexagon treat box, recorded and narrated by an imaginary crafter.
const INPUT: DraftInput = {
  title: 'hexagon treat box',
  durationMs: 200_000,
  chapters: [
    // Given out of order on purpose: the draft sorts by time.
    { id: 'ch-cut', title: 'cut the pieces', startMs: 15_000 },
    { id: 'ch-intro', title: 'Intro', startMs: 0 },
    { id: 'ch-score', title: 'Score the walls', startMs: 60_000 },
    { id: 'ch-glue', title: 'Assemble the box', startMs: 120_000 },
  ],
  cues: [
    { startMs: 500, endMs: 4000, text: 'hi everyone um welcome back' },
    { startMs: 5000, endMs: 9000, text: "today we're making a a hexagon treat box" },
    { startMs: 16_000, endMs: 20_000, text: 'okay so first cut your cardstock ten and nine sixteenths by' },
    { startMs: 20_100, endMs: 23_000, text: 'four and a quarter inches' },
    { startMs: 25_000, endMs: 28_000, text: 'then th- the lid is a circle three inches in diameter' },
    { startMs: 61_000, endMs: 66_000, text: 'score the strip at one and at two and at three inches' },
    { startMs: 67_000, endMs: 70_000, text: 'uh you know just press firmly' },
    { startMs: 71_000, endMs: 72_000, text: 'fold each line' },
    { startMs: 73_000, endMs: 74_000, text: 'crease it well' },
    { startMs: 75_000, endMs: 76_000, text: 'burnish the folds' },
    { startMs: 77_000, endMs: 78_000, text: 'check the corners' },
    { startMs: 79_000, endMs: 80_000, text: 'set it aside' },
  ],
  stills: [
    { id: 'st-9', atMs: 150_000, url: '/media/stills/st-9.jpg' },
    { id: 'st-3', atMs: 30_000, url: '/media/stills/st-3.jpg', caption: 'The lid circle' },
    { id: 'st-2', atMs: 18_000, url: '/media/stills/st-2.jpg', caption: 'Cutting the base', alt: 'Cardstock on the trimmer', width: 1280, height: 720 },
    { id: 'st-bad', atMs: 120_000, url: 'javascript:alert(1)' },
    { id: 'st-8', atMs: 120_000, url: '/media/stills/st-8.jpg' },
    { id: 'st-late', atMs: 250_000, url: '/media/stills/st-late.jpg' },
  ],
};

const steps = (d: JSONContent) => d.content!.filter((n) => n.type === 'step');
const words = (n: JSONContent): string => (n.type === 'text' ? n.text! : (n.content ?? []).map(words).join(''));

describe('generateDraft', () => {
  const draft = generateDraft(INPUT);

  it('lays out title, intro, supplies, cut list, then the steps', () => {
    expect(draft.content!.slice(0, 7).map((n) => (n.type === 'heading' ? `h${n.attrs!.level}:${words(n)}` : n.type))).toEqual([
      'h1:Hexagon treat box',
      'paragraph',
      'h2:Supplies',
      'supplyList',
      'h2:Cut list',
      'cutList',
      'h2:Steps',
    ]);
    expect(draft.content![3]).toEqual({ type: 'supplyList', attrs: { grouped: true } });
    expect(draft.content![5]).toEqual({ type: 'cutList', attrs: { units: 'both' } });
  });

  it('moves the greeting out and "today we\'re making" into the intro; an intro chapter with nothing else is no step', () => {
    expect(words(draft.content![1]!)).toBe(
      "Today we're making a hexagon treat box. Here is how to make it, step by step: the supplies, the cut list, then 3 steps.",
    );
    expect(JSON.stringify(draft)).not.toMatch(/welcome back/i);
  });

  it('makes one step per chapter, in time order, with its time and chapter', () => {
    expect(steps(draft).map((s) => [words(s.content![0]!), s.attrs!.atMs, s.attrs!.chapterId])).toEqual([
      ['Cut the pieces', 15_000, 'ch-cut'],
      ['Score the walls', 60_000, 'ch-score'],
      ['Assemble the box', 120_000, 'ch-glue'],
    ]);
  });

  it('cleans each step’s words and shows measurements in display form', () => {
    const [cut, score] = steps(draft);
    expect(cut!.content!.filter((n) => n.type === 'paragraph').map(words)).toEqual([
      'First cut your cardstock 10 9/16 x 4 1/4 in. Then the lid is a 3 in circle.',
    ]);
    // A pause of 700 ms or more ends a sentence; at most four sentences make a paragraph.
    expect(score!.content!.filter((n) => n.type === 'paragraph').map(words)).toEqual([
      'Score the strip at 1 in, 2 in and 3 in. Just press firmly. Fold each line. Crease it well.',
      'Burnish the folds. Check the corners. Set it aside.',
    ]);
  });

  it('places the first still taken within each chapter, or none', () => {
    const stillOf = (s: JSONContent) => s.content!.find((n) => n.type === 'still')?.attrs;
    const [cut, score, glue] = steps(draft);
    expect(stillOf(cut!)).toEqual({
      stillId: 'st-2',
      src: '/media/stills/st-2.jpg',
      alt: 'Cardstock on the trimmer',
      caption: 'Cutting the base',
      width: 1280,
      height: 720,
    });
    expect(stillOf(score!)).toBeUndefined();
    // A still at the chapter's first instant is inside it; an unsafe address is passed over.
    expect(stillOf(glue!)).toEqual({ stillId: 'st-8', src: '/media/stills/st-8.jpg', alt: 'Assemble the box', caption: '', width: null, height: null });
    expect(JSON.stringify(draft)).not.toContain('st-late');
  });

  it('is accepted by validateDoc unchanged', () => {
    expect(validateDoc(draft)).toEqual({ ok: true, doc: draft });
  });

  it('is the same every time, whatever order the inputs come in', () => {
    const shuffled = { ...INPUT, chapters: [...INPUT.chapters].reverse(), cues: [...INPUT.cues].reverse(), stills: [...INPUT.stills].reverse() };
    expect(generateDraft(shuffled)).toEqual(draft);
  });
});

// Our own opening and closing lines, of the kinds makers say on camera (common practice).
describe('greetings and sign-offs', () => {
  const draft = generateDraft({
    title: 'Round keepsake box',
    chapters: [
      { id: 'a', title: 'Introduction', startMs: 0 },
      { id: 'b', title: 'Cut eighteen inch strips', startMs: 10_000 },
      { id: 'c', title: 'Finish', startMs: 20_000 },
    ],
    cues: [
      { startMs: 0, endMs: 4000, text: 'Hi friends, welcome back to the studio. Today we are making a round box.' },
      { startMs: 4000, endMs: 8000, text: 'You will need kraft cardstock.' },
      { startMs: 10_000, endMs: 14_000, text: 'Cut two strips eighteen inches long.' },
      { startMs: 20_000, endMs: 24_000, text: 'Glue the lid on. Happy crafting! Thanks so much for watching, and subscribe for more.' },
    ],
    stills: [],
  });
  it('keeps the greeting out of the steps and puts the project line in the intro', () => {
    expect(words(draft.content![1]!)).toMatch(/^Today we are making a round box\. Here is how/);
    expect(words(steps(draft)[0]!.content![1]!)).toBe('You will need kraft cardstock.');
  });
  it('ends the last step at its last instruction; a kind sign-off closes the page, "thanks for watching" stays in the video', () => {
    const last = steps(draft)[2]!;
    expect(words(last.content![1]!)).toBe('Glue the lid on.');
    expect(words(draft.content![draft.content!.length - 1]!)).toBe('Happy crafting!');
    expect(JSON.stringify(draft)).not.toMatch(/watching|subscribe/i);
  });
  it('writes headings with measurements in display form (18 in, not eighteen inches)', () => {
    expect(words(steps(draft)[1]!.content![0]!)).toBe('Cut 18 in strips');
  });
});

describe('generateDraft without an intro chapter', () => {
  const input: DraftInput = {
    title: 'Gatefold birthday card',
    chapters: [
      { id: 'a', title: 'Score the base', startMs: 5000 },
      { id: 'b', title: 'Add the mats', startMs: 40_000 },
      { id: 'c', title: '', startMs: 80_000 },
    ],
    cues: [
      { startMs: 0, endMs: 3000, text: 'so this card opens from the middle' },
      { startMs: 41_000, endMs: 45_000, text: 'the mats are four by five and a half' },
    ],
    stills: [],
  };
  const draft = generateDraft(input);

  it('writes a one-line intro and turns every chapter into a step', () => {
    expect(words(draft.content![1]!)).toBe('Here is how to make it, step by step: the supplies, the cut list, then 3 steps.');
    expect(steps(draft).map((s) => words(s.content![0]!))).toEqual(['Score the base', 'Add the mats', 'Step 3']);
  });

  it('gives words said before the first chapter mark to the first step', () => {
    expect(words(steps(draft)[0]!.content![1]!)).toBe('This card opens from the middle.');
  });

  it('leaves a chapter with no words as a title only', () => {
    expect(steps(draft)[2]!.content).toHaveLength(1);
  });

  it('reads bare numbers in the tutorial default unit', () => {
    const metric = generateDraft({ ...input, defaultUnit: 'mm' });
    expect(words(steps(metric)[1]!.content![1]!)).toBe('The mats are 4 x 5.5 mm.');
  });

  it('keeps a lone welcome chapter as its step', () => {
    const one = generateDraft({
      title: 'Tag',
      chapters: [{ id: 'x', title: 'Welcome', startMs: 0 }],
      cues: [{ startMs: 0, endMs: 1000, text: 'punch the hole' }],
      stills: [],
    });
    expect(steps(one).map((s) => words(s.content![0]!))).toEqual(['Welcome']);
  });

  it('makes a single step from the whole transcript when there are no chapters', () => {
    const none = generateDraft({
      title: 'Round gift box',
      chapters: [],
      cues: [{ startMs: 0, endMs: 1000, text: 'wrap the strip round the base' }],
      stills: [],
    });
    expect(steps(none).map((s) => [words(s.content![0]!), s.attrs!.chapterId, words(s.content![1]!)])).toEqual([
      ['Round gift box', null, 'Wrap the strip round the base.'],
    ]);
    expect(validateDoc(none).ok).toBe(true);
  });
});
