import type { CreatePieceInput, LengthDto, MentionDto, PieceProposalDto } from '@shared/schemas/piece';
import { formatTimestamp } from '@shared/transcript/timestamp';

const KIND_NAME: Record<MentionDto['kind'], string> = { size: 'Piece', diameter: 'Circle', length: 'Strip', score: 'Piece', range: 'Piece' };

/** A starting name for a piece made from a mention; the crafter renames it in the table. */
export function nameFromMention(m: MentionDto): string {
  return `${KIND_NAME[m.kind]} said at ${formatTimestamp(m.startMs)}`;
}

/**
 * What "Make a piece" does with a mention: a size or a diameter is a whole piece at once;
 * a single length only gives one side, so it opens the add form with the width filled in;
 * a score list is not a piece (it only adds score lines to one), and neither is a range: the
 * crafter picks one of its ends (`pickFromRange`). A count said before it ("three 4 by 6 mats")
 * is the quantity. Lengths sent straight to the server go in their exact stored form; the form
 * shows the crafter's written form.
 */
export function makeFromMention(m: MentionDto): { kind: 'create'; piece: CreatePieceInput } | { kind: 'prefill'; piece: Partial<CreatePieceInput> } | null {
  const [a, b] = m.values;
  if (!a) return null;
  const said = { name: nameFromMention(m), saidAtMs: m.startMs, ...(m.count ? { quantity: m.count } : {}) };
  if (m.kind === 'size' && b)
    return { kind: 'create', piece: { ...said, shape: 'rect', width: a.value, height: b.value, notes: m.approx ? `Said as “${m.text}”` : '' } };
  if (m.kind === 'diameter') return { kind: 'create', piece: { ...said, shape: 'circle', width: a.value, notes: m.approx ? `Said as “${m.text}”` : '' } };
  if (m.kind === 'length') return { kind: 'prefill', piece: { ...said, shape: 'rect', width: a.display } };
  return null;
}

/** A range's end the crafter chose, in the add form with the range kept in the notes; never added unseen. */
export function pickFromRange(m: MentionDto, end: LengthDto): Partial<CreatePieceInput> {
  return {
    name: nameFromMention(m),
    saidAtMs: m.startMs,
    shape: 'rect',
    width: end.display,
    notes: `Said as a range: “${m.text}”`,
    ...(m.count ? { quantity: m.count } : {}),
  };
}

/** A proposed piece in a line: "“Wall strip”, kraft cardstock, × 2: 10 9/16 in × 2 1/2 in, score at 1/2 in". */
export function proposalSummary(p: PieceProposalDto): string {
  const size = p.shape === 'circle' ? `a circle ${p.width.display} across` : `${p.width.display} × ${p.height.display}`;
  const parts = [`“${p.name}”`, p.material || 'material to pick'];
  if (p.quantity > 1) parts.push(`× ${p.quantity}`);
  const score = p.scoreLines.length > 0 ? `, score at ${p.scoreLines.map((s) => s.at.display).join(', ')}` : '';
  return `${parts.join(', ')}: ${size}${score}`;
}
