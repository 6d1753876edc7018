import { getEditorSchema } from '@shared/editor';
import { EditorState, NodeSelection, TextSelection } from '@tiptap/pm/state';
import { describe, expect, it } from 'vitest';
import { blockInsertPos, stillInsertRange, topLevelInsertRange } from './insert-position';
import { giftBoxDoc, step } from './test-docs';

const schema = getEditorSchema();

describe('topLevelInsertRange', () => {
  it('goes after the step the cursor is in, so a new step never lands inside one', () => {
    const doc = schema.nodeFromJSON(giftBoxDoc());
    let stepPos = 0;
    doc.forEach((n, off) => {
      if (!stepPos && n.type.name === 'step') stepPos = off;
    });
    const s = EditorState.create({ doc, selection: TextSelection.create(doc, stepPos + 3) });
    const stepNode = doc.nodeAt(stepPos)!;
    expect(topLevelInsertRange(s)).toEqual({ from: stepPos + stepNode.nodeSize, to: stepPos + stepNode.nodeSize });
    // What is inserted there fits the schema: doc content '(block | section | callout)+'.
    const inserted = s.tr.insert(stepPos + stepNode.nodeSize, schema.nodeFromJSON(step('New', '')));
    expect(() => inserted.doc.check()).not.toThrow();
  });

  it('takes the place of the empty line the cursor is on', () => {
    const doc = schema.nodeFromJSON({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Intro' }] }, { type: 'paragraph' }] });
    const s = EditorState.create({ doc, selection: TextSelection.create(doc, 8) });
    expect(topLevelInsertRange(s)).toEqual({ from: 7, to: 9 });
  });

  it('goes after a selected top-level node', () => {
    const doc = schema.nodeFromJSON({ type: 'doc', content: [{ type: 'cutList', attrs: { units: 'both' } }, { type: 'paragraph' }] });
    const s = EditorState.create({ doc, selection: NodeSelection.create(doc, 0) });
    expect(topLevelInsertRange(s)).toEqual({ from: 1, to: 1 });
  });
});

describe('blockInsertPos', () => {
  const still = schema.nodes.still!;
  const doc = schema.nodeFromJSON({
    type: 'doc',
    content: [
      {
        type: 'step',
        attrs: { atMs: null, chapterId: null },
        content: [
          { type: 'stepTitle', content: [{ type: 'text', text: 'Glue the lid' }] },
          { type: 'tip', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Use clips.' }] }] },
        ],
      },
    ],
  });
  // Step content is 'stepTitle (paragraph | ... | still | callout)*'; a tip holds only
  // '(paragraph | bulletList | orderedList)+' (shared/editor/step.ts, callouts.ts).
  it('puts a photo asked for in a step title at the top of the step text', () => {
    const s = EditorState.create({ doc, selection: TextSelection.create(doc, 4) });
    const pos = blockInsertPos(s, still);
    expect(pos).toBe(1 + doc.firstChild!.firstChild!.nodeSize);
    expect(() => s.tr.insert(pos, still.create({ src: '/media/stills/a.jpg' })).doc.check()).not.toThrow();
  });
  it('puts it after a tip, which cannot hold one', () => {
    const inTip = 1 + doc.firstChild!.firstChild!.nodeSize + 3;
    const s = EditorState.create({ doc, selection: TextSelection.create(doc, inTip) });
    const pos = blockInsertPos(s, still);
    expect(pos).toBe(doc.firstChild!.nodeSize - 1);
    expect(() => s.tr.insert(pos, still.create({ src: '/media/stills/a.jpg' })).doc.check()).not.toThrow();
  });
});

describe('stillInsertRange', () => {
  const still = schema.nodes.still!;
  const photo = still.create({ src: '/media/stills/a.jpg' });
  const textsOf = (d: ReturnType<typeof schema.nodeFromJSON>) => {
    const out: string[] = [];
    d.descendants((n) => {
      if (n.type.name === 'paragraph') out.push(n.textContent);
    });
    return out;
  };

  it('puts a photo after the paragraph, never inside a word, wherever the cursor is in it', () => {
    const doc = schema.nodeFromJSON(giftBoxDoc());
    let para = -1;
    doc.descendants((n, pos) => {
      if (para < 0 && n.type.name === 'paragraph' && n.textContent === 'Cut two 3 in circles.') para = pos;
    });
    const node = doc.nodeAt(para)!;
    for (const offset of [1, 5, 9, node.content.size]) {
      // "Cu|t", "Cut t|wo", "Cut two |3": the paragraph stays whole and the photo follows it.
      const s = EditorState.create({ doc, selection: TextSelection.create(doc, para + offset) });
      const r = stillInsertRange(s, still);
      expect(r).toEqual({ from: para + node.nodeSize, to: para + node.nodeSize });
      const after = s.tr.replaceWith(r.from, r.to, photo).doc;
      expect(() => after.check()).not.toThrow();
      expect(textsOf(after)).toEqual(textsOf(doc));
      expect(after.nodeAt(r.from)!.type.name).toBe('still');
    }
  });

  it('takes the place of the empty line the cursor is on', () => {
    const doc = schema.nodeFromJSON({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Intro' }] }, { type: 'paragraph' }] });
    const s = EditorState.create({ doc, selection: TextSelection.create(doc, 8) });
    expect(stillInsertRange(s, still)).toEqual({ from: 7, to: 9 });
  });
});
