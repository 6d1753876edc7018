/**
 * One piece of the cutting template, drawn: its exact outline from shared/geometry (any shape),
 * score lines, glue tabs with notches spaced evenly, a tag's hole, a circle's centre mark, its
 * grain arrow and its label (name, size, material, which of two near-equal circles is larger).
 * A piece larger than the printable area is split into overlapping parts (shared/geometry's
 * tileLength), each part a box of its own with the overlap hatched, a red join line, triangles
 * that meet when the parts are joined, and "join A to A" in its label.
 *
 * Everything here is in the piece's drawn frame (turned a quarter when that fits better), in
 * inches; sizes that decide the layout (boxes, parts, joins) stay exact fractions.
 */
import Fraction from 'fraction.js';
import { notchMarks, pieceExtent, pieceGrainAxis, SHAPE_LABELS, shapeOutline, shapeSummary, tileLength, type TileSpan } from '@shared/geometry';
import { compareLengths, formatLength, ROUND_SHAPES, subtractLengths, toInches, inches, type Piece, type RulerPrecision } from '@shared/measure';
import { measureText } from './fonts';
import { pieceSizeText } from './sizes';
import { arrowHead, boxH, boxW, hatch, intersect, translate, turnBox, turnQuarter, type Box, type TemplateShape } from './template-shapes';

// Layout constants, exact, in inches.
/** Room for scissors between two boxes. */
export const GAP = new Fraction(1, 4);
export const PAD = new Fraction(1, 16);
/** One 7 pt label line. */
export const LINE = new Fraction(1, 8);
export const LABEL_PT = 7;
/** Room round a tiled part for its join marks. */
export const MARK = new Fraction(3, 8);
/** Overlap of two printed parts: 1/2 in, room for tape (common practice). */
export const OVERLAP = new Fraction(1, 2);
/** Two round pieces this close in size are easy to mix up, so their labels say which is larger (our choice). */
export const NEAR_EQUAL = inches([1, 4]);
/** Label lines reserved under a tiled part when working out how long a part may be. */
const TILE_LABEL_LINES = 6;
const PT = 72;

const num = (f: Fraction): number => f.valueOf();
const maxF = (a: Fraction, b: Fraction) => (a.compare(b) >= 0 ? a : b);

/** Label text width in inches at the label size. */
export function textWidthIn(s: string, bold = false, sizePt = LABEL_PT): number {
  return measureText(s, bold ? 'sans-bold' : 'sans', sizePt) / PT;
}

