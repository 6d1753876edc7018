import type { JSONContent } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { generateDraft } from '../draft/generate-draft';
import { validateDoc } from './validate-doc';

const step = (title: string, body: JSONContent[] = [], attrs: Record<string, unknown> = { atMs: 1000, chapterId: 'ch-1' }): JSONContent => ({
  type: 'step',
  attrs,
  content: [{ type: 'stepTitle', content: [{ type: 'text', text: title }] }, ...body],
});
const para = (text: string, marks?: JSONContent['marks']): JSONContent => ({
  type: 'paragraph',
  content: [{ type: 'text', text, ...(marks ? { marks } : {}) }],
});
const doc = (...content: JSONContent[]): JSONContent => ({ type: 'doc', content });

function refused(json: unknown): string {
  const r = validateDoc(json);
  expect(r.ok).toBe(false);
  return r.ok ? '' : r.error;
}

describe('validateDoc accepts', () => {
  it('a generated draft, unchanged', () => {
    const draft = generateDraft({
      title: 'Gatefold birthday card',
      chapters: [
        { id: 'c-1', title: 'Score the card base', startMs: 0 },
        { id: 'c-2', title: 'Add the mats', startMs: 42_000 },
      ],
      cues: [
        { startMs: 1000, endMs: 4000, text: 'score the base at two and a quarter and at six and three quarters' },
        { startMs: 43_000, endMs: 47_000, text: 'um the mats are four by five and a half' },
      ],
      stills: [{ id: 's-1', atMs: 2000, url: '/media/stills/s-1.jpg', width: 1280, height: 720 }],
    });
    const r = validateDoc(draft);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.doc).toEqual(draft);
  });

  it('every custom node with its attributes, and fills defaults', () => {
    const r = validateDoc(
      doc(
        { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Round gift box' }] },
        { type: 'supplyList' },
        { type: 'cutList', attrs: { units: 'mm' } },
        step('Wrap the wall', [
          para('Wrap the strip.'),
          { type: 'still', attrs: { src: '/media/stills/a.jpg', alt: 'The strip around the base' } },
          { type: 'tip', content: [para('Go slowly.')] },
        ]),
        { type: 'caution', content: [para('Mind the blade.')] },
      ),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.content![1]).toEqual({ type: 'supplyList', attrs: { grouped: true } });
    expect(r.doc.content![3]!.content![2]!.attrs).toEqual({
      stillId: null,
      src: '/media/stills/a.jpg',
      alt: 'The strip around the base',
      caption: '',
      width: null,
      height: null,
    });
  });

  it('drops attributes the schema does not know (event handlers included)', () => {
    const r = validateDoc(doc({ type: 'paragraph', attrs: { onclick: 'alert(1)' }, content: [{ type: 'text', text: 'Hi' }] }));
    expect(r).toEqual({ ok: true, doc: doc(para('Hi')) });
  });
});

describe('validateDoc refuses', () => {
  it('what is not a document', () => {
    expect(refused(null)).toMatch(/type "doc"/);
    expect(refused([])).toMatch(/type "doc"/);
    expect(refused({ type: 'paragraph' })).toMatch(/type "doc"/);
  });

  it('unknown node types and marks, naming where', () => {
    expect(refused(doc(para('a'), { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }))).toMatch(/^\/content\/1: unknown node type "script"/);
    expect(refused(doc(para('a', [{ type: 'style' }])))).toMatch(/^\/content\/0\/content\/0\/marks\/0: unknown mark "style"/);
  });

  it('content where the schema does not allow it (ProseMirror check)', () => {
    expect(refused(doc({ type: 'text', text: 'loose text' }))).toMatch(/schema/);
    expect(refused(doc({ type: 'bulletList', content: [{ type: 'listItem', content: [step('nested')] }] }))).toMatch(/schema/);
    expect(refused(doc({ type: 'step', attrs: {}, content: [para('no title first')] }))).toMatch(/schema/);
    expect(refused(doc({ type: 'tip', content: [{ type: 'tip', content: [para('x')] }] }))).toMatch(/schema/);
    expect(refused(doc({ type: 'stepTitle', content: [{ type: 'text', text: 'x' }] }))).toMatch(/schema/);
    expect(refused({ type: 'doc', content: [] })).toMatch(/schema/);
    expect(refused(doc({ type: 'paragraph', content: [{ type: 'text', text: '' }] }))).toMatch(/non-empty text/);
  });

  it('marks a node cannot carry (step titles are plain text)', () => {
    const boldTitle = { type: 'step', content: [{ type: 'stepTitle', content: [{ type: 'text', text: 'Bold?', marks: [{ type: 'bold' }] }] }] };
    expect(refused(doc(boldTitle))).toMatch(/schema/);
  });

  it('bad attribute values', () => {
    expect(refused(doc({ type: 'heading', attrs: { level: 7 }, content: [{ type: 'text', text: 'x' }] }))).toMatch(/heading level/);
    expect(refused(doc({ type: 'heading', attrs: { level: '1 onmouseover=alert(1)' }, content: [{ type: 'text', text: 'x' }] }))).toMatch(/heading level/);
    expect(refused(doc(step('x', [], { atMs: '1);alert(1', chapterId: null })))).toMatch(/atMs/);
    expect(refused(doc(step('x', [], { atMs: -5, chapterId: null })))).toMatch(/atMs/);
    expect(refused(doc(step('x', [], { atMs: 0, chapterId: '"><script>' })))).toMatch(/chapterId/);
    expect(refused(doc({ type: 'cutList', attrs: { units: '"><script>alert(1)</script>' } }))).toMatch(/units/);
    expect(refused(doc({ type: 'supplyList', attrs: { grouped: 'yes' } }))).toMatch(/grouped/);
    expect(refused(doc({ type: 'still', attrs: { src: '/media/a.jpg', width: 1.5 } }))).toMatch(/width/);
    expect(refused(doc({ type: 'orderedList', attrs: { start: 'x' }, content: [{ type: 'listItem', content: [para('a')] }] }))).toMatch(/start/);
  });

  it('unsafe addresses', () => {
    expect(refused(doc(para('click', [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }])))).toMatch(/link address not allowed/);
    expect(refused(doc(para('click', [{ type: 'link', attrs: { href: 'https://shop.example', class: 'x' } }])))).toMatch(/class/);
    expect(refused(doc({ type: 'still', attrs: { src: 'data:image/svg+xml,<svg onload=alert(1)>' } }))).toMatch(/image address not allowed/);
  });

  it('documents nested too deep to walk safely', () => {
    let inner: JSONContent = para('deep');
    for (let i = 0; i < 60; i++) inner = { type: 'blockquote', content: [inner] };
    expect(refused(doc(inner))).toMatch(/deeper than/);
  });
});

describe('validateDoc with strip', () => {
  it('drops unsafe links (keeping the words), unsafe stills and unknown nodes', () => {
    const r = validateDoc(
      doc(
        para('click', [{ type: 'link', attrs: { href: 'JAVASCRIPT:alert(1)' } }, { type: 'bold' }]),
        { type: 'still', attrs: { src: 'javascript:alert(1)' } },
        { type: 'iframe', attrs: { src: 'https://evil.example' } },
        { type: 'heading', attrs: { level: 9 }, content: [{ type: 'text', text: 'Lid' }] },
      ),
      { strip: true },
    );
    expect(r).toEqual({
      ok: true,
      doc: doc(para('click', [{ type: 'bold' }]), { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Lid' }] }),
    });
  });
});
