import { describe, expect, it } from 'vitest';
import { giftBoxDoc } from './test-docs';
import { fitsSchema, sameDoc, withTrailingParagraph } from './same-doc';

describe('sameDoc', () => {
  it('compares as ProseMirror nodes: attribute defaults and key order do not make a difference', () => {
    const a = { type: 'doc', content: [{ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Lid' }] }] };
    const b = { content: [{ content: [{ text: 'Lid', type: 'text' }], attrs: { level: 2 }, type: 'heading' }], type: 'doc' };
    expect(sameDoc(a, b)).toBe(true);
    // The step's attributes default to null in the shared schema (shared/editor/step.ts).
    const bare = { type: 'doc', content: [{ type: 'step', content: [{ type: 'stepTitle' }, { type: 'paragraph' }] }] };
    const full = { type: 'doc', content: [{ type: 'step', attrs: { atMs: null, chapterId: null }, content: [{ type: 'stepTitle' }, { type: 'paragraph' }] }] };
    expect(sameDoc(bare, full)).toBe(true);
  });

  it('ignores the empty paragraphs the editor keeps at the end, and nothing else', () => {
    const doc = giftBoxDoc();
    expect(sameDoc(doc, withTrailingParagraph(doc))).toBe(true);
    const edited = structuredClone(doc);
    edited.content![1]!.content![0]!.text = 'A small box with a wrapped wall!';
    expect(sameDoc(doc, edited)).toBe(false);
  });

  it('never calls an unreadable document the same as anything', () => {
    const broken = { type: 'doc', content: [{ type: 'marquee' }] };
    expect(sameDoc(broken, broken)).toBe(false);
    expect(fitsSchema(broken)).toBe(false);
    expect(fitsSchema(giftBoxDoc())).toBe(true);
  });
});

describe('withTrailingParagraph', () => {
  it('adds one empty paragraph after a document that ends in a step, and leaves one ending in a paragraph alone', () => {
    const doc = giftBoxDoc();
    const out = withTrailingParagraph(doc);
    expect(out.content).toHaveLength(doc.content!.length + 1);
    expect(out.content!.at(-1)).toEqual({ type: 'paragraph' });
    expect(withTrailingParagraph(out)).toBe(out);
  });
});
