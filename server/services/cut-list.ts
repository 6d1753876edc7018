import { Op, UniqueConstraintError, type CreationAttributes, type Transaction } from 'sequelize';
import type { z } from 'zod';
import type { Check, Length, LengthUnit, Mention, Piece, RulerPrecision } from '@shared/measure';
import {
  checkCutList,
  compareLengths,
  expandScoreStep,
  extractMentionsFromCues,
  inches,
  lengthBoundsProblem,
  parseStoredLength,
  readBoundedLength,
  ROUND_SHAPES,
  serializeLength,
  storedLengthOrNull,
} from '@shared/measure';
import {
  DEFAULT_HOLE,
  DEFAULT_HOLE_FROM_TOP,
  DEFAULT_SCALLOP,
  DEFAULT_TAG_CORNER,
  defaultGrain,
  isLengthParam,
  LENGTH_PARAMS,
  sheetSize,
  type SheetGrain,
} from '@shared/geometry';
import type { createPieceSchema, materialSchema, PieceShape, ShapeParamsInput, updateMaterialSchema, updatePieceSchema } from '@shared/schemas/piece';
import { proposePieces, type PieceProposal } from '@shared/mentions/propose';
import { Chapter, Cue, Material, MentionDismissal, PieceRow, sequelize, Tutorial } from '../models';
import type { StoredScoreLine, StoredShapeParams } from '../models/piece';
import type { VersionPiece } from '../models/tutorial-version';
import { ConflictError, fieldError, NotFoundError } from '../lib/errors';
import { appendToList, endPosition, lockList } from './positions';
import { newestRecording } from './recordings';

/** Reads a typed or spoken length in the tutorial's default unit, within bounds; 400 names the field and says why otherwise. */
export function readInputLength(text: string, unit: LengthUnit, field: string): Length {
  const r = readBoundedLength(text, { defaultUnit: unit });
  if (!r.ok) throw fieldError(field, `“${text}”: ${r.message.replace(/^./, (c) => c.toLowerCase())}`, r.message);
  return r.length;
}

/** Stored form of a typed length. */
export const storeLength = (text: string, unit: LengthUnit, field: string) => serializeLength(readInputLength(text, unit, field));

/** A stored length that cannot be read or lies out of bounds: which field, and what is stored. */
export type UnreadableLength = { field: string; stored: string };

/** A placeholder for a size that cannot be read, so checks and the Cut list still work while the maker fixes it. */
const PLACEHOLDER = inches(1);

/**
 * The engine's piece from a stored row, and the stored lengths that could not be used. A row
 * written before the bounds, or by hand, may hold a length that does not read, is zero or
 * negative, or is far past 10 m: such a size becomes a 1 in placeholder (a shape size or score
 * line is left out), and the caller reports it instead of letting it break what is drawn.
 */
export function readPieceRow(row: VersionPiece | PieceRow): { piece: Piece; unreadable: UnreadableLength[] } {
  const unreadable: UnreadableLength[] = [];
  const read = (stored: unknown, field: string) => {
    const l = storedLengthOrNull(stored);
    if (!l) unreadable.push({ field, stored: String(stored).slice(0, 60) });
    return l;
  };
  const params: Piece['params'] = {};
  const stored = (row.params ?? {}) as StoredShapeParams;
  for (const k of LENGTH_PARAMS) {
    if (stored[k] === undefined || stored[k] === null) continue;
    const l = read(stored[k], `params.${k}`);
    if (l) params[k] = l;
  }
  if (typeof stored.scallopCount === 'number' && Number.isInteger(stored.scallopCount) && stored.scallopCount >= 2 && stored.scallopCount <= 400)
    params.scallopCount = stored.scallopCount;
  if (stored.tagTop === 'clipped' || stored.tagTop === 'rounded') params.tagTop = stored.tagTop;
  const scoreLines: Piece['scoreLines'] = [];
  (Array.isArray(row.scoreLines) ? row.scoreLines : []).forEach((s, i) => {
    const at = read(s?.at, `scoreLines.${i}`);
    if (at && (s.axis === 'width' || s.axis === 'height')) scoreLines.push({ axis: s.axis, at, tab: s.tab });
  });
  const piece: Piece = {
    id: row.id,
    name: row.name,
    material: row.material,
    quantity: row.quantity,
    shape: row.shape,
    params,
    grain: row.grain,
    width: read(row.width, 'width') ?? PLACEHOLDER,
    height: read(row.height, 'height') ?? PLACEHOLDER,
    scoreLines,
    matOn: row.matOnId,
    notes: row.notes,
  };
  return { piece, unreadable };
}

