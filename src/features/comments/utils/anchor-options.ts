import type { CommentAnchor } from '@shared/schemas/comment';

export type StepOption = { id: string; number: number; title: string };
export type PassageOption = { stepId: string; stepNumber: number; quote: string };
export type NamedOption = { id: string; label: string };

/** The "About" choice as a select's value: "", "passage", "step:<id>", "piece:<id>", "still:<id>". */
export type AboutValue = string;

const short = (s: string, n = 48) => (s.length > n ? `${s.slice(0, n - 1)}…` : s);

export const stepOptionLabel = (s: StepOption) => `Step ${s.number}${s.title ? `: ${short(s.title)}` : ''}`;
export const passageLabel = (p: PassageOption) => `Selected words in step ${p.stepNumber}: “${short(p.quote, 40)}”`;

/** The anchor a choice stands for; null for the whole tutorial (or a choice no longer offered). */
export function anchorFor(value: AboutValue, passage: PassageOption | null): CommentAnchor | null {
  if (value === 'passage') return passage ? { stepId: passage.stepId, quote: passage.quote } : null;
  const [kind, id] = value.split(':');
  if (!id) return null;
  if (kind === 'step') return { stepId: id };
  if (kind === 'piece') return { pieceId: id };
  if (kind === 'still') return { stillId: id };
  return null;
}

/** Whether a choice is still on offer (a step deleted or the selection gone makes it fall back to the whole tutorial). */
export function isOffered(value: AboutValue, o: { steps: StepOption[]; pieces: NamedOption[]; stills: NamedOption[]; passage: PassageOption | null }): boolean {
  if (value === '') return true;
  if (value === 'passage') return o.passage !== null;
  const [kind, id] = value.split(':');
  const list = kind === 'step' ? o.steps : kind === 'piece' ? o.pieces : kind === 'still' ? o.stills : [];
  return list.some((x) => x.id === id);
}
