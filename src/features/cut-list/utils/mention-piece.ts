import type { CreatePieceInput } from '@shared/schemas/piece';
import { formatTimestamp } from '@shared/transcript/timestamp';
import type { MentionDto } from '../api/types';

const KIND_NAME: Record<MentionDto['kind'], string> = { size: 'Piece', diameter: 'Circle', length: 'Strip', score: 'Piece' };

/** A starting name for a piece made from a mention; the crafter renames it in the table. */
export function nameFromMention(m: MentionDto): string {
  return `${KIND_NAME[m.kind]} said at ${formatTimestamp(m.startMs)}`;
}

/**
 * What "Make a piece" does with a mention: a size or a diameter is a whole piece at once;
 * a single length only gives one side, so it opens the add form with the width filled in;
 * a score list is not a piece (it only adds score lines to one). Lengths sent straight to the
 * server go in their exact stored form; the form shows the crafter's written form.
 */
export function makeFromMention(m: MentionDto): { kind: 'create'; piece: CreatePieceInput } | { kind: 'prefill'; piece: Partial<CreatePieceInput> } | null {
  const [a, b] = m.values;
  if (!a) return null;
  const said = { name: nameFromMention(m), saidAtMs: m.startMs };
  if (m.kind === 'size' && b) return { kind: 'create', piece: { ...said, shape: 'rect', width: a.value, height: b.value, notes: m.approx ? `Said as “${m.text}”` : '' } };
  if (m.kind === 'diameter') return { kind: 'create', piece: { ...said, shape: 'circle', width: a.value, notes: m.approx ? `Said as “${m.text}”` : '' } };
  if (m.kind === 'length') return { kind: 'prefill', piece: { ...said, shape: 'rect', width: a.display } };
  return null;
}

/** The score lines a mention adds to a piece: every value of a score list, or the one length. */
export function scoreLinesFromMention(m: MentionDto, axis: 'width' | 'height'): { axis: 'width' | 'height'; at: string }[] {
  if (m.kind !== 'score' && m.kind !== 'length') return [];
  return m.values.map((v) => ({ axis, at: v.value }));
}