/** The engine's piece from a stored row or a version's copy of one (sizes that cannot be read become placeholders; see `readPieceRow`). */
export function toPiece(row: VersionPiece | PieceRow): Piece {
  return readPieceRow(row).piece;
}

/** The pieces of a version's copy that can be drawn and sent out: those whose stored sizes all read (as `usablePieces` for the live rows). */
export function usableVersionPieces(rows: readonly VersionPiece[]): Piece[] {
  return rows.map(readPieceRow).flatMap((r) => (r.unreadable.length ? [] : [r.piece]));
}

const FIELD_WORDS: Record<string, string> = { width: 'width', height: 'length', scoreLines: 'score line', params: 'shape size' };

/** An error check for each stored length that could not be used, saying what is stored and what to do. */
function unreadableChecks(pieceId: string, list: UnreadableLength[]): Check[] {
  return list.map(({ field, stored }) => ({
    code: 'stored-size',
    severity: 'error',
    pieceId,
    field,
    reason: `The stored ${FIELD_WORDS[field.split('.')[0]!] ?? field} (“${stored}”) cannot be used: it does not read, or it is zero, negative or past 10 m. Enter it again; until then the piece is left out of the sheet plan and everything published.`,
  }));
}

/** Default stock when a material has no row yet: 12 x 12 in, the usual scrapbook sheet (common practice). */
const DEFAULT_STOCK = sheetSize('12x12')!;

/**
 * The stock sheet a material is cut from, found by name (any case); a material with no row yet
 * gets the default 12 x 12 in sheet, pieces may turn.
 */
export function stockOf(materials: readonly Material[], name: string) {
  const material = materials.find((m) => m.name.toLowerCase() === name.toLowerCase());
  if (!material) return { material, width: DEFAULT_STOCK.width, height: DEFAULT_STOCK.height, rotate: true, grain: 'none' as SheetGrain, unreadable: false };
  const width = storedLengthOrNull(material.sheetWidth);
  const height = storedLengthOrNull(material.sheetHeight);
  return {
    material,
    // A stored sheet size that cannot be used (see readPieceRow) stands in as the default sheet, flagged.
    width: width ?? DEFAULT_STOCK.width,
    height: height ?? DEFAULT_STOCK.height,
    rotate: material.rotate,
    grain: material.grain,
    unreadable: !width || !height,
  };
}

/**
 * A tutorial's cut list: the rows, the engine's pieces (same order), the materials and every
 * check; `unreadable` holds the ids of pieces with a stored size that cannot be used.
 */
export type CutList = { rows: PieceRow[]; pieces: Piece[]; materials: Material[]; checks: Check[]; unreadable: Set<string> };

/** The pieces that can be drawn and sent out: those whose stored sizes all read. */
export const usablePieces = (cut: CutList): Piece[] => cut.pieces.filter((p) => !cut.unreadable.has(p.id));

/** The cut list with each piece's checks, in position order. */
export async function loadCutList(tutorial: Tutorial): Promise<CutList> {
  const [rows, materials] = await Promise.all([
    PieceRow.findAll({
      where: { tutorialId: tutorial.id },
      order: [
        ['position', 'ASC'],
        ['createdAt', 'ASC'],
      ],
    }),
    listMaterials(tutorial),
  ]);
  const read = rows.map(readPieceRow);
  const pieces = read.map((r) => r.piece);
  const unreadable = new Set(read.filter((r) => r.unreadable.length > 0).map((r) => r.piece.id));
  // A piece with no material has no stock sheet to be checked against.
  const stockFor = (material: string) => (material ? stockOf(materials, material) : undefined);
  const checks = [
    ...read.flatMap((r) => unreadableChecks(r.piece.id, r.unreadable)),
    ...checkCutList(pieces, { precision: tutorial.precision as RulerPrecision, stockFor }).filter((c) => !unreadable.has(c.pieceId)),
  ];
  return { rows, pieces, materials, checks, unreadable };
}