/** Greedy word wrap to `width` inches; a word longer than the width gets a line of its own. */
export function wrapWords(text: string, width: number, bold = false, sizePt = LABEL_PT): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const w of words) {
    const next = line ? `${line} ${w}` : w;
    if (line && textWidthIn(next, bold, sizePt) > width) {
      lines.push(line);
      line = w;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** A piece in its drawn frame, before it is split or placed. */
export interface PieceDrawing {
  index: number;
  piece: Piece;
  turned: boolean;
  /** Size in the drawn frame, exact. */
  w: Fraction;
  h: Fraction;
  shapes: TemplateShape[];
  /** Where a label may sit (between score lines, inside the outline), largest first. */
  panels: Box[];
  /** The grain's axis as drawn, or null for any grain. */
  grainAxis: 'x' | 'y' | null;
  /** Label lines without the part's own words; the first is the name. */
  lines: string[];
}

/** Why a piece cannot be drawn, in words. */
export interface DrawingError {
  error: string;
}

const isRound = (p: Pick<Piece, 'shape'>) => ROUND_SHAPES.includes(p.shape);

/** "6 3/8 in diameter · 161.9 mm", "oval 4 x 6 in · 101.6 x 152.4 mm": the crafter's unit first. */
export function sizeLine(p: Piece, precision: RulerPrecision): string {
  const round = isRound(p);
  const size = pieceSizeText({ shape: round ? 'circle' : 'rect', width: p.width, height: p.height }, precision);
  const plain = (s: string) => s.replace(/ circle$/, '');
  const [first, second] = size.primary === 'in' ? [size.inches, size.mm] : [size.mm, size.inches];
  const prefix = p.shape === 'rect' || p.shape === 'circle' ? '' : `${SHAPE_LABELS[p.shape]} `;
  return round ? `${prefix}${plain(first)} diameter · ${plain(second)}` : `${prefix}${first} · ${second}`;
}

/**
 * For round pieces within 1/4 in of another round piece (a lid and a base), which is larger and
 * by how much: "the larger: +1/16 in over Base circle". Keyed by the piece's index.
 */
export function nearEqualNotes(pieces: readonly Piece[]): Map<number, string[]> {
  const out = new Map<number, string[]>();
  const add = (i: number, s: string) => out.set(i, [...(out.get(i) ?? []), s]);
  const round = pieces.map((p, i) => ({ p, i })).filter(({ p }) => isRound(p) && toInches(p.width).compare(0) > 0);
  for (let a = 0; a < round.length; a++) {
    for (let b = a + 1; b < round.length; b++) {
      const [x, y] = [round[a]!, round[b]!];
      const c = compareLengths(x.p.width, y.p.width);
      if (c === 0) continue;
      const [big, small] = c > 0 ? [x, y] : [y, x];
      const diff = subtractLengths(big.p.width, small.p.width);
      if (compareLengths(diff, NEAR_EQUAL) > 0) continue;
      // The difference in the larger piece's own unit ("1/16 in", "1.5 mm").
      const text = formatLength(diff.unit === big.p.width.unit ? diff : { value: diff.value, unit: diff.unit });
      add(big.i, `the larger: +${text} over ${small.p.name}`);
      add(small.i, `the smaller: ${text} under ${big.p.name}`);
    }
  }
  return out;
}

function grainWords(p: Piece): string {
  if (!p.grain || p.grain === 'any') return '';
  return `grain along its ${p.grain}`;
}

/** The label's lines for a piece drawn once ("x2": cut two) or copy by copy. */
export function labelLines(p: Piece, precision: RulerPrecision, copies: 'one' | 'quantity', notes: readonly string[]): string[] {
  const name = copies === 'one' && p.quantity > 1 ? `${p.name} x${p.quantity}` : p.name;
  const summary = shapeSummary(p);
  const third = [p.material, summary, grainWords(p)].filter(Boolean).join(' · ');
  return [name, sizeLine(p, precision), third, ...notes].filter(Boolean);
}

/** Splits a box into panels at the score lines that cross it. */
function splitPanels(region: Box, xs: number[], ys: number[]): Box[] {
  const cutsX = [region.x0, ...xs.filter((x) => x > region.x0 + 1e-9 && x < region.x1 - 1e-9).sort((a, b) => a - b), region.x1];
  const cutsY = [region.y0, ...ys.filter((y) => y > region.y0 + 1e-9 && y < region.y1 - 1e-9).sort((a, b) => a - b), region.y1];
  const out: Box[] = [];
  for (let i = 0; i + 1 < cutsX.length; i++)
    for (let j = 0; j + 1 < cutsY.length; j++) out.push({ x0: cutsX[i]!, y0: cutsY[j]!, x1: cutsX[i + 1]!, y1: cutsY[j + 1]! });
  return out.sort((a, b) => boxW(b) * boxH(b) - boxW(a) * boxH(a));
}

/** The part of the outline where text reads clear of its curves, holes and centre mark (upright frame). */
function labelRegion(p: Piece, w: number, h: number): Box {
  const params = p.params ?? {};
  switch (p.shape) {
    case 'circle':
    case 'scalloped-circle': {
      // The square inscribed in the circle (inside the scallops' hollows), below the centre mark.
      const scallopDepth = p.shape === 'scalloped-circle' ? num(toInches(params.scallopSize ?? inches([1, 2]))) : 0;
      const s = (w - 2 * scallopDepth) / Math.SQRT2;
      return { x0: (w - s) / 2, y0: h / 2 + 3 / 16, x1: (w + s) / 2, y1: (h + s) / 2 };
    }
    case 'oval':
      return { x0: (w - w / Math.SQRT2) / 2, y0: (h - h / Math.SQRT2) / 2, x1: (w + w / Math.SQRT2) / 2, y1: (h + h / Math.SQRT2) / 2 };
    case 'rounded-rect': {
      const r = params.cornerRadius ? num(toInches(params.cornerRadius)) * (1 - Math.SQRT1_2) : 0;
      return { x0: r, y0: r, x1: w - r, y1: h - r };
    }
    case 'scalloped-rect': {
      const d = num(toInches(params.scallopSize ?? inches([1, 2])));
      return { x0: d, y0: d, x1: w - d, y1: h - d };
    }
    case 'tag': {
      const o = shapeOutline(p);
      const below = o.holes.length ? o.holes[0]!.cy + o.holes[0]!.r + 1 / 8 : num(toInches(params.tagCorner ?? inches([3, 8])));
      return { x0: 0, y0: Math.min(below, h), x1: w, y1: h };
    }
    case 'pillow-box': {
      // The first panel, between its curved end scores.
      const W = num(toInches(p.width));
      const L = num(toInches(p.height));
      const s = params.depth ? num(toInches(params.depth)) / 2 : 0;
      return { x0: 0, y0: 2 * s, x1: W, y1: s + L - s };
    }
    default:
      return { x0: 0, y0: 0, x1: w, y1: h };
  }
}

/**
 * The piece drawn in its frame: upright, or turned a quarter clockwise. Returns the reason when
 * its sizes cannot make its shape (the cut list's checks say the same).
 */
export function drawPiece(p: Piece, index: number, turned: boolean, options: { notchTabs: boolean; lines: string[] }): PieceDrawing | DrawingError {
  const ext = pieceExtent(p);
  const W = toInches(ext.width);
  const H = toInches(ext.height);
  if (W.compare(0) <= 0 || H.compare(0) <= 0) return { error: `no size in the cut list (${formatLength(p.width)} x ${formatLength(p.height)})` };
  let outline;
  try {
    outline = shapeOutline(p);
  } catch (e) {
    if (e instanceof RangeError) return { error: e.message };
    throw e;
  }
  const w = num(W);
  const h = num(H);
  const shapes: TemplateShape[] = [];
  if (p.shape === 'rect') shapes.push({ kind: 'rect', layer: 'cut', x: 0, y: 0, w, h });
  else if (p.shape === 'circle') shapes.push({ kind: 'circle', layer: 'cut', cx: w / 2, cy: h / 2, r: w / 2 });
  else shapes.push({ kind: 'path', layer: 'cut', d: outline.cut });
  for (const hole of outline.holes) shapes.push({ kind: 'circle', layer: 'cut', cx: hole.cx, cy: hole.cy, r: hole.r });
  for (const s of outline.scores) shapes.push({ kind: 'path', layer: 'score', style: 'dashed', d: s });
  for (const f of outline.flaps) shapes.push({ kind: 'path', layer: 'tab', style: 'shaded', d: f });
  if (outline.centre && isRound(p)) {
    // A cross for a compass point or a circle cutter's pin.
    const { x, y } = outline.centre;
    const arm = 1 / 8;
    shapes.push({ kind: 'line', layer: 'mark', x1: x - arm, y1: y, x2: x + arm, y2: y });
    shapes.push({ kind: 'line', layer: 'mark', x1: x, y1: y - arm, x2: x, y2: y + arm });
  }
  const elliptic = p.shape === 'circle' || p.shape === 'oval' || p.shape === 'scalloped-circle';
  const xs: number[] = [];
  const ys: number[] = [];
  for (const l of p.scoreLines) {
    const at = toInches(l.at);
    const a = num(at);
    const vertical = l.axis === 'width';
    const size = vertical ? W : H;
    if (at.compare(0) <= 0 || at.compare(size) >= 0) continue;
    (vertical ? xs : ys).push(a);
    // Across an ellipse a score line is its chord; across anything else, the whole piece.
    let from = 0;
    let to = vertical ? h : w;
    if (elliptic) {
      const [r, q] = vertical ? [w / 2, h / 2] : [h / 2, w / 2];
      const half = q * Math.sqrt(Math.max(0, 1 - ((a - r) / r) ** 2));
      [from, to] = [q - half, q + half];
    }
    if (vertical) shapes.push({ kind: 'line', layer: 'score', style: 'dashed', x1: a, y1: from, x2: a, y2: to });
    else shapes.push({ kind: 'line', layer: 'score', style: 'dashed', x1: from, y1: a, x2: to, y2: a });
    if (!l.tab || p.shape !== 'rect') continue;
    // The tab is the narrow side of its fold (the far side on a tie).
    const far = size.sub(at).compare(at) <= 0;
    const [t0, t1] = far ? [a, num(size)] : [0, a];
    if (vertical) shapes.push({ kind: 'rect', layer: 'tab', style: 'shaded', x: t0, y: 0, w: t1 - t0, h });
    else shapes.push({ kind: 'rect', layer: 'tab', style: 'shaded', x: 0, y: t0, w, h: t1 - t0 });
    if (!options.notchTabs) continue;
    // Notches from the tab's edge to its fold, spaced evenly and centred (shared/geometry).
    const along = vertical ? ext.height : ext.width;
    const edge = far ? num(size) : 0;
    for (const pos of notchMarks({ length: along }).positions) {
      const s = num(toInches(pos));
      if (vertical) shapes.push({ kind: 'line', layer: 'notch', x1: edge, y1: s, x2: a, y2: s });
      else shapes.push({ kind: 'line', layer: 'notch', x1: s, y1: edge, x2: s, y2: a });
    }
  }
  const panels = splitPanels(labelRegion(p, w, h), xs, ys);
  const axis = pieceGrainAxis(p);
  if (!turned) return { index, piece: p, turned, w: W, h: H, shapes, panels, grainAxis: axis, lines: options.lines };
  return {
    index,
    piece: p,
    turned,
    w: H,
    h: W,
    shapes: shapes.map((s) => turnQuarter(s, h)),
    panels: panels.map((b) => turnBox(b, h)).sort((a, b) => boxW(b) * boxH(b) - boxW(a) * boxH(a)),
    grainAxis: axis === null ? null : axis === 'x' ? 'y' : 'x',
    lines: options.lines,
  };
}

/** A join between two parts of a tiled piece, as one of them sees it. */
export interface PartJoin {
  letter: string;
  /** 'v': a vertical join line at x = at; 'h': a horizontal one at y = at (drawn frame, inches). */
  dir: 'v' | 'h';
  at: number;
  /** 'before': this part is trimmed on the line and laid on the next; 'after': this part's overlap lies under the one before. */
  side: 'before' | 'after';
}

/** One box the template lays out: a whole piece or one part of a tiled one. */
export interface PartBox {
  drawing: PieceDrawing;
  /** Column and row of the part, and how many there are; null for a whole piece. */
  tile: { col: number; row: number; cols: number; rows: number } | null;
  /** The window of the drawn frame this box shows, exact. */
  window: { x0: Fraction; y0: Fraction; x1: Fraction; y1: Fraction };
  joins: PartJoin[];
  /** Where the drawn frame's (0, 0) sits inside the box. */
  offset: { x: number; y: number };
  /** Box size for the layout, gap included (exact). */
  boxW: Fraction;
  boxH: Fraction;
  /** The box's shapes, relative to its top-left corner. */
  shapes: TemplateShape[];
}

/** Letters for joins: A..Z, then AA, AB, ... */
export function joinLetter(n: number): string {
  let s = '';
  let k = n;
  do {
    s = String.fromCharCode(65 + (k % 26)) + s;
    k = Math.floor(k / 26) - 1;
  } while (k >= 0);
  return s;
}

/** Does a label of these lines fit a panel, with `PAD` all round? */
function fitsIn(lines: string[], b: Box): boolean {
  const pad = num(PAD) * 2;
  return lines.length * num(LINE) + pad <= boxH(b) + 1e-9 && lines.every((l, i) => textWidthIn(l, i === 0) + pad <= boxW(b) + 1e-9);
}

/** Label lines tried from the most compact: name and size on one line, then each on its own, then wrapped. */
function labelChoices(lines: string[], width: number): string[][] {
  const [name, ...rest] = lines;
  const choices: string[][] = [];
  if (rest.length) choices.push([`${name} · ${rest[0]}`, ...rest.slice(1)]);
  choices.push(lines);
  choices.push(lines.flatMap((l, i) => wrapWords(l, width, i === 0)));
  return choices;
}

/** A grain arrow along `axis`, centred in the box's strip on the far side (bottom or right). */
function grainArrow(axis: 'x' | 'y', b: Box): TemplateShape[] {
  const head = 1 / 10;
  if (axis === 'x') {
    const len = Math.min(1.25, boxW(b) * 0.6);
    const cx = (b.x0 + b.x1) / 2;
    const y = b.y1 - 3 / 16;
    return [
      { kind: 'line', layer: 'mark', x1: cx - len / 2 + head, y1: y, x2: cx + len / 2 - head, y2: y },
      arrowHead(cx - len / 2, y, 'left', head, 'mark'),
      arrowHead(cx + len / 2, y, 'right', head, 'mark'),
      { kind: 'text', layer: 'mark', x: cx, y: y - 0.05, text: 'grain', sizePt: 6, anchor: 'middle' },
    ];
  }
  const len = Math.min(1.25, boxH(b) * 0.6);
  const cy = (b.y0 + b.y1) / 2;
  const x = b.x1 - 3 / 16;
  return [
    { kind: 'line', layer: 'mark', x1: x, y1: cy - len / 2 + head, x2: x, y2: cy + len / 2 - head },
    arrowHead(x, cy - len / 2, 'up', head, 'mark'),
    arrowHead(x, cy + len / 2, 'down', head, 'mark'),
    { kind: 'text', layer: 'mark', x: x - 0.06, y: cy + 0.03, text: 'grain', sizePt: 6, anchor: 'end' },
  ];
}

/** Room a grain arrow takes across its axis. */
const ARROW_ROOM = 3 / 8;

/**
 * Places the label and the grain arrow for the visible part of a drawing: inside the largest panel
 * that holds both, else the arrow inside and the label in a band under the box.
 */
function placeLabel(
  d: PieceDrawing,
  lines: string[],
  visible: Box,
): { inside: { lines: string[]; box: Box } | null; arrow: TemplateShape[]; bandLines: (width: number) => string[] } {
  const panels = d.panels.map((p) => intersect(p, visible)).filter((b): b is Box => b !== null);
  panels.sort((a, b) => boxW(b) * boxH(b) - boxW(a) * boxH(a));
  const arrowFits = (b: Box) => (d.grainAxis === 'x' ? boxW(b) >= 0.6 && boxH(b) >= ARROW_ROOM + 0.1 : boxH(b) >= 0.6 && boxW(b) >= ARROW_ROOM + 0.1);
  const textRoom = (b: Box): Box =>
    d.grainAxis === null || !arrowFits(b) ? b : d.grainAxis === 'x' ? { ...b, y1: b.y1 - ARROW_ROOM } : { ...b, x1: b.x1 - ARROW_ROOM };
  for (const panel of panels) {
    const room = textRoom(panel);
    const fit = labelChoices(lines, boxW(room) - num(PAD) * 2).find((c) => fitsIn(c, room));
    if (fit) return { inside: { lines: fit, box: room }, arrow: d.grainAxis && arrowFits(panel) ? grainArrow(d.grainAxis, panel) : [], bandLines: () => [] };
  }
  const roomy = panels.find(arrowFits);
  return {
    inside: null,
    arrow: d.grainAxis && roomy ? grainArrow(d.grainAxis, roomy) : [],
    bandLines: (width) => labelChoices(lines, width).find((c) => c.every((l, i) => textWidthIn(l, i === 0) <= width)) ?? labelChoices(lines, width).at(-1)!,
  };
}

function labelText(lines: string[], x: number, top: number, anchor: 'start' | 'middle'): TemplateShape[] {
  const line = num(LINE);
  return lines.map((text, i) => ({ kind: 'text', layer: 'label', x, y: top + i * line + line * 0.75, text, sizePt: LABEL_PT, bold: i === 0, anchor }));
}

/** The box for a whole piece, with its label inside when it fits, else in a band under it. */
export function wholeBox(d: PieceDrawing): PartBox {
  const full: Box = { x0: 0, y0: 0, x1: num(d.w), y1: num(d.h) };
  const place = placeLabel(d, d.lines, full);
  const shapes = [...d.shapes, ...place.arrow];
  let boxW = d.w.add(GAP);
  let boxH = d.h.add(GAP);
  if (place.inside) {
    const { lines, box } = place.inside;
    shapes.push(...labelText(lines, (box.x0 + box.x1) / 2, (box.y0 + box.y1) / 2 - (lines.length * num(LINE)) / 2, 'middle'));
  } else {
    // Under the piece, at least 1 3/4 in wide so short pieces still get readable lines.
    const width = Math.max(num(d.w), 1.75);
    const lines = place.bandLines(width);
    shapes.push(...labelText(lines, 0, num(d.h) + num(PAD) / 2, 'start'));
    const widest = Math.max(...lines.map((l, i) => textWidthIn(l, i === 0)));
    // Round the label's width up to 1/16 in so the box stays on the planner's exact grid.
    boxW = maxF(d.w, new Fraction(Math.ceil(widest * 16), 16)).add(GAP);
    boxH = d.h.add(LINE.mul(lines.length)).add(PAD).add(GAP);
  }
  const zero = new Fraction(0);
  return { drawing: d, tile: null, window: { x0: zero, y0: zero, x1: d.w, y1: d.h }, joins: [], offset: { x: 0, y: 0 }, boxW, boxH, shapes };
}

/** Does a box fit a page's printable area (gap included)? */
export function boxFits(b: Pick<PartBox, 'boxW' | 'boxH'>, W: Fraction, H: Fraction): boolean {
  return b.boxW.compare(W.add(GAP)) <= 0 && b.boxH.compare(H.add(GAP)) <= 0;
}

/** How many parts a drawing takes on a printable area W x H when tiled. */
export function tilingOf(d: PieceDrawing, W: Fraction, H: Fraction): { cols: TileSpan[]; rows: TileSpan[]; colJoins: Fraction[]; rowJoins: Fraction[] } {
  const maxW = W.sub(MARK.mul(2));
  const maxH = H.sub(MARK.mul(2)).sub(LINE.mul(TILE_LABEL_LINES)).sub(PAD);
  const x = tileLength(d.w, maxW, OVERLAP);
  const y = tileLength(d.h, maxH, OVERLAP);
  return { cols: x.spans, rows: y.spans, colJoins: x.joins, rowJoins: y.joins };
}

/**
 * The parts of a tiled drawing, each a box: the piece clipped to its window, the overlap hatched
 * where the part before lies, red join lines with triangles that meet across the join, and the
 * label ("part 1 of 2", "join A to A"). `nextLetter` hands out the join letters.
 */
export function tiledBoxes(d: PieceDrawing, W: Fraction, H: Fraction, nextLetter: () => string): PartBox[] {
  const t = tilingOf(d, W, H);
  const cols = t.cols.length;
  const rows = t.rows.length;
  // One letter per join: vertical joins per row, horizontal joins per column.
  const vLetters = t.colJoins.map(() => t.rows.map(() => nextLetter()));
  const hLetters = t.rowJoins.map(() => t.cols.map(() => nextLetter()));
  const m = num(MARK);
  const ov = num(OVERLAP);
  const bleed = 1 / 32;
  const out: PartBox[] = [];
  const count = cols * rows;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const win = { x0: t.cols[c]!.start, y0: t.rows[r]!.start, x1: t.cols[c]!.end, y1: t.rows[r]!.end };
      const [x0, y0, x1, y1] = [num(win.x0), num(win.y0), num(win.x1), num(win.y1)];
      const joins: PartJoin[] = [];
      if (c > 0) joins.push({ letter: vLetters[c - 1]![r]!, dir: 'v', at: x0 + ov, side: 'after' });
      if (c < cols - 1) joins.push({ letter: vLetters[c]![r]!, dir: 'v', at: x1, side: 'before' });
      if (r > 0) joins.push({ letter: hLetters[r - 1]![c]!, dir: 'h', at: y0 + ov, side: 'after' });
      if (r < rows - 1) joins.push({ letter: hLetters[r]![c]!, dir: 'h', at: y1, side: 'before' });
      // The piece, clipped to the window: exactly at a join, a hair wider at the piece's own edges so its cut line is whole.
      const clip = {
        x: x0 - (c === 0 ? bleed : 0),
        y: y0 - (r === 0 ? bleed : 0),
        w: x1 - x0 + (c === 0 ? bleed : 0) + (c === cols - 1 ? bleed : 0),
        h: y1 - y0 + (r === 0 ? bleed : 0) + (r === rows - 1 ? bleed : 0),
      };
      const shapes: TemplateShape[] = d.shapes.map((s) => ({ ...s, clip }));
      // The overlap zones: where the part before (left, above) lies once joined.
      if (c > 0) shapes.push(...hatch({ x0, y0, x1: x0 + ov, y1 }, 1 / 8));
      if (r > 0) shapes.push(...hatch({ x0: c > 0 ? x0 + ov : x0, y0, x1, y1: y0 + ov }, 1 / 8));
      for (const j of joins) shapes.push(...joinMarks(j, { x0, y0, x1, y1 }, m));
      const visible: Box = { x0: c > 0 ? x0 + ov : x0, y0: r > 0 ? y0 + ov : y0, x1, y1 };
      const name = `${d.lines[0]} · part ${r * cols + c + 1} of ${count}`;
      const joinText = `join ${joins.map((j) => `${j.letter} to ${j.letter}`).join(', ')}`;
      const lines = [name, ...d.lines.slice(1), joinText];
      const place = placeLabel(d, lines, visible);
      shapes.push(...place.arrow);
      const winW = win.x1.sub(win.x0);
      const winH = win.y1.sub(win.y0);
      let boxW = winW.add(MARK.mul(2)).add(GAP);
      let boxH = winH.add(MARK.mul(2)).add(GAP);
      if (place.inside) {
        const { lines: fit, box } = place.inside;
        shapes.push(...labelText(fit, (box.x0 + box.x1) / 2, (box.y0 + box.y1) / 2 - (fit.length * num(LINE)) / 2, 'middle'));
      } else {
        const width = Math.max(x1 - x0 + 2 * m, 1.75);
        const fit = place.bandLines(width);
        shapes.push(...labelText(fit, x0 - m, y1 + m + num(PAD) / 2, 'start'));
        const widest = Math.max(...fit.map((l, i) => textWidthIn(l, i === 0)));
        boxW = maxF(winW.add(MARK.mul(2)), new Fraction(Math.ceil(widest * 16), 16)).add(GAP);
        boxH = boxH.add(LINE.mul(fit.length)).add(PAD);
      }
      // Box coordinates: the window starts MARK in from the box's corner.
      const offset = { x: m - x0, y: m - y0 };
      out.push({
        drawing: d,
        tile: { col: c, row: r, cols, rows },
        window: win,
        joins,
        offset,
        boxW,
        boxH,
        shapes: shapes.map((s) => translate(s, offset.x, offset.y)),
      });
    }
  }
  return out;
}

