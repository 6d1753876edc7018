import { describe, expect, it } from 'vitest';
import type { JSONContent } from '@tiptap/core';
import { listNumbers, reviewChecklist, type ChecklistInput } from './checklist';

const step = (alts: string[]): JSONContent => ({
  type: 'step',
  content: [{ type: 'stepTitle' }, ...alts.map((alt) => ({ type: 'still', attrs: { src: '/media/a.jpg', alt } }))],
});
const base: ChecklistInput = {
  doc: { type: 'doc', content: [step(['Base circle']), step(['Wall strip scored'])] },
  sponsoredLinks: 0,
  disclosureText: 'Some links are sponsored.',
  pieces: 3,
  failedChecks: [],
  chapterStarts: [0, 12_000, 40_000],
  dueDate: '2027-01-20',
  sentOn: null,
  today: '2027-01-15',
  openComments: 0,
};
const item = (i: Partial<ChecklistInput>, key: string) => reviewChecklist({ ...base, ...i }).items.find((x) => x.key === key)!;

describe('review checklist', () => {
  it('all met: every applicable item passes', () => {
    const r = reviewChecklist(base);
    expect(r.items.map((x) => [x.key, x.ok])).toEqual([
      ['stepPhotos', true],
      ['disclosure', null],
      ['cutList', true],
      ['chapters', true],
      ['dueDate', true],
    ]);
    expect([r.passed, r.total]).toEqual([4, 4]);
  });

  it('every step needs a photo, and every photo alt text (WCAG 2.2, 1.1.1 Non-text Content)', () => {
    expect(item({ doc: { type: 'doc', content: [step([]), step(['x']), step([])] } }, 'stepPhotos')).toMatchObject({
      ok: false,
      detail: 'Steps 1 and 3 have no photo',
    });
    expect(item({ doc: { type: 'doc', content: [step(['x', ' '])] } }, 'stepPhotos')).toMatchObject({
      ok: false,
      detail: 'Step 1 has a photo without alt text',
    });
    expect(item({ doc: { type: 'doc', content: [{ type: 'paragraph' }] } }, 'stepPhotos')).toMatchObject({
      ok: false,
      detail: 'The write-up has no steps yet',
    });
  });

  it('a sponsored link needs the disclosure (FTC Endorsement Guides, 16 CFR 255.5)', () => {
    expect(item({ sponsoredLinks: 2 }, 'disclosure').ok).toBe(true);
    expect(item({ sponsoredLinks: 2, disclosureText: '  ' }, 'disclosure')).toMatchObject({
      ok: false,
      detail: '2 sponsored links but the disclosure is blank',
    });
  });

  it('any failed check of the cut list fails the item, naming the pieces', () => {
    const r = item({ failedChecks: [{ pieceName: 'Lid', reason: '3.3 in is off the 1/16 in ruler' }] }, 'cutList');
    expect(r).toMatchObject({ ok: false, detail: '1 failed check: Lid: 3.3 in is off the 1/16 in ruler' });
    expect(item({ pieces: 0 }, 'cutList').ok).toBeNull();
  });

  it('chapters start at 0:00 (from memory, a common video-platform rule, REFERENCES.md)', () => {
    expect(item({ chapterStarts: [3000, 0] }, 'chapters').ok).toBe(true);
    expect(item({ chapterStarts: [1000] }, 'chapters').ok).toBe(false);
    expect(item({ chapterStarts: [] }, 'chapters')).toMatchObject({ ok: false, detail: 'No chapters marked yet' });
    expect(item({ chapterStarts: null }, 'chapters').ok).toBeNull();
  });

  it('the due date is met when it was sent for review on or before it, or is not past yet', () => {
    expect(item({ today: '2027-01-20' }, 'dueDate')).toMatchObject({ ok: true, detail: 'Due today (2027-01-20)' });
    expect(item({ today: '2027-01-23' }, 'dueDate')).toMatchObject({ ok: false, detail: 'Was due 2027-01-20, 3 days ago' });
    expect(item({ today: '2027-01-23', sentOn: '2027-01-19' }, 'dueDate')).toMatchObject({ ok: true, detail: 'Sent for review on 2027-01-19, due 2027-01-20' });
    expect(item({ sentOn: '2027-01-21' }, 'dueDate').ok).toBe(false);
    expect(item({ dueDate: null }, 'dueDate').ok).toBeNull();
  });

  it('lists numbers as a person writes them', () => {
    expect([listNumbers([2]), listNumbers([2, 4]), listNumbers([2, 4, 5])]).toEqual(['2', '2 and 4', '2, 4 and 5']);
  });
});