type PieceInput = Partial<z.output<typeof updatePieceSchema>>;

/**
 * A shape's stored sizes after a change: typed lengths read exactly, null takes a size away, a
 * scallop size and count replace each other. A shape gets its usual sizes where it has none yet
 * (1/2 in scallops; a tag's 3/8 in clipped corners and 1/4 in hole 1/2 in from the top).
 */
function shapeParamsChange(shape: PieceShape, input: ShapeParamsInput | undefined, unit: LengthUnit, current: StoredShapeParams): StoredShapeParams {
  const out: StoredShapeParams = { ...current };
  for (const [k, v] of Object.entries(input ?? {}) as [keyof StoredShapeParams, unknown][]) {
    if (v === null || v === undefined) delete out[k];
    else if (isLengthParam(k)) (out as Record<string, unknown>)[k] = storeLength(String(v), unit, `params.${k}`);
    else (out as Record<string, unknown>)[k] = v;
  }
  if (input?.scallopSize) delete out.scallopCount;
  if (input?.scallopCount) delete out.scallopSize;
  if ((shape === 'scalloped-rect' || shape === 'scalloped-circle') && out.scallopSize === undefined && out.scallopCount === undefined)
    out.scallopSize = serializeLength(DEFAULT_SCALLOP);
  if (shape === 'tag') {
    out.tagTop ??= 'clipped';
    out.tagCorner ??= serializeLength(DEFAULT_TAG_CORNER);
    out.holeDiameter ??= serializeLength(DEFAULT_HOLE);
    out.holeFromTop ??= serializeLength(DEFAULT_HOLE_FROM_TOP);
  }
  return out;
}

/** Turns typed lengths into exact stored ones; a round shape's height is its diameter. */
function pieceChanges(body: PieceInput, unit: LengthUnit, current?: PieceRow): Partial<PieceRow> {
  const out: Partial<PieceRow> = {};
  for (const k of ['name', 'material', 'quantity', 'shape', 'grain', 'matOnId', 'notes', 'saidAtMs', 'position'] as const) {
    if (body[k] !== undefined) (out as Record<string, unknown>)[k] = body[k];
  }
  if (body.width !== undefined) out.width = storeLength(body.width, unit, 'width');
  if (body.height !== undefined) out.height = storeLength(body.height, unit, 'height');
  const shape = body.shape ?? current?.shape ?? 'rect';
  if (body.params !== undefined || body.shape !== undefined) out.params = shapeParamsChange(shape, body.params, unit, current?.params ?? {});
  if (!current && body.grain === undefined) out.grain = defaultGrain({ name: body.name ?? '', shape });
  if (ROUND_SHAPES.includes(shape)) out.height = out.width ?? current?.width ?? out.height;
  if (body.scoreLines) {
    out.scoreLines = body.scoreLines.map((s, i): StoredScoreLine => ({
      axis: s.axis,
      at: storeLength(s.at, unit, `scoreLines.${i}.at`),
      ...(s.tab ? { tab: true } : {}),
    }));
  }
  return out;
}

/** A mat sits on another piece of the same cut list, never on itself. */
async function checkMatTarget(tutorial: Tutorial, matOnId: string | null | undefined, selfId?: string) {
  if (!matOnId) return;
  if (matOnId === selfId) throw fieldError('matOnId', 'A piece cannot sit on itself');
  const base = await PieceRow.findOne({ where: { id: matOnId, tutorialId: tutorial.id }, attributes: ['id'] });
  if (!base) throw fieldError('matOnId', 'That piece is not in this cut list', 'Not in this cut list');
}

/** A piece by id, or 404. */
export async function findPiece(id: string): Promise<PieceRow> {
  const row = await PieceRow.findByPk(id);
  if (!row) throw new NotFoundError('Piece');
  return row;
}

/** Removes a piece from the cut list (pieces matted on it lose their mat: the column is set null). */
export async function deletePiece(row: PieceRow): Promise<void> {
  await row.destroy();
}

