import { allowedOrientations, type SheetGrain } from '../geometry/grain';
import { pieceExtent, shapeLengths, shapeProblems, SHAPE_LABELS } from '../geometry/shapes';
import { compareLengths, formatLength, inches, subtractLengths, toInches, type Length } from './length';
import { ROUND_SHAPES, type Piece, type ScoreAxis } from './piece';
import { DEFAULT_PRECISION, describeOffRuler, nearestMark, type RulerMark, type RulerPrecision, type RulerSystem } from './ruler';

export type CheckSeverity = 'warning' | 'error';

export type CheckCode =
  | 'off-ruler'
  | 'bad-size'
  | 'bad-quantity'
  | 'circle-not-round'
  | 'score-outside'
  | 'score-near-edge'
  | 'score-too-close'
  | 'mat-base-missing'
  | 'mat-on-itself'
  | 'mat-too-large'
  | 'mat-uneven'
  | 'mat-margin-small'
  | 'larger-than-stock'
  | 'shape-size'
  | 'grain-against-stock'
  /** A stored size that cannot be used (it does not read, or it is zero, negative or past the bounds). */
  | 'stored-size';

/** Gaps a mat leaves around it on the piece beneath, centred. */
export interface MatMargins {
  left: Length;
  right: Length;
  top: Length;
  bottom: Length;
}

/** One finding about a piece, with a reason a person can read. */
export interface Check {
  code: CheckCode;
  severity: CheckSeverity;
  reason: string;
  pieceId: string;
  /** What the finding is about: "width", "height", "scoreLines.2", "matOn", "quantity". */
  field?: string;
  /** For off-ruler findings: the nearest mark and the error. */
  mark?: RulerMark;
  /** For mat findings: the margins each side. */
  margins?: MatMargins;
}

/** The stock sheet a piece's material comes in. */
export interface StockSheet {
  width: Length;
  height: Length;
  /** May a piece be turned on the sheet (false for directional prints)? */
  rotate: boolean;
  /** Which way the sheet's grain runs; not known by default. */
  grain?: SheetGrain;
}

export interface CheckContext {
  precision?: RulerPrecision;
  /** Inch marks (default) or whole millimetres. */
  ruler?: RulerSystem;
  /** Smallest margin a mat should leave each side; 1/8 in by default (common practice). */
  matMargin?: Length;
  /** Smallest distance between score lines and from an edge; 1/8 in by default (common practice). */
  minScoreGap?: Length;
  /** The whole cut list, so a mat can find the piece it sits on. */
  pieces: readonly Piece[];
  /** The stock sheet of this piece's material, when known. */
  stock?: StockSheet;
}

/** 1/8 in: the usual reveal around a mat and the usual nearest spacing of score lines (common practice). */
export const DEFAULT_MAT_MARGIN: Length = inches([1, 8]);
export const DEFAULT_MIN_SCORE_GAP: Length = inches([1, 8]);

/** The cut list's words for a piece's two sides (its columns read "Width" and "Length"). */
const AXIS_WORDS = { width: 'width', height: 'length' } as const;

function sizeText(w: Length, h: Length): string {
  if (w.unit === h.unit) return `${formatLength(w).replace(/ (in|mm|cm)$/, '')} x ${formatLength(h)}`;
  return `${formatLength(w)} x ${formatLength(h)}`;
}

function pieceLabel(p: Piece): string {
  return p.name.trim() !== '' ? `"${p.name}"` : 'This piece';
}

function isPositive(l: Length): boolean {
  return l.value.s > 0n && l.value.n > 0n;
}

function half(l: Length): Length {
  return { value: l.value.div(2), unit: l.unit };
}

/**
 * The margins a mat leaves on the piece beneath when centred (null when it
 * does not fit). A rectangle on a circle fits when its corners stay inside.
 */
export function matMargins(mat: Piece, base: Piece): MatMargins | null {
  const mw = mat.width;
  const mh = mat.height;
  if (base.shape === 'circle' && mat.shape === 'rect') {
    const d = toInches(base.width);
    const diag2 = toInches(mw).pow(2).add(toInches(mh).pow(2));
    if (diag2.compare(d.pow(2)) > 0) return null;
  } else if (compareLengths(mw, base.width) > 0 || compareLengths(mh, base.height) > 0) return null;
  const side = half(subtractLengths(base.width, mw));
  const tb = half(subtractLengths(base.height, mh));
  return { left: side, right: side, top: tb, bottom: tb };
}

function checkRulerValue(out: Check[], piece: Piece, field: string, label: string, l: Length, precision: RulerPrecision, system: RulerSystem): void {
  const reason = describeOffRuler(label, l, precision, system);
  if (reason === null) return;
  out.push({ code: 'off-ruler', severity: 'warning', reason, pieceId: piece.id, field, mark: nearestMark(l, precision, system) });
}

