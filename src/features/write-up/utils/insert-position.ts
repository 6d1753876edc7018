import type { NodeType } from '@tiptap/pm/model';
import type { EditorState } from '@tiptap/pm/state';

/**
 * Where a top-level block (a step, the cut list, the supplies) goes for the current selection:
 * after the top-level block the cursor is in, or in place of it when that block is an empty
 * paragraph (the line the person just made for it). Steps and live lists cannot sit inside a
 * step or a list, so this never splits one.
 */
export function topLevelInsertRange(state: EditorState): { from: number; to: number } {
  const { $from, from, to } = state.selection;
  if ($from.depth === 0) {
    // A node selection of a top-level node, or a gap cursor between two.
    return { from: to, to };
  }
  const block = $from.node(1);
  const start = $from.before(1);
  const end = $from.after(1);
  if (block.type.name === 'paragraph' && block.content.size === 0 && from === to) return { from: start, to: end };
  return { from: end, to: end };
}

/**
 * The nearest place after the cursor where a block of `type` may go: right after the innermost
 * block around the cursor that can be followed by one. A photo asked for in a step title lands
 * at the top of the step's text; in a tip, just after the tip (a tip holds only text and lists).
 */
export function blockInsertPos(state: EditorState, type: NodeType): number {
  const { $from } = state.selection;
  for (let d = $from.depth; d > 0; d--) {
    const parent = $from.node(d - 1);
    const index = $from.index(d - 1) + 1;
    if (parent.canReplaceWith(index, index, type)) return $from.after(d);
  }
  return state.doc.content.size;
}

/**
 * Where "+ Still" puts a photo: in place of the empty line the cursor is on, else after the
 * paragraph (or the innermost block) the cursor is in, so a photo never splits a word or a sentence.
 */
export function stillInsertRange(state: EditorState, type: NodeType): { from: number; to: number } {
  const { $from, empty } = state.selection;
  const d = $from.depth;
  if (empty && d > 0 && $from.parent.type.name === 'paragraph' && $from.parent.content.size === 0) {
    const container = $from.node(d - 1);
    const index = $from.index(d - 1);
    if (container.canReplaceWith(index, index + 1, type)) return { from: $from.before(d), to: $from.after(d) };
  }
  const pos = blockInsertPos(state, type);
  return { from: pos, to: pos };
}