/** Adds a piece at the end of the cut list, lengths read in the tutorial's default unit. */
export async function addPiece(tutorial: Tutorial, body: z.output<typeof createPieceSchema>): Promise<PieceRow> {
  await checkMatTarget(tutorial, body.matOnId);
  const changes = pieceChanges(body, tutorial.defaultUnit);
  return appendToList(PieceRow, tutorial.id, (position, transaction) =>
    PieceRow.create(
      { ...changes, tutorialId: tutorial.id, position, name: body.name, mentionKey: body.mentionKey ?? null, width: changes.width!, height: changes.height! },
      { transaction },
    ),
  );
}

/** Changes a piece; typed lengths are read in the tutorial's default unit. */
export async function updatePiece(tutorial: Tutorial, row: PieceRow, body: z.output<typeof updatePieceSchema>): Promise<PieceRow> {
  await checkMatTarget(tutorial, body.matOnId, row.id);
  return row.update(pieceChanges(body, tutorial.defaultUnit, row));
}

/** A tutorial's materials by name. */
export function listMaterials(tutorial: Tutorial): Promise<Material[]> {
  return Material.findAll({ where: { tutorialId: tutorial.id }, order: [['name', 'ASC']] });
}

/** A material by id, or 404. */
export async function findMaterial(id: string): Promise<Material> {
  const m = await Material.findByPk(id);
  if (!m) throw new NotFoundError('Material');
  return m;
}

/** Removes a material with its stock sheet; pieces name their material in words and keep it. */
export async function deleteMaterial(m: Material): Promise<void> {
  await m.destroy();
}

/** Adds a material with its stock sheet; a name already in the list is 409. */
export async function addMaterial(tutorial: Tutorial, input: z.output<typeof materialSchema>): Promise<Material> {
  const u = tutorial.defaultUnit;
  try {
    return await Material.create({
      tutorialId: tutorial.id,
      name: input.name,
      kind: input.kind,
      sheetWidth: storeLength(input.sheetWidth, u, 'sheetWidth'),
      sheetHeight: storeLength(input.sheetHeight, u, 'sheetHeight'),
      rotate: input.rotate,
      grain: input.grain,
    });
  } catch (e) {
    if (e instanceof UniqueConstraintError)
      throw new ConflictError(`There is already a material called “${input.name}”`, { issues: [{ path: 'name', message: 'Already in the list' }] });
    throw e;
  }
}

/** Changes a material; renaming it carries its pieces along, in one transaction. */
export async function updateMaterial(tutorial: Tutorial, m: Material, b: z.output<typeof updateMaterialSchema>): Promise<Material> {
  const u = tutorial.defaultUnit;
  const taken = () => new ConflictError(`There is already a material called “${b.name}”`, { issues: [{ path: 'name', message: 'Already in the list' }] });
  // A rename to a name in use is a conflict in words, as when creating (not a unique-index 500).
  await sequelize
    .transaction(async (transaction) => {
      if (b.name && b.name !== m.name) await PieceRow.update({ material: b.name }, { where: { tutorialId: tutorial.id, material: m.name }, transaction });
      await m.update(
        {
          ...(b.name ? { name: b.name } : {}),
          ...(b.kind ? { kind: b.kind } : {}),
          ...(b.sheetWidth ? { sheetWidth: storeLength(b.sheetWidth, u, 'sheetWidth') } : {}),
          ...(b.sheetHeight ? { sheetHeight: storeLength(b.sheetHeight, u, 'sheetHeight') } : {}),
          ...(b.rotate !== undefined ? { rotate: b.rotate } : {}),
          ...(b.grain ? { grain: b.grain } : {}),
        },
        { transaction },
      );
    })
    .catch((e: unknown) => {
      throw e instanceof UniqueConstraintError ? taken() : e;
    });
  return m;
}

/** A stable key for a mention: where it was said and what was said. */
export const mentionKey = (startMs: number, text: string) => `${startMs}:${text.trim().toLowerCase().replace(/\s+/g, ' ')}`;

/** Where a used mention went: the piece it made, or the piece its score lines were added to. */
export type MentionUse = { pieceId: string; pieceName: string; as: 'piece' | 'score' };