/** Every finding for one piece: sizes on the ruler, score lines, its mat, its stock sheet. */
export function checkPiece(piece: Piece, ctx: CheckContext): Check[] {
  const out: Check[] = [];
  const precision = ctx.precision ?? DEFAULT_PRECISION;
  const system = ctx.ruler ?? 'inch';
  const minGap = ctx.minScoreGap ?? DEFAULT_MIN_SCORE_GAP;
  const label = pieceLabel(piece);

  if (!Number.isInteger(piece.quantity) || piece.quantity < 1) {
    out.push({
      code: 'bad-quantity',
      severity: 'error',
      reason: `${label} needs a quantity of at least 1 (it has ${piece.quantity})`,
      pieceId: piece.id,
      field: 'quantity',
    });
  }
  const sizeOk = isPositive(piece.width) && isPositive(piece.height);
  if (!sizeOk) {
    out.push({
      code: 'bad-size',
      severity: 'error',
      reason: `${label} needs a width and length above zero (it is ${sizeText(piece.width, piece.height)})`,
      pieceId: piece.id,
      field: isPositive(piece.width) ? 'height' : 'width',
    });
  }
  const round = ROUND_SHAPES.includes(piece.shape);
  if (round && compareLengths(piece.width, piece.height) !== 0) {
    out.push({
      code: 'circle-not-round',
      severity: 'error',
      reason: `${label} is a ${SHAPE_LABELS[piece.shape]}, so its width and length must both be the diameter (it is ${sizeText(piece.width, piece.height)})`,
      pieceId: piece.id,
      field: 'height',
    });
  }

  if (round) checkRulerValue(out, piece, 'width', 'Diameter', piece.width, precision, system);
  else {
    checkRulerValue(out, piece, 'width', 'Width', piece.width, precision, system);
    // The cut list's column for a piece's second side is "Length"; its checks use the same word.
    checkRulerValue(out, piece, 'height', 'Length', piece.height, precision, system);
  }
  if (sizeOk) {
    for (const [field, name, l] of shapeLengths(piece)) checkRulerValue(out, piece, field, name, l, precision, system);
    for (const pr of shapeProblems(piece)) out.push({ code: 'shape-size', severity: pr.severity, reason: pr.reason, pieceId: piece.id, field: pr.field });
  }

  // score lines, per axis
  const byAxis: Record<ScoreAxis, { at: Length; tab: boolean; index: number }[]> = { width: [], height: [] };
  piece.scoreLines.forEach((line, index) => {
    const field = `scoreLines.${index}`;
    const dim = line.axis === 'width' ? piece.width : piece.height;
    const dimName = AXIS_WORDS[line.axis];
    checkRulerValue(out, piece, field, 'Score line at', line.at, precision, system);
    if (compareLengths(line.at, inches(0)) <= 0 || compareLengths(line.at, dim) >= 0) {
      out.push({
        code: 'score-outside',
        severity: 'error',
        reason: `Score line at ${formatLength(line.at)} is outside the ${formatLength(dim)} ${dimName}`,
        pieceId: piece.id,
        field,
      });
      return;
    }
    byAxis[line.axis].push({ at: line.at, tab: line.tab === true, index });
    if (line.tab) return;
    const fromEnd = subtractLengths(dim, line.at);
    const nearest = compareLengths(line.at, fromEnd) <= 0 ? line.at : fromEnd;
    if (compareLengths(nearest, minGap) < 0) {
      out.push({
        code: 'score-near-edge',
        severity: 'warning',
        reason: `Score line at ${formatLength(line.at)} is only ${formatLength(nearest)} from the edge of the ${formatLength(dim)} ${dimName}; keep at least ${formatLength(minGap)} unless it is a tab`,
        pieceId: piece.id,
        field,
      });
    }
  });
  for (const axis of ['width', 'height'] as const) {
    const lines = [...byAxis[axis]].sort((a, b) => compareLengths(a.at, b.at));
    for (let k = 1; k < lines.length; k++) {
      const a = lines[k - 1]!;
      const b = lines[k]!;
      if (a.tab || b.tab) continue;
      const gap = subtractLengths(b.at, a.at);
      if (compareLengths(gap, minGap) >= 0) continue;
      const reason =
        gap.value.n === 0n
          ? `Score line at ${formatLength(a.at)} on the ${axis} is listed twice`
          : `Score lines at ${formatLength(a.at)} and ${formatLength(b.at)} on the ${axis} are only ${formatLength(gap)} apart; keep at least ${formatLength(minGap)}`;
      out.push({ code: 'score-too-close', severity: 'warning', reason, pieceId: piece.id, field: `scoreLines.${b.index}` });
    }
  }

  if (piece.matOn) checkMat(out, piece, ctx, label);

  if (ctx.stock && sizeOk) {
    const { width: sw, height: sh, rotate } = ctx.stock;
    // A pillow box is cut from its flat blank, larger than the box.
    const ext = pieceExtent(piece);
    const fits = compareLengths(ext.width, sw) <= 0 && compareLengths(ext.height, sh) <= 0;
    const fitsTurned = rotate && compareLengths(ext.width, sh) <= 0 && compareLengths(ext.height, sw) <= 0;
    const blank = piece.shape === 'pillow-box' ? `; its blank ${sizeText(ext.width, ext.height)}` : '';
    if (!fits && !fitsTurned) {
      const turn = rotate ? ', even turned' : ' (turning is off for this material)';
      out.push({
        code: 'larger-than-stock',
        severity: 'error',
        reason: `${label} (${sizeText(piece.width, piece.height)}${blank}) is larger than the ${sizeText(sw, sh)} stock sheet${turn}`,
        pieceId: piece.id,
        field: 'width',
      });
    } else {
      const ways = allowedOrientations({ ...ext, grain: piece.grain, name: piece.name }, ctx.stock);
      const grainFits = (ways.upright && fits) || (ways.turned && fitsTurned);
      if (!grainFits) {
        out.push({
          code: 'grain-against-stock',
          severity: 'error',
          reason: ways.reason ?? `${label} fits the ${sizeText(sw, sh)} stock sheet only turned across its grain; it needs its grain along its ${piece.grain}`,
          pieceId: piece.id,
          field: 'grain',
        });
      }
    }
  }
  return out;
}

