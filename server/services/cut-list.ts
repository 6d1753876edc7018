import type { Check, Length, LengthUnit, Piece, RulerPrecision } from '@shared/measure';
import {
  checkCutList,
  extractMentionsFromCues,
  formatLength,
  formatMm,
  inchesNumber,
  mmNumber,
  parseLength,
  parseStoredLength,
  serializeLength,
} from '@shared/measure';
import { sheetSize } from '@shared/geometry';
import { Cue, Material, MentionDismissal, PieceRow, Recording, type Tutorial } from '../models';
import { HttpError } from '../lib/http-error';

/** A length for the API: exact stored form, numbers for drawing, and the words a crafter writes. */
export function lengthDto(l: Length) {
  return { value: serializeLength(l), inches: inchesNumber(l), mm: mmNumber(l), display: formatLength(l), mmDisplay: formatMm(l) };
}

/** Reads a typed or spoken length in the tutorial's default unit; 400 names the field otherwise. */
export function readInputLength(text: string, unit: LengthUnit, field: string): Length {
  const l = parseLength(text, { defaultUnit: unit });
  if (!l) throw new HttpError(400, `${field}: Could not read “${text}” as a length`, { issues: [{ path: field, message: 'Could not read this as a length' }] });
  return l;
}

/** The engine's piece from a stored row. */
export function toPiece(row: PieceRow): Piece {
  return {
    id: row.id,
    name: row.name,
    material: row.material,
    quantity: row.quantity,
    shape: row.shape,
    width: parseStoredLength(row.width),
    height: parseStoredLength(row.height),
    scoreLines: row.scoreLines.map((s) => ({ axis: s.axis, at: parseStoredLength(s.at), tab: s.tab })),
    matOn: row.matOnId,
    notes: row.notes,
  };
}

const presentCheck = (c: Check) => ({
  code: c.code,
  severity: c.severity,
  reason: c.reason,
  field: c.field ?? null,
  nearest: c.mark ? lengthDto(c.mark.mark) : null,
});

/** Default stock when a material has no row yet: 12 x 12 in, the usual scrapbook sheet (common practice). */
const DEFAULT_STOCK = sheetSize('12x12')!;

/**
 * The stock sheet a material is cut from, found by name (any case); a material with no row yet
 * gets the default 12 x 12 in sheet, pieces may turn.
 */
export function stockOf(materials: readonly Material[], name: string) {
  const material = materials.find((m) => m.name.toLowerCase() === name.toLowerCase());
  if (!material) return { material, width: DEFAULT_STOCK.width, height: DEFAULT_STOCK.height, rotate: true };
  return { material, width: parseStoredLength(material.sheetWidth), height: parseStoredLength(material.sheetHeight), rotate: material.rotate };
}

/** The cut list with each piece's checks, in position order. */
export async function loadCutList(tutorial: Tutorial) {
  const [rows, materials] = await Promise.all([
    PieceRow.findAll({ where: { tutorialId: tutorial.id }, order: [['position', 'ASC'], ['createdAt', 'ASC']] }),
    Material.findAll({ where: { tutorialId: tutorial.id }, order: [['name', 'ASC']] }),
  ]);
  const pieces = rows.map(toPiece);
  // A piece with no material has no stock sheet to be checked against.
  const stockFor = (material: string) => (material ? stockOf(materials, material) : undefined);
  const checks = checkCutList(pieces, { precision: tutorial.precision as RulerPrecision, stockFor });
  return {
    rows,
    pieces,
    materials,
    presented: rows.map((row, i) => presentPiece(row, pieces[i], checks.filter((c) => c.pieceId === row.id))),
  };
}

/** A piece for the API, with its checks in words. */
export function presentPiece(row: PieceRow, piece: Piece, checks: Check[]) {
  return {
    id: row.id,
    position: row.position,
    name: row.name,
    material: row.material,
    quantity: row.quantity,
    shape: row.shape,
    width: lengthDto(piece.width),
    height: lengthDto(piece.height),
    scoreLines: piece.scoreLines.map((s) => ({ axis: s.axis, at: lengthDto(s.at), tab: Boolean(s.tab) })),
    matOnId: row.matOnId,
    notes: row.notes,
    saidAtMs: row.saidAtMs,
    checks: checks.map(presentCheck),
  };
}

export const presentMaterial = (m: Material) => ({
  id: m.id,
  name: m.name,
  kind: m.kind,
  sheetWidth: lengthDto(parseStoredLength(m.sheetWidth)),
  sheetHeight: lengthDto(parseStoredLength(m.sheetHeight)),
  rotate: m.rotate,
});

/** A stable key for a mention: where it was said and what was said. */
export const mentionKey = (startMs: number, text: string) => `${startMs}:${text.trim().toLowerCase().replace(/\s+/g, ' ')}`;

/** The measurements spoken in the tutorial's newest recording, in time order, with dismissals. */
export async function tutorialMentions(tutorial: Tutorial) {
  const rec = await Recording.findOne({ where: { tutorialId: tutorial.id }, order: [['createdAt', 'DESC']], attributes: ['id'] });
  if (!rec) return { recordingId: null, mentions: [] };
  const [cues, dismissed] = await Promise.all([
    Cue.findAll({ where: { recordingId: rec.id }, order: [['position', 'ASC']], attributes: ['startMs', 'endMs', 'text'] }),
    MentionDismissal.findAll({ where: { tutorialId: tutorial.id }, attributes: ['mentionKey'] }),
  ]);
  const gone = new Set(dismissed.map((d) => d.mentionKey));
  const found = extractMentionsFromCues(
    cues.map((c) => ({ startMs: c.startMs, endMs: c.endMs, text: c.text })),
    { defaultUnit: tutorial.defaultUnit },
  );
  return {
    recordingId: rec.id,
    mentions: found.map((m) => {
      const key = mentionKey(m.startMs, m.text);
      return {
        key,
        kind: m.kind,
        text: m.text,
        approx: m.approx,
        corrected: Boolean(m.corrected),
        startMs: m.startMs,
        endMs: m.endMs,
        values: m.values.map(lengthDto),
        dismissed: gone.has(key),
      };
    }),
  };
}

/** Stored form of a typed length. */
export const storeLength = (text: string, unit: LengthUnit, field: string) => serializeLength(readInputLength(text, unit, field));