/** A mention with its time, key, whether the maker dismissed it, the piece it would make and where it went. */
export type TutorialMention = Omit<Mention, 'corrected'> & {
  key: string;
  corrected: boolean;
  startMs: number;
  endMs: number;
  dismissed: boolean;
  proposal: PieceProposal | null;
  /** A score list that a size said next to it takes in: that size's key. */
  scoreOf: string | null;
  uses: MentionUse[];
};
export type TutorialMentions = { recordingId: string | null; mentions: TutorialMention[] };

/** The names of the materials a studio's other tutorials use: said again, they are matched. */
async function studioMaterialNames(tutorial: Tutorial): Promise<string[]> {
  const rows = await Material.findAll({
    attributes: ['name'],
    include: [{ model: Tutorial, as: 'tutorial', attributes: [], where: { studioId: tutorial.studioId }, required: true }],
    where: { tutorialId: { [Op.ne]: tutorial.id } },
    order: [['updatedAt', 'DESC']],
  });
  const seen = new Set<string>();
  return rows.map((r) => r.name).filter((n) => !seen.has(n.toLowerCase()) && Boolean(seen.add(n.toLowerCase())));
}

/**
 * The measurements spoken in the tutorial's newest recording, in time order, each with the
 * finished piece it would make (named from the words said, its material and score lines), whether
 * it was dismissed, and where it went if a piece was made from it or its score lines were added.
 */
export async function tutorialMentions(tutorial: Tutorial): Promise<TutorialMentions> {
  const rec = await newestRecording(tutorial.id, ['id']);
  if (!rec) return { recordingId: null, mentions: [] };
  const [cues, dismissed, chapters, pieces, materials, studio] = await Promise.all([
    Cue.findAll({ where: { recordingId: rec.id }, order: [['position', 'ASC']], attributes: ['startMs', 'endMs', 'text'] }),
    MentionDismissal.findAll({ where: { tutorialId: tutorial.id }, attributes: ['mentionKey'] }),
    Chapter.findAll({ where: { recordingId: rec.id }, attributes: ['title', 'startMs'] }),
    PieceRow.findAll({ where: { tutorialId: tutorial.id }, attributes: ['id', 'name', 'mentionKey', 'scoreMentionKeys'], order: [['position', 'ASC']] }),
    listMaterials(tutorial),
    studioMaterialNames(tutorial),
  ]);
  const gone = new Set(dismissed.map((d) => d.mentionKey));
  const plain = cues.map((c) => ({ startMs: c.startMs, endMs: c.endMs, text: c.text }));
  const found = extractMentionsFromCues(plain, { defaultUnit: tutorial.defaultUnit }).map((m) => ({ ...m, key: mentionKey(m.startMs, m.text) }));
  const proposals = proposePieces(plain, found, chapters, { tutorial: materials.map((m) => m.name), studio });
  const scoreOf = new Map<string, string>();
  for (const p of proposals.values()) if (p.scoreKey) scoreOf.set(p.scoreKey, p.key);
  const usesOf = (key: string): MentionUse[] => [
    ...pieces.filter((p) => p.mentionKey === key).map((p) => ({ pieceId: p.id, pieceName: p.name, as: 'piece' as const })),
    ...pieces.filter((p) => p.scoreMentionKeys.includes(key)).map((p) => ({ pieceId: p.id, pieceName: p.name, as: 'score' as const })),
  ];
  return {
    recordingId: rec.id,
    mentions: found.map((m) => ({
      key: m.key,
      kind: m.kind,
      text: m.text,
      approx: m.approx,
      corrected: Boolean(m.corrected),
      startMs: m.startMs,
      endMs: m.endMs,
      values: m.values,
      ...(m.every ? { every: m.every } : {}),
      ...(m.count !== undefined ? { count: m.count } : {}),
      dismissed: gone.has(m.key),
      proposal: proposals.get(m.key) ?? null,
      scoreOf: scoreOf.get(m.key) ?? null,
      uses: usesOf(m.key),
    })),
  };
}

/** A mention still to go through: not dismissed, not taken back, and not used as a piece or as score lines. */
export const toGoThrough = (m: TutorialMention) => !m.dismissed && !m.corrected && m.uses.length === 0;

