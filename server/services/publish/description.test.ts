import { describe, expect, it } from 'vitest';
import { chapterLines, videoDescription } from './description';
import { hatboxDoc, hatboxPieces } from './test-fixtures';
import type { PublishBundle } from './types';

const bundle: PublishBundle = {
  tutorial: {
    title: 'Round hatbox',
    slug: 'round-hatbox',
    studioName: 'Paper Lantern Studio',
    authorName: 'Robin Ash',
    publicUrl: 'https://cardwright.example/t/round-hatbox',
    videoUrl: null,
  },
  doc: hatboxDoc(),
  pieces: hatboxPieces(),
  supplies: [
    {
      category: 'cardstock',
      name: 'Kraft cardstock, 80 lb',
      quantity: '3 sheets',
      note: '',
      url: 'https://papershop.example/kraft-80',
      sponsored: true,
      discountCode: 'HATBOX10',
    },
    { category: 'tool', name: 'Craft knife', quantity: '', note: '', url: null, sponsored: false, discountCode: null },
  ],
  disclosure: 'Papershop sent me the kraft cardstock; the link to it is sponsored.',
  chapters: [
    { title: 'Scoring the wall', startMs: 95_000 },
    { title: 'Cutting the pieces', startMs: 15_000 },
    { title: 'The lid', startMs: 3_725_000 },
  ],
  stills: [],
  precision: 16,
};

describe('videoDescription', () => {
  // A chapter list starts at 0:00 (from memory, a common video-platform rule, REFERENCES.md).
  it('starts the chapter lines at 0:00, adding "0:00 Introduction" when the first chapter is later', () => {
    const text = videoDescription(bundle);
    const lines = text.split('\n').filter((l) => /^\d+:\d{2}(?::\d{2})? /.test(l));
    expect(lines[0]).toBe('0:00 Introduction');
    expect(lines).toEqual(['0:00 Introduction', '0:15 Cutting the pieces', '1:35 Scoring the wall', '1:02:05 The lid']);
  });

  it('keeps a first chapter that already starts at 0:00', () => {
    expect(
      chapterLines([
        { title: 'Welcome', startMs: 0 },
        { title: 'Cutting', startMs: 42_000 },
      ]),
    ).toEqual(['0:00 Welcome', '0:42 Cutting']);
    // Times show to the whole second (rounded down), so 0.4 s is already 0:00.
    expect(chapterLines([{ title: 'Welcome', startMs: 400 }])).toEqual(['0:00 Welcome']);
  });

  it('opens with the intro, then lists supplies with links and codes, the disclosure and the written tutorial', () => {
    const text = videoDescription(bundle);
    expect(text.split('\n')[0]).toBe('A sturdy round hatbox from two sheets of kraft cardstock, with a patterned lid topper and a matching tag.');
    expect(text).toContain('- Kraft cardstock, 80 lb (sponsored link) (3 sheets): https://papershop.example/kraft-80 (discount code HATBOX10)');
    expect(text).toContain('- Craft knife\n');
    expect(text).toContain('Papershop sent me the kraft cardstock; the link to it is sponsored.');
    expect(text.indexOf('Papershop sent me')).toBeLessThan(text.indexOf('https://papershop.example/kraft-80'));
    expect(text).toContain('https://cardwright.example/t/round-hatbox');
    expect(text).not.toMatch(/<[a-z]/i);
  });

  it('leaves out what the tutorial does not have', () => {
    const bare = videoDescription({
      ...bundle,
      doc: { type: 'doc', content: [] },
      chapters: [],
      supplies: [],
      disclosure: null,
      tutorial: { ...bundle.tutorial, publicUrl: null },
    });
    expect(bare).toBe('Round hatbox: a step-by-step paper craft tutorial by Robin Ash.\n');
  });

  it('ends on one full stop when the name already ends with one', () => {
    const bare = videoDescription({
      ...bundle,
      doc: { type: 'doc', content: [] },
      chapters: [],
      supplies: [],
      disclosure: null,
      tutorial: { ...bundle.tutorial, publicUrl: null, authorName: 'Robin Ash Jr.' },
    });
    expect(bare).toBe('Round hatbox: a step-by-step paper craft tutorial by Robin Ash Jr.\n');
  });
});
