import { getEditorSchema, plainText } from '@shared/editor';
import { EditorState, NodeSelection, TextSelection } from '@tiptap/pm/state';
import { describe, expect, it } from 'vitest';
import { moveStep, stepAroundSelection, stepNumberAt, stepsOf } from './step-moves';
import { giftBoxDoc } from './test-docs';

const stateOf = () => EditorState.create({ doc: getEditorSchema().nodeFromJSON(giftBoxDoc()) });
const titles = (s: EditorState) => stepsOf(s.doc).map((x) => plainText(x.node.firstChild!.toJSON()));
const topLevel = (s: EditorState) => {
  const out: string[] = [];
  s.doc.forEach((n) => out.push(n.type.name === 'step' ? `step:${plainText(n.firstChild!.toJSON())}` : n.type.name));
  return out;
};

// A step's number is its place among the document's steps (shared/editor/types.ts, StepAttrs).
describe('step numbers', () => {
  it('count steps only, in document order, skipping the paragraph between them', () => {
    const s = stateOf();
    const steps = stepsOf(s.doc);
    expect(steps.map((x) => stepNumberAt(s.doc, x.pos))).toEqual([1, 2, 3]);
    expect(stepNumberAt(s.doc, 0)).toBeNull();
  });
});

describe('moveStep', () => {
  it('swaps with the previous step while the paragraph between them keeps its place', () => {
    const s = stateOf();
    const second = stepsOf(s.doc)[1]!;
    const moved = moveStep(s, second.pos, -1)!;
    const next = s.apply(moved.tr);
    expect(topLevel(next)).toEqual(['heading', 'paragraph', 'step:Score the wall', 'paragraph', 'step:Cut the circles', 'step:Glue the tabs']);
    expect(stepNumberAt(next.doc, moved.pos)).toBe(1);
    // The step keeps its time in the video.
    expect(next.doc.nodeAt(moved.pos)!.attrs.atMs).toBe(95_000);
  });

  it('moves down by one, and reports where the step now starts', () => {
    const s = stateOf();
    const first = stepsOf(s.doc)[0]!;
    const moved = moveStep(s, first.pos, 1)!;
    const next = s.apply(moved.tr);
    expect(titles(next)).toEqual(['Score the wall', 'Cut the circles', 'Glue the tabs']);
    expect(plainText(next.doc.nodeAt(moved.pos)!.firstChild!.toJSON())).toBe('Cut the circles');
  });

  it('does nothing past either end', () => {
    const s = stateOf();
    const steps = stepsOf(s.doc);
    expect(moveStep(s, steps[0]!.pos, -1)).toBeNull();
    expect(moveStep(s, steps[2]!.pos, 1)).toBeNull();
    expect(moveStep(s, 0, 1)).toBeNull();
  });

  it('carries the cursor along, at the same place in the moved step', () => {
    let s = stateOf();
    const third = stepsOf(s.doc)[2]!;
    // Inside "Glue the tabs": after "Glue".
    const at = third.pos + 2 + 'Glue'.length;
    s = s.apply(s.tr.setSelection(TextSelection.create(s.doc, at)));
    expect(stepAroundSelection(s)).toBe(third.pos);
    const moved = moveStep(s, third.pos, -1)!;
    const next = s.apply(moved.tr);
    const { $from } = next.selection;
    expect($from.parent.textContent).toBe('Glue the tabs');
    expect($from.parentOffset).toBe('Glue'.length);
    expect(stepAroundSelection(next)).toBe(moved.pos);
  });

  it('finds the step of a node selection on the step itself, and none outside steps', () => {
    let s = stateOf();
    const first = stepsOf(s.doc)[0]!;
    s = s.apply(s.tr.setSelection(NodeSelection.create(s.doc, first.pos)));
    expect(stepAroundSelection(s)).toBe(first.pos);
    s = s.apply(s.tr.setSelection(TextSelection.create(s.doc, 2)));
    expect(stepAroundSelection(s)).toBeNull();
  });
});