/** Why a size said in the video cannot make a piece (negative, zero or past 10 m: the same bounds as typed sizes), or null. */
function proposalProblem(p: PieceProposal): string | null {
  for (const l of [p.width, p.height, ...p.scoreLines.map((s) => s.at)]) {
    const problem = lengthBoundsProblem(l);
    if (problem) return problem.replace(/^./, (c) => c.toLowerCase());
  }
  return null;
}

/** A proposal as a piece row's values: exact lengths stored, the mentions it uses recorded. */
export function pieceFromProposal(p: PieceProposal, scoreTaken: boolean): Omit<CreationAttributes<PieceRow>, 'position' | 'tutorialId'> {
  const scoreLines = scoreTaken ? p.scoreLines : [];
  return {
    name: p.name,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    grain: defaultGrain({ name: p.name, shape: p.shape }),
    width: serializeLength(p.width),
    height: serializeLength(p.height),
    scoreLines: scoreLines.map((s) => ({ axis: s.axis, at: serializeLength(s.at) })),
    notes: p.notes,
    saidAtMs: p.saidAtMs,
    mentionKey: p.key,
    scoreMentionKeys: scoreTaken && p.scoreKey ? [p.scoreKey] : [],
  };
}

/**
 * A material a piece names that the tutorial has no row for yet but the studio used before: copied
 * with its stock sheet, so the sheet plan lays the piece on the sheet the crafter used last time.
 */
async function adoptStudioMaterials(tutorial: Tutorial, names: readonly string[], transaction: Transaction): Promise<void> {
  const have = new Set((await Material.findAll({ where: { tutorialId: tutorial.id }, attributes: ['name'], transaction })).map((m) => m.name.toLowerCase()));
  for (const name of new Set(names.filter((n) => n && !have.has(n.toLowerCase())))) {
    const earlier = await Material.findOne({
      where: { tutorialId: { [Op.ne]: tutorial.id }, name },
      include: [{ model: Tutorial, as: 'tutorial', attributes: [], where: { studioId: tutorial.studioId }, required: true }],
      order: [['updatedAt', 'DESC']],
      transaction,
    });
    if (!earlier) continue;
    const { kind, sheetWidth, sheetHeight, rotate, grain, sheetPriceCents, sheetPriceCurrency } = earlier;
    await Material.create(
      { tutorialId: tutorial.id, name, kind, sheetWidth, sheetHeight, rotate, grain, sheetPriceCents, sheetPriceCurrency },
      { transaction },
    );
    have.add(name.toLowerCase());
  }
}

export type MadePieces = { made: PieceRow[]; skipped: { key: string; text: string; reason: string }[] };

/**
 * "Make a piece" and "Make pieces from all": finished pieces from size and diameter mentions, in
 * one transaction. Without keys, every size mention still to go through; with keys, those, where
 * one already used is refused (409) unless `again` says a second piece is wanted. A score list
 * said next to a size goes into its piece unless it was used already.
 */