function checkMat(out: Check[], piece: Piece, ctx: CheckContext, label: string): void {
  if (piece.matOn === piece.id) {
    out.push({ code: 'mat-on-itself', severity: 'error', reason: `${label} is set to sit on itself`, pieceId: piece.id, field: 'matOn' });
    return;
  }
  const base = ctx.pieces.find((p) => p.id === piece.matOn);
  if (!base) {
    out.push({
      code: 'mat-base-missing',
      severity: 'error',
      reason: `${label} sits on a piece that is not in the cut list`,
      pieceId: piece.id,
      field: 'matOn',
    });
    return;
  }
  const baseLabel = pieceLabel(base);
  const margins = matMargins(piece, base);
  if (!margins) {
    out.push({
      code: 'mat-too-large',
      severity: 'error',
      reason: `${label} (${sizeText(piece.width, piece.height)}) does not fit on ${baseLabel} (${sizeText(base.width, base.height)}) it sits on`,
      pieceId: piece.id,
      field: 'matOn',
    });
    return;
  }
  const want = ctx.matMargin ?? DEFAULT_MAT_MARGIN;
  const sides =
    compareLengths(margins.left, margins.top) === 0
      ? `${formatLength(margins.left)} each side`
      : `${formatLength(margins.left)} at left and right, ${formatLength(margins.top)} at top and bottom`;
  // a circle mat on a circle is even by construction; a rectangle on a circle is judged at its corners
  const rectOnCircle = base.shape === 'circle' && piece.shape === 'rect';
  if (!rectOnCircle && compareLengths(margins.left, margins.top) !== 0) {
    out.push({
      code: 'mat-uneven',
      severity: 'warning',
      reason: `${label} on ${baseLabel} leaves uneven margins: ${sides}`,
      pieceId: piece.id,
      field: 'matOn',
      margins,
    });
  }
  let small: boolean;
  if (rectOnCircle) {
    const room = toInches(base.width).sub(toInches(want).mul(2));
    const diag2 = toInches(piece.width).pow(2).add(toInches(piece.height).pow(2));
    small = room.s < 0n || diag2.compare(room.pow(2)) > 0;
  } else {
    const least = compareLengths(margins.left, margins.top) <= 0 ? margins.left : margins.top;
    small = compareLengths(least, want) < 0;
  }
  if (small) {
    const where = rectOnCircle ? 'at its corners' : sides;
    out.push({
      code: 'mat-margin-small',
      severity: 'warning',
      reason: `${label} on ${baseLabel} leaves less than the ${formatLength(want)} margin (${where})`,
      pieceId: piece.id,
      field: 'matOn',
      margins,
    });
  }
}

/** Every finding for a whole cut list, piece by piece in order. */
export function checkCutList(
  pieces: readonly Piece[],
  ctx: Omit<CheckContext, 'pieces'> & { pieces?: readonly Piece[]; stockFor?: (material: string) => StockSheet | undefined },
): Check[] {
  const full: CheckContext = { ...ctx, pieces: ctx.pieces ?? pieces };
  const out: Check[] = [];
  for (const p of pieces) {
    const stock = ctx.stockFor ? ctx.stockFor(p.material) : ctx.stock;
    out.push(...checkPiece(p, { ...full, stock }));
  }
  return out;
}
