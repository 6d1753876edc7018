import { formatLength, formatMm, inchesNumber, mmNumber, serializeLength, type Check, type Length, type Piece } from '@shared/measure';
import { pathData, pieceExtent, shapeOutline, shapeSummary } from '@shared/geometry';
import type {
  ChecksDto,
  CutListDto,
  LengthDto,
  MadePiecesDto,
  MaterialDto,
  MaterialKind,
  MentionsDto,
  PieceCheckDto,
  PieceDto,
  PieceProposalDto,
  ShapeParamsDto,
} from '@shared/schemas/piece';
import type { PieceProposal } from '@shared/mentions/propose';
import type { Material, Tutorial } from '../models';
import type { TutorialAbilities } from '../policies';
import { stockOf, toGoThrough, type CutList, type MadePieces, type TutorialMentions } from '../services/cut-list';

/** A length for the API: exact stored form, numbers for drawing, and the words a crafter writes. */
export function lengthDto(l: Length): LengthDto {
  return { value: serializeLength(l), inches: inchesNumber(l), mm: mmNumber(l), display: formatLength(l), mmDisplay: formatMm(l) };
}

const presentCheck = (c: Check): PieceCheckDto => ({
  code: c.code,
  severity: c.severity,
  reason: c.reason,
  field: c.field ?? null,
  nearest: c.mark ? lengthDto(c.mark.mark) : null,
});

/** A shape's own sizes for the API. */
function presentShapeParams(piece: Piece): ShapeParamsDto {
  const out: ShapeParamsDto = {};
  for (const [k, v] of Object.entries(piece.params ?? {})) {
    if (v === undefined) continue;
    (out as Record<string, unknown>)[k] = typeof v === 'object' ? lengthDto(v as Length) : v;
  }
  return out;
}

/** The cut line as SVG path data in inches, or null when the sizes cannot make the shape (the checks say why). */
function outlineData(piece: Piece): string | null {
  try {
    return pathData(shapeOutline(piece).cut);
  } catch (e) {
    if (e instanceof RangeError) return null;
    throw e;
  }
}

/** Every piece in list order, with its checks in words. */
export function presentPieces(list: CutList): PieceDto[] {
  return list.rows.map((row, i) => {
    const piece = list.pieces[i]!;
    return {
      id: row.id,
      position: row.position,
      name: row.name,
      material: row.material,
      quantity: row.quantity,
      shape: row.shape,
      params: presentShapeParams(piece),
      shapeSummary: shapeSummary(piece),
      outline: outlineData(piece),
      grain: row.grain,
      width: lengthDto(piece.width),
      height: lengthDto(piece.height),
      extent: (({ width, height }) => ({ width: lengthDto(width), height: lengthDto(height) }))(pieceExtent(piece)),
      scoreLines: piece.scoreLines.map((s) => ({ axis: s.axis, at: lengthDto(s.at), tab: Boolean(s.tab) })),
      matOnId: row.matOnId,
      notes: row.notes,
      saidAtMs: row.saidAtMs,
      mentionKey: row.mentionKey ?? null,
      checks: list.checks.filter((c) => c.pieceId === row.id).map(presentCheck),
    };
  });
}

/** One piece of the list, as the create and update answers show it. */
export function presentPiece(list: CutList, id: string): PieceDto | undefined {
  return presentPieces(list).find((p) => p.id === id);
}

export const presentMaterial = (m: Material): MaterialDto => ({
  id: m.id,
  name: m.name,
  kind: m.kind as MaterialKind,
  // A stored sheet size that cannot be used shows as the default sheet (the sheet plan says so).
  sheetWidth: lengthDto(stockOf([m], m.name).width),
  sheetHeight: lengthDto(stockOf([m], m.name).height),
  rotate: m.rotate,
  grain: m.grain,
  sheetPriceCents: m.sheetPriceCents ?? null,
  sheetPriceCurrency: m.sheetPriceCurrency ?? null,
});

/** The Cut list section's read. */
export function presentCutList(list: CutList, tutorial: Tutorial, abilities: TutorialAbilities): CutListDto {
  return {
    pieces: presentPieces(list),
    materials: list.materials.map(presentMaterial),
    precision: tutorial.precision,
    defaultUnit: tutorial.defaultUnit,
    abilities: { update: abilities.update },
  };
}

/** Every piece's checks in one list. */
export function presentChecks(list: CutList): ChecksDto {
  return { checks: presentPieces(list).flatMap((p) => p.checks.map((c) => ({ ...c, pieceId: p.id, pieceName: p.name }))) };
}

function presentProposal(p: PieceProposal): PieceProposalDto {
  return {
    name: p.name,
    nameSaid: p.nameSaid,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    width: lengthDto(p.width),
    height: lengthDto(p.height),
    scoreLines: p.scoreLines.map((s) => ({ axis: s.axis, at: lengthDto(s.at) })),
    scoreKey: p.scoreKey,
    notes: p.notes,
  };
}

export function presentMentions(m: TutorialMentions): MentionsDto {
  return {
    recordingId: m.recordingId,
    mentions: m.mentions.map(({ every, count, proposal, ...x }) => ({
      ...x,
      values: x.values.map(lengthDto),
      every: every ? lengthDto(every) : null,
      count: count ?? null,
      proposal: proposal ? presentProposal(proposal) : null,
    })),
    toGoThrough: m.mentions.filter(toGoThrough).length,
  };
}

/** The pieces "Make pieces" made, as the cut list shows them, and what it left alone. */
export function presentMadePieces(list: CutList, made: MadePieces): MadePiecesDto {
  const ids = new Set(made.made.map((r) => r.id));
  return { pieces: presentPieces(list).filter((p) => ids.has(p.id)), skipped: made.skipped };
}
