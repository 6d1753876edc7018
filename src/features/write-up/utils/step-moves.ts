import type { Node as PMNode } from '@tiptap/pm/model';
import { NodeSelection, TextSelection, type EditorState, type Transaction } from '@tiptap/pm/state';

type Placed = { node: PMNode; pos: number };

/** The document's steps with their positions (steps only sit at the top level). */
export function stepsOf(doc: PMNode): Placed[] {
  const out: Placed[] = [];
  doc.forEach((node, offset) => {
    if (node.type.name === 'step') out.push({ node, pos: offset });
  });
  return out;
}

/** The 1-based number of the step at `pos` (its place among the steps), or null when none starts there. */
export function stepNumberAt(doc: PMNode, pos: number): number | null {
  let n = 0;
  let found: number | null = null;
  doc.forEach((node, offset) => {
    if (found !== null || node.type.name !== 'step') return;
    n++;
    if (offset === pos) found = n;
  });
  return found;
}

/** Where the step around the selection starts, or null when the selection is not in a step. */
export function stepAroundSelection(state: EditorState): number | null {
  const { $from } = state.selection;
  for (let d = $from.depth; d > 0; d--) if ($from.node(d).type.name === 'step') return $from.before(d);
  // A node selection of the step itself.
  const node = state.doc.nodeAt(state.selection.from);
  return node?.type.name === 'step' && state.selection.to === state.selection.from + node.nodeSize ? state.selection.from : null;
}

/**
 * Swaps the step at `pos` with the step before (-1) or after (+1) it. Whatever sits between the
 * two steps (an intro paragraph, a cut list) keeps its place, so "move up" changes the step's
 * number by exactly one. A selection inside the moved step moves with it. Null when there is no
 * step there or nothing to swap with.
 */
export function moveStep(state: EditorState, pos: number, dir: -1 | 1): { tr: Transaction; pos: number } | null {
  const steps = stepsOf(state.doc);
  const i = steps.findIndex((s) => s.pos === pos);
  const other = steps[i + dir];
  if (i < 0 || !other) return null;
  const me = steps[i]!;
  const [first, second] = dir < 0 ? [other, me] : [me, other];
  const tr = state.tr;
  // The later one first, so the earlier position stays valid.
  tr.replaceWith(second.pos, second.pos + second.node.nodeSize, first.node);
  tr.replaceWith(first.pos, first.pos + first.node.nodeSize, second.node);
  const newPos = dir < 0 ? other.pos : other.pos + other.node.nodeSize - me.node.nodeSize;
  const { from, to } = state.selection;
  if (from > me.pos && to < me.pos + me.node.nodeSize) {
    const shift = newPos - me.pos;
    const sel = state.selection;
    tr.setSelection(
      sel instanceof NodeSelection ? NodeSelection.create(tr.doc, sel.from + shift) : TextSelection.create(tr.doc, sel.anchor + shift, sel.head + shift),
    );
  }
  return { tr: tr.scrollIntoView(), pos: newPos };
}
