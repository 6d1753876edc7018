import type { Editor, JSONContent } from '@tiptap/core';
import type { StillAttrs } from '@shared/editor';
import { stillInsertRange, topLevelInsertRange } from './insert-position';
import { moveStep, stepAroundSelection } from './step-moves';

const EMPTY_STEP: JSONContent = { type: 'step', attrs: { atMs: null, chapterId: null }, content: [{ type: 'stepTitle' }, { type: 'paragraph' }] };

/** Adds an empty step after the block (or step) the cursor is in and puts the cursor in its title. */
export function insertStepHere(editor: Editor): boolean {
  const range = topLevelInsertRange(editor.state);
  return editor
    .chain()
    .focus()
    .insertContentAt(range, EMPTY_STEP)
    .setTextSelection(range.from + 2)
    .scrollIntoView()
    .run();
}

/** Adds a live list (the cut list or the supplies) at the top level, after the cursor's block. */
export function insertLiveList(editor: Editor, type: 'cutList' | 'supplyList'): boolean {
  const range = topLevelInsertRange(editor.state);
  const attrs = type === 'cutList' ? { units: 'both' } : { grouped: true };
  return editor.chain().focus().insertContentAt(range, { type, attrs }).scrollIntoView().run();
}

/** Adds a photo after the cursor's paragraph (in place of it when it is an empty line); see stillInsertRange. */
export function insertStillHere(editor: Editor, attrs: StillAttrs): boolean {
  const range = stillInsertRange(editor.state, editor.state.schema.nodes.still!);
  return editor.chain().focus().insertContentAt(range, { type: 'still', attrs }).scrollIntoView().run();
}

/** Moves the step holding the cursor up or down past its neighbouring step (Alt+↑ / Alt+↓). */
export function moveStepAtCursor(editor: Editor, dir: -1 | 1): boolean {
  const pos = stepAroundSelection(editor.state);
  if (pos === null) return false;
  const moved = moveStep(editor.state, pos, dir);
  // Handled even at either end, so the key does not fall through to moving the cursor.
  if (moved) editor.view.dispatch(moved.tr);
  return true;
}

/**
 * Enter in a step title goes on to the step's text instead of splitting the title (a step has one):
 * into the empty line after the title if there is one, else onto a new one.
 */
export function enterFromStepTitle(editor: Editor): boolean {
  const { $from } = editor.state.selection;
  if ($from.parent.type.name !== 'stepTitle') return false;
  const step = $from.node($from.depth - 1);
  const afterTitle = $from.after();
  const next = step.childCount > 1 ? step.child(1) : null;
  if (next?.type.name === 'paragraph' && next.content.size === 0)
    return editor
      .chain()
      .setTextSelection(afterTitle + 1)
      .scrollIntoView()
      .run();
  return editor
    .chain()
    .insertContentAt(afterTitle, { type: 'paragraph' })
    .setTextSelection(afterTitle + 1)
    .scrollIntoView()
    .run();
}
