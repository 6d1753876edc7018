import type { Node as PMNode } from '@tiptap/pm/model';
import type { EditorState } from '@tiptap/pm/state';

/** A step as the comments beside the write-up name it. */
export type StepRef = { id: string; number: number; title: string };
/** Words selected within one step, to comment on. */
export type PassageRef = { stepId: string; stepNumber: number; quote: string };

/**
 * What the page may listen to while the write-up is open, so comments can sit beside it without
 * the two features knowing each other: the steps (ids, numbers, titles), the words selected in
 * one step, a step's "Comment" button, and a way to save pending edits before a comment points at
 * them.
 */
export type WriteUpReviewHooks = {
  onSteps?: (steps: StepRef[]) => void;
  onSelection?: (passage: PassageRef | null) => void;
  onCommentOn?: (stepId: string) => void;
  /** Filled by the workspace: saves what is typed now; false when it could not. */
  flush?: { current: (() => Promise<boolean>) | null };
};

/** The passage quoted is kept short: the server takes at most 500 characters. */
export const MAX_QUOTE = 500;

/** The document's steps with their ids, numbers and titles. */
export function stepRefs(doc: PMNode): StepRef[] {
  const out: StepRef[] = [];
  doc.forEach((node) => {
    if (node.type.name !== 'step') return;
    const id = node.attrs.id as string | null;
    if (id) out.push({ id, number: out.length + 1, title: node.firstChild?.textContent.trim() ?? '' });
  });
  return out;
}

/** The words selected, when they lie within one step (null for none, or a selection across steps). */
export function selectedPassage(state: EditorState): PassageRef | null {
  const { from, to, $from, $to } = state.selection;
  if (from === to) return null;
  const stepOf = (depthNode: typeof $from) => {
    for (let d = depthNode.depth; d > 0; d--) if (depthNode.node(d).type.name === 'step') return { node: depthNode.node(d), pos: depthNode.before(d) };
    return null;
  };
  const a = stepOf($from);
  const b = stepOf($to);
  if (!a || !b || a.pos !== b.pos || !a.node.attrs.id) return null;
  const quote = state.doc.textBetween(from, to, ' ', ' ').replace(/\s+/g, ' ').trim();
  if (!quote) return null;
  return {
    stepId: a.node.attrs.id as string,
    stepNumber: stepRefs(state.doc).findIndex((s) => s.id === a.node.attrs.id) + 1,
    quote: quote.slice(0, MAX_QUOTE),
  };
}