/** A join's red line across the part and its mark room, with a triangle and the letter at each end. */
function joinMarks(j: PartJoin, win: Box, m: number): TemplateShape[] {
  const out: TemplateShape[] = [];
  const reach = m * 0.8;
  const tri = 1 / 8;
  if (j.dir === 'v') {
    out.push({ kind: 'line', layer: 'join', x1: j.at, y1: win.y0 - reach, x2: j.at, y2: win.y1 + reach });
    // The part before points right at the line from its left; the part after points left at it from its right.
    const dir = j.side === 'before' ? 'right' : 'left';
    for (const y of [win.y0 - m / 2 - tri / 2, win.y1 + m / 2 + tri / 2]) {
      out.push(arrowHead(j.at, y, dir, tri, 'join'));
      const tx = j.side === 'before' ? j.at - tri - 0.03 : j.at + tri + 0.03;
      out.push({ kind: 'text', layer: 'label', x: tx, y: y + 0.035, text: j.letter, sizePt: 7, bold: true, anchor: j.side === 'before' ? 'end' : 'start' });
    }
  } else {
    out.push({ kind: 'line', layer: 'join', x1: win.x0 - reach, y1: j.at, x2: win.x1 + reach, y2: j.at });
    const dir = j.side === 'before' ? 'down' : 'up';
    for (const x of [win.x0 - m / 2 - tri / 2, win.x1 + m / 2 + tri / 2]) {
      out.push(arrowHead(x, j.at, dir, tri, 'join'));
      const ty = j.side === 'before' ? j.at - tri - 0.03 : j.at + tri + 0.1;
      out.push({ kind: 'text', layer: 'label', x, y: ty, text: j.letter, sizePt: 7, bold: true, anchor: 'middle' });
    }
  }
  return out;
}