export async function makePiecesFromMentions(tutorial: Tutorial, o: { keys?: string[]; again?: boolean }): Promise<MadePieces> {
  const { mentions } = await tutorialMentions(tutorial);
  const byKey = new Map(mentions.map((m) => [m.key, m]));
  const skipped: MadePieces['skipped'] = [];
  let chosen: TutorialMention[];
  if (o.keys) {
    chosen = o.keys.map((k, i) => {
      const m = byKey.get(k);
      if (!m) throw fieldError(`keys.${i}`, 'That mention is not in the transcript any more; reload the mentions', 'Not in the transcript');
      if (!m.proposal)
        throw fieldError(
          `keys.${i}`,
          `“${m.text}” is not a whole piece: ${m.kind === 'range' ? 'pick the end you mean' : 'add it to a piece or fill in the other side'}`,
        );
      const outOfBounds = proposalProblem(m.proposal);
      if (outOfBounds) throw fieldError(`keys.${i}`, `“${m.text}”: ${outOfBounds}`);
      const piece = m.uses.find((u) => u.as === 'piece');
      if (piece && !o.again)
        throw new ConflictError(`“${m.text}” is already in the cut list as “${piece.pieceName}”. Choose “Make another” to add a second piece from it.`, {
          code: 'used',
          key: m.key,
          pieceId: piece.pieceId,
        });
      return m;
    });
  } else {
    chosen = mentions.filter((m) => m.proposal && toGoThrough(m) && !proposalProblem(m.proposal));
    for (const m of mentions) {
      const problem = m.proposal && toGoThrough(m) ? proposalProblem(m.proposal) : null;
      if (problem) skipped.push({ key: m.key, text: m.text, reason: problem });
    }
    for (const m of mentions)
      if (m.proposal && !toGoThrough(m) && !m.dismissed && !m.corrected) skipped.push({ key: m.key, text: m.text, reason: 'already in the cut list' });
  }
  const scoreUsed = new Set(mentions.filter((m) => m.uses.length > 0).map((m) => m.key));
  const made = await sequelize.transaction(async (transaction) => {
    await adoptStudioMaterials(
      tutorial,
      chosen.map((m) => m.proposal!.material),
      transaction,
    );
    await lockList(PieceRow, tutorial.id, transaction);
    let position = await endPosition(PieceRow, tutorial.id, transaction);
    const rows: PieceRow[] = [];
    for (const m of chosen) {
      const p = m.proposal!;
      const taken = Boolean(p.scoreKey && !scoreUsed.has(p.scoreKey));
      if (p.scoreKey) scoreUsed.add(p.scoreKey);
      rows.push(await PieceRow.create({ ...pieceFromProposal(p, taken), tutorialId: tutorial.id, position: position++ }, { transaction }));
    }
    return rows;
  });
  return { made, skipped };
}

/**
 * Adds a score mention's lines to a piece, on the side chosen, and records the use. A mention
 * already used is refused (409) unless `again`; a repeat ("every 1/4 in") is laid over that side.
 */
export async function addScoreLinesFromMention(
  tutorial: Tutorial,
  o: { key: string; pieceId: string; axis: 'width' | 'height'; again?: boolean },
): Promise<PieceRow> {
  const { mentions } = await tutorialMentions(tutorial);
  const m = mentions.find((x) => x.key === o.key);
  if (!m) throw fieldError('key', 'That mention is not in the transcript any more; reload the mentions', 'Not in the transcript');
  if (m.kind !== 'score' && m.kind !== 'length') throw fieldError('key', `“${m.text}” is not a score line`);
  const row = await PieceRow.findOne({ where: { id: o.pieceId, tutorialId: tutorial.id } });
  if (!row) throw fieldError('pieceId', 'That piece is not in this cut list', 'Not in this cut list');
  const used = m.uses[0];
  if (used && !o.again)
    throw new ConflictError(`“${m.text}” is already used on “${used.pieceName}”. Choose “Add again” to add its lines a second time.`, {
      code: 'used',
      key: m.key,
      pieceId: used.pieceId,
    });
  const along = parseStoredLength(o.axis === 'width' ? row.width : row.height);
  const first = m.values[0]!;
  const at = m.every ? expandScoreStep(first, m.every, along) : m.values.filter((v) => compareLengths(v, along) < 0);
  if (at.length === 0) throw fieldError('axis', `The first line lies outside “${row.name}” on that side`, 'Outside the piece on that side');
  const lines = [...row.scoreLines, ...at.map((a): StoredScoreLine => ({ axis: o.axis, at: serializeLength(a) }))];
  if (lines.length > 200) throw fieldError('key', `That makes ${lines.length} score lines on “${row.name}”; at most 200 fit one piece`);
  return row.update({ scoreLines: lines, scoreMentionKeys: [...new Set([...row.scoreMentionKeys, m.key])] });
}

/** Marks a mention as "not a piece", or takes the mark back. */
export async function setMentionDismissed(tutorial: Tutorial, key: string, dismissed: boolean): Promise<void> {
  if (dismissed)
    await MentionDismissal.findOrCreate({ where: { tutorialId: tutorial.id, mentionKey: key }, defaults: { tutorialId: tutorial.id, mentionKey: key } });
  else await MentionDismissal.destroy({ where: { tutorialId: tutorial.id, mentionKey: key } });
}
