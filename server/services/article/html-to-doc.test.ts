import type { JSONContent } from '@tiptap/core';
import { generateHTML } from '@tiptap/html/server';
import { describe, expect, it } from 'vitest';
import { editorExtensions } from '@shared/editor/extensions';
import { generateDraft } from '@shared/draft/generate-draft';
import { htmlToDoc } from './html-to-doc';

const DOC: JSONContent = {
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Round gift box' }] },
    { type: 'supplyList', attrs: { grouped: false } },
    { type: 'cutList', attrs: { units: 'mm' } },
    {
      type: 'step',
      attrs: { id: 's0123456789ab', atMs: 65_000, chapterId: 'ch-2' },
      content: [
        { type: 'stepTitle', content: [{ type: 'text', text: 'Wrap the wall' }] },
        {
          type: 'paragraph',
          content: [
            { type: 'text', text: 'Wrap the strip ' },
            { type: 'text', text: 'tightly', marks: [{ type: 'italic' }] },
            { type: 'text', text: '.' },
          ],
        },
        {
          type: 'still',
          attrs: { stillId: 'st-1', src: '/media/stills/st-1.jpg', alt: 'The wall wrapped round', caption: 'Wrapped', width: 640, height: 360 },
        },
        { type: 'tip', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Pre-curl the strip.' }] }] },
      ],
    },
    { type: 'caution', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Sharp blade.' }] }] },
  ],
};

describe('htmlToDoc', () => {
  it('reads back what the editor writes (renderHTML and parseHTML of every node agree, headless)', () => {
    const html = generateHTML(DOC, editorExtensions);
    expect(html).toContain('<section data-step-id="s0123456789ab" data-at-ms="65000" data-chapter-id="ch-2" data-type="step">');
    const back = htmlToDoc(html);
    // Links get the schema's default attributes; nothing else changes.
    expect(back).toEqual(DOC);
  });

  it('round-trips a generated draft through the editor HTML', () => {
    const draft = generateDraft({
      title: 'Hexagon treat box',
      chapters: [
        { id: 'a', title: 'Cut', startMs: 0 },
        { id: 'b', title: 'Fold', startMs: 9000 },
      ],
      cues: [
        { startMs: 0, endMs: 2000, text: 'cut it four by six' },
        { startMs: 9000, endMs: 12_000, text: 'fold along the scores' },
      ],
      stills: [{ id: 's', atMs: 9500, url: '/media/stills/s.jpg', caption: 'Folding' }],
    });
    expect(htmlToDoc(generateHTML(draft, editorExtensions))).toEqual(draft);
  });

  it('turns ordinary pasted HTML into our nodes: images become stills, foreign markup becomes text', () => {
    const doc = htmlToDoc(
      '<div><h4>Lid</h4><p style="color:red">Cut a <span class="x">circle</span>.</p><img src="https://cdn.example/lid.jpg" alt="Lid" width="300"><table><tr><td>Lid</td><td>2</td></tr></table></div>',
    );
    expect(doc.content!.map((n) => n.type)).toEqual(['paragraph', 'paragraph', 'still', 'paragraph']);
    expect(doc.content![1]).toEqual({ type: 'paragraph', content: [{ type: 'text', text: 'Cut a circle.' }] });
    expect(doc.content![2]!.attrs).toMatchObject({ src: 'https://cdn.example/lid.jpg', alt: 'Lid', width: 300 });
  });

  it('gives an empty document for empty input', () => {
    expect(htmlToDoc('')).toEqual({ type: 'doc', content: [{ type: 'paragraph' }] });
  });
});
