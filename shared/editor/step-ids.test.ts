// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { Editor, type JSONContent } from '@tiptap/core';
import { editorExtensions } from './extensions';
import { ensureStepIds, newStepId, StepIds, stepsOf } from './step-ids';
import { validateDoc } from './validate-doc';

const step = (title: string, body = 'Words.', id?: string): JSONContent => ({
  type: 'step',
  attrs: id ? { id } : {},
  content: [
    { type: 'stepTitle', content: [{ type: 'text', text: title }] },
    { type: 'paragraph', content: [{ type: 'text', text: body }] },
  ],
});
const doc = (...content: JSONContent[]): JSONContent => ({ type: 'doc', content });
const ids = (d: JSONContent) => stepsOf(d).map((s) => s.id);

describe('step ids', () => {
  it('makes short ids the document schema accepts', () => {
    const a = newStepId();
    expect(a).toMatch(/^s[0-9a-f]{12}$/);
    expect(newStepId()).not.toBe(a);
    expect(validateDoc(ensureStepIds(doc(step('Cut')))).ok).toBe(true);
  });

  it('fills missing ids, gives a copied step a fresh one and leaves a complete document as it is', () => {
    const whole = doc(step('A', 'x', 'sa'), step('B', 'y', 'sb'));
    expect(ensureStepIds(whole)).toBe(whole);
    const out = ensureStepIds(doc(step('A', 'x', 'sa'), step('A copy', 'x', 'sa'), step('New')));
    const [a, b, c] = ids(out);
    expect(a).toBe('sa');
    expect(b).not.toBe('sa');
    expect(c).toMatch(/^s[0-9a-f]{12}$/);
  });

  it('a step sent without an id keeps the previous id of the step with its title, else of the step in its place', () => {
    const before = doc(step('Cut the base', 'x', 'scut'), step('Score the wall', 'y', 'sscore'), step('Glue', 'z', 'sglue'));
    // Reordered and one retitled: titles match first, the retitled step takes the free id in its place.
    const after = ensureStepIds(doc(step('Score the wall'), step('Cut the base'), step('Glue it down')), before);
    expect(ids(after)).toEqual(['sscore', 'scut', 'sglue']);
    // An id already in use by the new document is never reused.
    const taken = ensureStepIds(doc(step('Glue', 'z', 'sscore'), step('Other')), before);
    expect(ids(taken)[0]).toBe('sscore');
    expect(ids(taken)[1]).not.toBe('sscore');
  });

  it('reads each step’s number, title and text', () => {
    expect(stepsOf(doc({ type: 'paragraph' }, step('Cut', 'Cut the base.', 'sa'), step('Fold', 'Fold it.', 'sb')))).toEqual([
      { id: 'sa', number: 1, title: 'Cut', text: 'Cut\nCut the base.' },
      { id: 'sb', number: 2, title: 'Fold', text: 'Fold\nFold it.' },
    ]);
  });

  it('the editor plugin gives new and pasted steps ids in the same update', () => {
    const e = new Editor({ extensions: [...editorExtensions, StepIds], content: doc(step('A', 'x', 'sa')) });
    e.commands.insertContentAt(e.state.doc.content.size, [step('A again', 'x', 'sa'), step('Fresh')]);
    const got = ids(e.getJSON());
    expect(got[0]).toBe('sa');
    expect(new Set(got).size).toBe(3);
    expect(got.every((id) => typeof id === 'string' && /^s/.test(id))).toBe(true);
    e.destroy();
  });
});
