import { describe, expect, it } from 'vitest';
import { compareBlocks, compareRows, wordParts } from './compare';
import { docBlocks } from './doc-blocks';

const b = (text: string, label = 'Introduction') => ({ label, text });

describe('compareBlocks: the write-up side by side', () => {
  it('keeps blocks in both, pairs a replaced block word by word, and lists what is left over', () => {
    // Worked by hand (the longest common subsequence of the block texts is A, C): B was replaced
    // by B2 in place, D was added at the end.
    const r = compareBlocks([b('A'), b('B'), b('C')], [b('A'), b('B2'), b('C'), b('D')]);
    expect(r.rows.map((x) => [x.status, x.before, x.after])).toEqual([
      ['same', 'A', 'A'],
      ['changed', 'B', 'B2'],
      ['same', 'C', 'C'],
      ['added', null, 'D'],
    ]);
    expect([r.added.length, r.removed.length, r.changed.length, r.unchanged]).toEqual([1, 0, 1, 2]);
  });

  it('a block taken out with nothing in its place is removed', () => {
    const r = compareBlocks([b('Cut the base.'), b('Glue the wall.'), b('Add the lid.')], [b('Cut the base.'), b('Add the lid.')]);
    expect(r.removed.map((x) => x.before)).toEqual(['Glue the wall.']);
    expect(r.changed).toEqual([]);
  });

  it('identical documents compare as all "same"', () => {
    const r = compareBlocks([b('One'), b('Two')], [b('One'), b('Two')]);
    expect(r.unchanged).toBe(2);
    expect(r.rows.every((x) => x.status === 'same')).toBe(true);
  });
});

describe('wordParts', () => {
  it('marks the words only one side has (jsdiff diffWords: words and the spaces between them are tokens)', () => {
    const { beforeParts, afterParts } = wordParts('Score at 2 in and fold.', 'Score at 2 1/2 in and fold.');
    expect(beforeParts.filter((p) => p.removed)).toEqual([]);
    expect(afterParts.filter((p) => p.added).map((p) => p.text.trim())).toEqual(['1/2']);
    expect(afterParts.map((p) => p.text).join('')).toBe('Score at 2 1/2 in and fold.');
    expect(beforeParts.map((p) => p.text).join('')).toBe('Score at 2 in and fold.');
  });
});

describe('compareRows: lists matched by id', () => {
  const fields = [
    { key: 'name', label: 'Name' },
    { key: 'size', label: 'Size' },
  ];
  const row = (id: string, name: string, size: string) => ({ id, name, values: { name, size } });

  it('a renamed piece is one changed row naming the field; an added and a removed one are apart', () => {
    const before = [row('1', 'Base', '6 in circle'), row('2', 'Wall', '19 x 3 in'), row('3', 'Lid', '6 1/8 in circle')];
    const after = [row('1', 'Bottom', '6 in circle'), row('3', 'Lid', '6 1/8 in circle'), row('4', 'Tag', '2 x 3 in')];
    const r = compareRows(before, after, fields);
    expect(r.rows.map((x) => [x.id, x.status])).toEqual([
      ['1', 'changed'],
      ['2', 'removed'],
      ['3', 'same'],
      ['4', 'added'],
    ]);
    expect(r.changed[0]!.changes).toEqual([{ field: 'name', label: 'Name', before: 'Base', after: 'Bottom' }]);
    expect(r.removed[0]!.before).toEqual({ name: 'Wall', size: '19 x 3 in' });
    expect(r.added[0]!.after).toEqual({ name: 'Tag', size: '2 x 3 in' });
    expect(r.unchanged).toBe(1);
  });

  it('a row removed from the top stays at the top', () => {
    const r = compareRows([row('1', 'A', 'x'), row('2', 'B', 'x')], [row('2', 'B', 'x')], fields);
    expect(r.rows.map((x) => [x.id, x.status])).toEqual([
      ['1', 'removed'],
      ['2', 'same'],
    ]);
  });
});

describe('docBlocks', () => {
  it('splits a write-up into labelled blocks: intro, section headings, step titles, photos, tips, live lists', () => {
    const doc = {
      type: 'doc',
      content: [
        { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Round box' }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'A keepsake box.' }] },
        { type: 'supplyList', attrs: { grouped: true } },
        {
          type: 'step',
          content: [
            { type: 'stepTitle', content: [{ type: 'text', text: 'Cut the base' }] },
            { type: 'paragraph', content: [{ type: 'text', text: 'Cut a 6 in circle.' }] },
            { type: 'still', attrs: { stillId: 's1', caption: 'The base', alt: 'A kraft circle on a mat' } },
            { type: 'caution', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Cut away from your hand.' }] }] },
          ],
        },
      ],
    };
    expect(docBlocks(doc)).toEqual([
      { label: 'Title heading', text: 'Round box' },
      { label: 'Introduction', text: 'A keepsake box.' },
      { label: 'Introduction', text: '[The supplies]' },
      { label: 'Step 1 · title', text: 'Cut the base' },
      { label: 'Step 1', text: 'Cut a 6 in circle.' },
      { label: 'Step 1 · photo', text: 'Photo: The base (alt text: A kraft circle on a mat)' },
      { label: 'Step 1 · caution', text: 'Cut away from your hand.' },
    ]);
  });
});
