/**
 * The 1:1 cutting template (P3): every piece of the cut list drawn to size, laid out over as
 * many pages as needed with the shared sheet planner, as SVG pages (width and height in
 * physical units, so they import into cutting software at size) and as a PDF.
 *
 * One layout feeds both outputs: positions are worked out exactly in inches (fractions) and
 * only turned into floats when drawn.
 *
 * Choices: each piece is drawn once with "x2" in its label (a template is traced or cut out
 * and reused; `copies: 'quantity'` draws every copy instead). A piece larger than the printable
 * area even when turned is not tiled: page 1 lists it with its size and "larger than the page:
 * cut by measurement".
 */
import Fraction from 'fraction.js';
import PDFDocument from 'pdfkit';
import { planSheets, type PlanPiece } from '@shared/geometry';
import { DEFAULT_PRECISION, formatLength, inches, toInches, type Length, type Piece, type RulerPrecision } from '@shared/measure';
import { measureText, printable, registerFonts } from './fonts';
import { pdfBuffer } from './pdf-buffer';
import { paperSize, pieceSizeText, scoreLineText, type PaperSize } from './sizes';
import type { Paper } from './types';

export interface TemplateOptions {
  paper: Paper;
  /** The tutorial's title, printed in the page header. */
  title?: string;
  /** Ruler precision for the inch sizes of pieces given in millimetres. */
  precision?: RulerPrecision;
  /** 'one' (default): each piece once, "x2" in its label; 'quantity': every copy drawn. */
  copies?: 'one' | 'quantity';
}

/** What a shape is for; decides its stroke, fill and SVG group. */
export type TemplateLayer = 'cut' | 'score' | 'tab' | 'notch' | 'square' | 'label' | 'legend';

/** A shape on a template page. Coordinates in inches from the page's top-left corner. */
export type TemplateShape =
  | { kind: 'rect'; layer: TemplateLayer; x: number; y: number; w: number; h: number; style?: 'dashed' | 'shaded' }
  | { kind: 'circle'; layer: TemplateLayer; cx: number; cy: number; r: number }
  | { kind: 'line'; layer: TemplateLayer; x1: number; y1: number; x2: number; y2: number; style?: 'dashed' }
  | { kind: 'text'; layer: TemplateLayer; x: number; y: number; text: string; sizePt: number; bold?: boolean; anchor: 'start' | 'middle' };

export interface TemplatePage {
  /** From 1. */
  number: number;
  shapes: TemplateShape[];
}

/** A piece the template does not draw, with the size to cut it by. */
export interface TemplateOmission {
  piece: string;
  text: string;
}

export interface TemplateLayout {
  paper: PaperSize;
  pages: TemplatePage[];
  omitted: TemplateOmission[];
}

// Layout constants, exact, in inches.
const MARGIN = new Fraction(1, 2);
// Room for scissors between two pieces.
const GAP = new Fraction(1, 4);
const PAD = new Fraction(1, 16);
const LABEL_PT = 7;
// 9 pt: one label line.
const LINE = new Fraction(1, 8);
const OMITTED_LINE = new Fraction(3, 16);
const SQUARE_IN = inches(1);
// 25 mm = 125/127 in exactly (1 in = 25.4 mm, NIST SP 811).
const SQUARE_MM: Length = { value: new Fraction(25), unit: 'mm' };
// Notches along a tab that bends around a curve: every 1/2 in (common practice).
const NOTCH_STEP = new Fraction(1, 2);
const PT = 72;

const num = (f: Fraction): number => f.valueOf();
const maxF = (a: Fraction, b: Fraction) => (a.compare(b) >= 0 ? a : b);
const ptToIn = (pt: number) => pt / PT;

/** A score line in the drawn orientation: 'v' runs top to bottom at x = at, 'h' left to right at y = at. */
interface DrawnLine {
  dir: 'v' | 'h';
  at: Fraction;
  tab: boolean;
}

interface Prepared {
  index: number;
  piece: Piece;
  w: Fraction;
  h: Fraction;
  turned: boolean;
  lines: DrawnLine[];
  label: string[];
  /** Centre of the label when it sits inside the piece, relative to the piece's corner. */
  inside: { cx: Fraction; cy: Fraction } | null;
  /** Height of the label band under the piece (0 when the label is inside). */
  band: Fraction;
  boxW: Fraction;
  boxH: Fraction;
}

function textWidthIn(s: string, bold = false): number {
  return ptToIn(measureText(s, bold ? 'sans-bold' : 'sans', LABEL_PT));
}

/** Greedy word wrap to `width` inches; a word longer than the width gets a line of its own. */
function wrapWords(text: string, width: number): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const w of words) {
    const next = line ? `${line} ${w}` : w;
    if (line && textWidthIn(next) > width) {
      lines.push(line);
      line = w;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** "6 1/8 in diameter · 155.6 mm" for a circle, "10 9/16 x 2 1/2 in · 268.3 x 63.5 mm" for the rest; the crafter's unit first. */
function sizeParts(p: Piece, precision: RulerPrecision): [string, string] {
  const size = pieceSizeText(p, precision);
  const plain = (s: string) => s.replace(/ circle$/, '');
  const [first, second] = size.primary === 'in' ? [size.inches, size.mm] : [size.mm, size.inches];
  return p.shape === 'circle' ? [`${plain(first)} diameter`, plain(second)] : [first, second];
}

function labelParts(p: Piece, precision: RulerPrecision, copies: 'one' | 'quantity'): [string, string, string] {
  const name = copies === 'one' && p.quantity > 1 ? `${p.name} x${p.quantity}` : p.name;
  return [name, ...sizeParts(p, precision)];
}

/** Label line options from the most compact to the tallest that fits `width`. */
function labelChoices(parts: [string, string, string], width: number): string[][] {
  const [name, a, b] = parts;
  const choices = [[`${name} ${a} · ${b}`], [name, `${a} · ${b}`], [name, a, b]];
  // The first line (the name) is set in the bold face.
  return choices.filter((c) => c.every((l, i) => textWidthIn(l, i === 0) <= width));
}

function drawnLines(p: Piece, turned: boolean): DrawnLine[] {
  if (p.shape === 'circle') return p.scoreLines.map((s) => ({ dir: s.axis === 'width' ? 'v' : 'h', at: toInches(s.at), tab: !!s.tab }));
  const h = toInches(p.height);
  return p.scoreLines.map((s) => {
    const at = toInches(s.at);
    if (!turned) return { dir: s.axis === 'width' ? 'v' : 'h', at, tab: !!s.tab };
    // Turned a quarter clockwise: (x, y) -> (h - y, x), so a line across the width becomes horizontal.
    return s.axis === 'width' ? { dir: 'h', at, tab: !!s.tab } : { dir: 'v', at: h.sub(at), tab: !!s.tab };
  });
}

/** The largest panel between score lines (where a label reads best), as [x0, y0, x1, y1]. */
function largestPanel(w: Fraction, h: Fraction, lines: DrawnLine[]): [Fraction, Fraction, Fraction, Fraction] {
  const cuts = (dir: 'v' | 'h', size: Fraction) => {
    const inside = lines.filter((l) => l.dir === dir && l.at.compare(0) > 0 && l.at.compare(size) < 0).map((l) => l.at);
    return [new Fraction(0), ...inside.sort((a, b) => a.compare(b)), size];
  };
  const xs = cuts('v', w);
  const ys = cuts('h', h);
  let best: [Fraction, Fraction, Fraction, Fraction] = [new Fraction(0), new Fraction(0), w, h];
  let bestArea = new Fraction(-1);
  for (let i = 0; i + 1 < xs.length; i++) {
    for (let j = 0; j + 1 < ys.length; j++) {
      const area = xs[i + 1]!.sub(xs[i]!).mul(ys[j + 1]!.sub(ys[j]!));
      if (area.compare(bestArea) > 0) {
        bestArea = area;
        best = [xs[i]!, ys[j]!, xs[i + 1]!, ys[j + 1]!];
      }
    }
  }
  return best;
}

function prepare(p: Piece, index: number, turned: boolean, precision: RulerPrecision, copies: 'one' | 'quantity'): Prepared {
  const pw = toInches(p.width);
  const ph = p.shape === 'circle' ? pw : toInches(p.height);
  const w = turned ? ph : pw;
  const h = turned ? pw : ph;
  const lines = drawnLines(p, turned);
  const parts = labelParts(p, precision, copies);
  const pad2 = num(PAD) * 2;

  let inside: Prepared['inside'] = null;
  let label: string[] | null = null;
  if (p.shape === 'circle') {
    // The square inscribed in the circle.
    const side = num(w) / Math.SQRT2;
    const fit = labelChoices(parts, side - pad2).find((c) => c.length * num(LINE) + pad2 <= side);
    if (fit) {
      label = fit;
      inside = { cx: w.div(2), cy: h.div(2) };
    }
  } else {
    const [x0, y0, x1, y1] = largestPanel(w, h, lines);
    const fit = labelChoices(parts, num(x1.sub(x0)) - pad2).find((c) => c.length * num(LINE) + pad2 <= num(y1.sub(y0)));
    if (fit) {
      label = fit;
      inside = { cx: x0.add(x1).div(2), cy: y0.add(y1).div(2) };
    }
  }
  let band = new Fraction(0);
  let boxW = w.add(GAP);
  if (!label) {
    // Under the piece, at least 1 1/2 in wide so short pieces still get readable lines.
    const width = Math.max(num(w), 1.5);
    label = labelChoices(parts, width)[0] ?? parts.flatMap((part) => wrapWords(part, width));
    const widest = Math.max(...label.map((l, i) => textWidthIn(l, i === 0)));
    // Round the label's width up to 1/16 in so the box stays on the planner's exact grid.
    const labelW = new Fraction(Math.ceil(widest * 16), 16);
    boxW = maxF(w, labelW).add(GAP);
    band = LINE.mul(label.length).add(PAD);
  }
  return { index, piece: p, w, h, turned, lines, label, inside, band, boxW, boxH: h.add(band).add(GAP) };
}

function fits(pr: Prepared, W: Fraction, H: Fraction): boolean {
  return pr.boxW.compare(W.add(GAP)) <= 0 && pr.boxH.compare(H.add(GAP)) <= 0;
}

function pieceShapes(pr: Prepared, x0: Fraction, y0: Fraction, notchTabs: boolean): TemplateShape[] {
  const out: TemplateShape[] = [];
  const X = num(x0);
  const Y = num(y0);
  const w = num(pr.w);
  const h = num(pr.h);
  if (pr.piece.shape === 'circle') {
    const r = w / 2;
    out.push({ kind: 'circle', layer: 'cut', cx: X + r, cy: Y + r, r });
    for (const l of pr.lines) {
      const a = num(l.at);
      if (a <= 0 || a >= w) continue;
      // The chord of the circle at that distance from its edge.
      const half = Math.sqrt(r * r - (a - r) * (a - r));
      if (l.dir === 'v') out.push({ kind: 'line', layer: 'score', x1: X + a, y1: Y + r - half, x2: X + a, y2: Y + r + half, style: 'dashed' });
      else out.push({ kind: 'line', layer: 'score', x1: X + r - half, y1: Y + a, x2: X + r + half, y2: Y + a, style: 'dashed' });
    }
  } else {
    for (const l of pr.lines) {
      if (!l.tab) continue;
      const size = l.dir === 'v' ? pr.w : pr.h;
      const a = l.at;
      if (a.compare(0) <= 0 || a.compare(size) >= 0) continue;
      // The tab is the narrow side of its fold (the far side on a tie).
      const far = size.sub(a).compare(a) <= 0;
      const from = far ? a : new Fraction(0);
      const to = far ? size : a;
      if (l.dir === 'v') out.push({ kind: 'rect', layer: 'tab', x: X + num(from), y: Y, w: num(to.sub(from)), h, style: 'shaded' });
      else out.push({ kind: 'rect', layer: 'tab', x: X, y: Y + num(from), w, h: num(to.sub(from)), style: 'shaded' });
      if (!notchTabs) continue;
      // Notches from the tab's edge to its fold, so the tab bends around a curve.
      const along = l.dir === 'v' ? pr.h : pr.w;
      const edge = num(far ? size : new Fraction(0));
      for (let t = NOTCH_STEP; t.compare(along) < 0; t = t.add(NOTCH_STEP)) {
        const s = num(t);
        if (l.dir === 'v') out.push({ kind: 'line', layer: 'notch', x1: X + edge, y1: Y + s, x2: X + num(a), y2: Y + s });
        else out.push({ kind: 'line', layer: 'notch', x1: X + s, y1: Y + edge, x2: X + s, y2: Y + num(a) });
      }
    }
    out.push({ kind: 'rect', layer: 'cut', x: X, y: Y, w, h });
    for (const l of pr.lines) {
      const a = num(l.at);
      if (l.dir === 'v' ? a <= 0 || a >= w : a <= 0 || a >= h) continue;
      if (l.dir === 'v') out.push({ kind: 'line', layer: 'score', x1: X + a, y1: Y, x2: X + a, y2: Y + h, style: 'dashed' });
      else out.push({ kind: 'line', layer: 'score', x1: X, y1: Y + a, x2: X + w, y2: Y + a, style: 'dashed' });
    }
  }
  const line = num(LINE);
  if (pr.inside) {
    const top = Y + num(pr.inside.cy) - (pr.label.length * line) / 2;
    pr.label.forEach((text, i) => {
      out.push({ kind: 'text', layer: 'label', x: X + num(pr.inside!.cx), y: top + i * line + line * 0.75, text, sizePt: LABEL_PT, bold: i === 0, anchor: 'middle' });
    });
  } else {
    const top = Y + h + num(PAD) / 2;
    pr.label.forEach((text, i) => {
      out.push({ kind: 'text', layer: 'label', x: X, y: top + i * line + line * 0.75, text, sizePt: LABEL_PT, bold: i === 0, anchor: 'start' });
    });
  }
  return out;
}

function headerShapes(title: string | undefined, omitted: string[][], multiples: boolean, notchTabs: boolean): { shapes: TemplateShape[]; height: Fraction } {
  const M = num(MARGIN);
  const shapes: TemplateShape[] = [];
  shapes.push({ kind: 'text', layer: 'legend', x: M, y: M + 0.15, text: title ? `Cutting template: ${title}` : 'Cutting template', sizePt: 10, bold: true, anchor: 'start' });
  shapes.push({ kind: 'text', layer: 'legend', x: M, y: M + 0.35, text: 'Print at 100% (actual size); check the squares with a ruler.', sizePt: 9, anchor: 'start' });
  const top = MARGIN.add(new Fraction(1, 2));
  const inchSide = toInches(SQUARE_IN);
  const mmSide = toInches(SQUARE_MM);
  const mmX = MARGIN.add(inchSide).add(new Fraction(1, 4));
  shapes.push({ kind: 'rect', layer: 'square', x: M, y: num(top), w: num(inchSide), h: num(inchSide) });
  shapes.push({ kind: 'text', layer: 'square', x: M + num(inchSide) / 2, y: num(top) + num(inchSide) / 2 + 0.04, text: '1 in', sizePt: 8, anchor: 'middle' });
  shapes.push({ kind: 'rect', layer: 'square', x: num(mmX), y: num(top), w: num(mmSide), h: num(mmSide) });
  shapes.push({ kind: 'text', layer: 'square', x: num(mmX) + num(mmSide) / 2, y: num(top) + num(mmSide) / 2 + 0.04, text: '25 mm', sizePt: 8, anchor: 'middle' });

  // The legend, beside the squares.
  const lx = num(mmX.add(mmSide).add(new Fraction(3, 8)));
  const ty = (i: number) => num(top) + 0.15 + i * 0.22;
  const sample = 0.45;
  shapes.push({ kind: 'line', layer: 'legend', x1: lx, y1: ty(0) - 0.03, x2: lx + sample, y2: ty(0) - 0.03 });
  shapes.push({ kind: 'text', layer: 'legend', x: lx + sample + 0.1, y: ty(0), text: 'cut line', sizePt: LABEL_PT, anchor: 'start' });
  shapes.push({ kind: 'line', layer: 'legend', x1: lx, y1: ty(1) - 0.03, x2: lx + sample, y2: ty(1) - 0.03, style: 'dashed' });
  shapes.push({ kind: 'text', layer: 'legend', x: lx + sample + 0.1, y: ty(1), text: 'score line (fold)', sizePt: LABEL_PT, anchor: 'start' });
  shapes.push({ kind: 'rect', layer: 'legend', x: lx, y: ty(2) - 0.1, w: sample, h: 0.12, style: 'shaded' });
  const tabText = notchTabs ? 'tab: glue flap; cut notches at the ticks, up to the fold' : 'tab: glue flap';
  shapes.push({ kind: 'text', layer: 'legend', x: lx + sample + 0.1, y: ty(2), text: tabText, sizePt: LABEL_PT, anchor: 'start' });
  if (multiples) shapes.push({ kind: 'text', layer: 'legend', x: lx, y: ty(3), text: '"x2" after a name: cut 2 of that piece.', sizePt: LABEL_PT, anchor: 'start' });

  let y = top.add(1).add(new Fraction(1, 4));
  if (omitted.length) {
    shapes.push({ kind: 'text', layer: 'legend', x: M, y: num(y) + 0.1, text: 'Not drawn:', sizePt: LABEL_PT, bold: true, anchor: 'start' });
    y = y.add(OMITTED_LINE);
    for (const lines of omitted) {
      for (const text of lines) {
        shapes.push({ kind: 'text', layer: 'legend', x: M, y: num(y) + 0.1, text, sizePt: LABEL_PT, anchor: 'start' });
        y = y.add(OMITTED_LINE);
      }
    }
    y = y.add(new Fraction(1, 8));
  }
  return { shapes, height: y.sub(MARGIN) };
}

/**
 * Lays the cut list out on template pages: exact sizes, score lines, tabs and labels, the test
 * squares and the instructions on page 1. The shared data for `templateSvg` and `templatePdf`.
 */
export function templateLayout(pieces: readonly Piece[], options: TemplateOptions): TemplateLayout {
  const paper = paperSize(options.paper);
  const precision = options.precision ?? DEFAULT_PRECISION;
  const copies = options.copies ?? 'one';
  const W = toInches(paper.width).sub(MARGIN.mul(2));
  const H = toInches(paper.height).sub(MARGIN.mul(2));
  // Notched tabs are for a wall that wraps a circle, so only when the cut list has one.
  const notchTabs = pieces.some((p) => p.shape === 'circle');

  const omitted: TemplateOmission[] = [];
  const drawable: Prepared[] = [];
  pieces.forEach((p, index) => {
    const sizeText = sizeParts(p, precision).join(' · ');
    const scores = p.scoreLines.length ? `; score ${p.scoreLines.map((l) => scoreLineText(l, precision)).join(', ')}` : '';
    const name = p.quantity > 1 ? `${p.name} x${p.quantity}` : p.name;
    const w = toInches(p.width);
    const h = p.shape === 'circle' ? w : toInches(p.height);
    if (w.compare(0) <= 0 || h.compare(0) <= 0) {
      omitted.push({ piece: p.name, text: `${name}: no size in the cut list (${formatLength(p.width)} x ${formatLength(p.height)})` });
      return;
    }
    const upright = prepare(p, index, false, precision, copies);
    if (fits(upright, W, H)) return void drawable.push(upright);
    if (p.shape !== 'circle') {
      const turned = prepare(p, index, true, precision, copies);
      if (fits(turned, W, H)) return void drawable.push(turned);
    }
    omitted.push({ piece: p.name, text: `${name} ${sizeText}${scores}: larger than the page: cut by measurement` });
  });

  const width = num(W);
  const multiples = copies === 'one' && pieces.some((p) => p.quantity > 1);
  const header = headerShapes(options.title, omitted.map((o) => wrapWords(o.text, width)), multiples, notchTabs);
  const count = (pr: Prepared) => (copies === 'quantity' ? Math.max(0, pr.piece.quantity) : 1);
  const planPieces = (list: { pr: Prepared; qty: number }[]): PlanPiece[] =>
    list.map(({ pr, qty }) => ({ name: pr.piece.name, width: inches(pr.boxW), height: inches(pr.boxH), qty }));

  const pages: TemplatePage[] = [{ number: 1, shapes: [...header.shapes] }];
  let remaining = drawable.map((pr) => ({ pr, qty: count(pr) })).filter((x) => x.qty > 0);

  // Page 1 holds what fits below the header; the rest go on full pages.
  const firstH = H.sub(header.height);
  if (remaining.length && firstH.compare(1) >= 0) {
    const plan = planSheets({ sheet: { width: inches(W.add(GAP)), height: inches(firstH.add(GAP)) }, rotate: false, kits: 1, pieces: planPieces(remaining) });
    const used = new Map<number, number>();
    for (const pl of plan.placements) {
      if (pl.sheet !== 0) continue;
      const pr = remaining[pl.piece]!.pr;
      pages[0]!.shapes.push(...pieceShapes(pr, MARGIN.add(toInches(pl.x)), MARGIN.add(header.height).add(toInches(pl.y)), notchTabs));
      used.set(pl.piece, (used.get(pl.piece) ?? 0) + 1);
    }
    remaining = remaining.map((x, i) => ({ pr: x.pr, qty: x.qty - (used.get(i) ?? 0) })).filter((x) => x.qty > 0);
  }
  if (remaining.length) {
    const plan = planSheets({ sheet: { width: inches(W.add(GAP)), height: inches(H.add(GAP)) }, rotate: false, kits: 1, pieces: planPieces(remaining) });
    // Every box was checked against the full page above, so the planner has nothing to refuse.
    if (plan.errors.length) throw new Error(`template layout: ${plan.errors.map((e) => e.reason).join('; ')}`);
    for (let s = 0; s < plan.sheets; s++) pages.push({ number: pages.length + 1, shapes: [] });
    for (const pl of plan.placements) {
      const pr = remaining[pl.piece]!.pr;
      pages[pl.sheet + 1]!.shapes.push(...pieceShapes(pr, MARGIN.add(toInches(pl.x)), MARGIN.add(toInches(pl.y)), notchTabs));
    }
  }
  // Page numbers sit in the bottom margin, where nothing is cut.
  const footerY = num(toInches(paper.height)) - 0.28;
  for (const page of pages) {
    page.shapes.push({ kind: 'text', layer: 'legend', x: num(toInches(paper.width)) / 2, y: footerY, text: `Page ${page.number} of ${pages.length}`, sizePt: LABEL_PT, anchor: 'middle' });
  }
  return { paper, pages, omitted };
}

// ---------- SVG ----------

const COLORS = { ink: '#22303C', kraft: '#A87B4F', pencil: '#8A8F98', tab: '#EFE6DA' };

const XML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };
const xml = (s: string) => s.replace(/[&<>"']/g, (c) => XML_ESCAPES[c]!);

const SVG_GROUPS: { layer: TemplateLayer; id: string; attrs: string }[] = [
  { layer: 'tab', id: 'tabs', attrs: `fill="${COLORS.tab}" stroke="none"` },
  { layer: 'notch', id: 'notches', attrs: `fill="none" stroke="${COLORS.ink}"` },
  { layer: 'cut', id: 'cut-lines', attrs: `fill="none" stroke="${COLORS.ink}"` },
  { layer: 'score', id: 'score-lines', attrs: `fill="none" stroke="${COLORS.kraft}"` },
  { layer: 'square', id: 'test-squares', attrs: `fill="none" stroke="${COLORS.ink}"` },
  { layer: 'label', id: 'labels', attrs: `fill="${COLORS.ink}" stroke="none"` },
  { layer: 'legend', id: 'legend', attrs: `fill="none" stroke="${COLORS.ink}"` },
];

/**
 * The template as SVG, one document per page. The root's width and height carry the unit
 * (8.5in x 11in, or 210mm x 297mm) and the viewBox uses the same unit, so one user unit is one
 * inch (or one millimetre) and the file imports and prints at 1:1.
 */
export function templateSvg(pieces: readonly Piece[], options: TemplateOptions): string[] {
  const layout = templateLayout(pieces, options);
  const { svg } = layout.paper;
  const scale = svg.unit === 'in' ? 1 : 25.4;
  const decimals = svg.unit === 'in' ? 4 : 3;
  const n = (v: number) => {
    const s = (v * scale).toFixed(decimals).replace(/\.?0+$/, '');
    return s === '-0' ? '0' : s;
  };
  const pt = (p: number) => n(p / PT);
  const stroke = pt(0.5);
  const dash = `${pt(4)} ${pt(3)}`;
  const title = options.title ? `Cutting template: ${options.title}` : 'Cutting template';

  return layout.pages.map((page) => {
    const shape = (s: TemplateShape): string => {
      switch (s.kind) {
        case 'rect': {
          const extra = s.style === 'shaded' ? ` fill="${COLORS.tab}" stroke="none"` : s.style === 'dashed' ? ` stroke-dasharray="${dash}"` : '';
          return `<rect x="${n(s.x)}" y="${n(s.y)}" width="${n(s.w)}" height="${n(s.h)}"${extra}/>`;
        }
        case 'circle':
          return `<circle cx="${n(s.cx)}" cy="${n(s.cy)}" r="${n(s.r)}"/>`;
        case 'line':
          return `<line x1="${n(s.x1)}" y1="${n(s.y1)}" x2="${n(s.x2)}" y2="${n(s.y2)}"${s.style === 'dashed' ? ` stroke="${COLORS.kraft}" stroke-dasharray="${dash}"` : ''}/>`;
        case 'text': {
          const anchor = s.anchor === 'middle' ? ' text-anchor="middle"' : '';
          const weight = s.bold ? ' font-weight="600"' : '';
          return `<text x="${n(s.x)}" y="${n(s.y)}" font-size="${pt(s.sizePt)}"${anchor}${weight} fill="${COLORS.ink}" stroke="none">${xml(s.text)}</text>`;
        }
      }
    };
    const groups = SVG_GROUPS.map((g) => {
      const items = page.shapes.filter((s) => s.layer === g.layer);
      if (!items.length) return '';
      const dashed = g.layer === 'score' ? ` stroke-dasharray="${dash}"` : '';
      return `<g id="${g.id}" ${g.attrs} stroke-width="${stroke}"${dashed}>${items.map(shape).join('')}</g>`;
    })
      .filter(Boolean)
      .join('\n');
    return (
      `<?xml version="1.0" encoding="UTF-8"?>\n` +
      `<svg xmlns="http://www.w3.org/2000/svg" width="${svg.width}" height="${svg.height}" viewBox="${svg.viewBox}" font-family="Inter, Helvetica, Arial, sans-serif">\n` +
      `<title>${xml(`${title}, page ${page.number} of ${layout.pages.length}`)}</title>\n${groups}\n</svg>\n`
    );
  });
}

// ---------- PDF ----------

/**
 * The template as a PDF with Letter (612 x 792 pt) or A4 (595.28 x 841.89 pt) pages
 * (1 pt = 1/72 in, PDF reference), drawn at 1:1.
 */
export async function templatePdf(pieces: readonly Piece[], options: TemplateOptions): Promise<Buffer> {
  const layout = templateLayout(pieces, options);
  const [pw, ph] = layout.paper.points;
  const title = options.title ? `Cutting template: ${options.title}` : 'Cutting template';
  const doc = new PDFDocument({ size: [pw, ph], margin: 0, autoFirstPage: false, info: { Title: title, Creator: 'Cardwright' } });
  const done = pdfBuffer(doc);
  registerFonts(doc);
  const p = (v: number) => v * PT;
  for (const page of layout.pages) {
    doc.addPage({ size: [pw, ph], margin: 0 });
    // Fills first, so lines and text sit on top of the tab shading.
    const order: TemplateLayer[] = ['tab', 'legend', 'notch', 'cut', 'score', 'square', 'label'];
    const shapes = [...page.shapes].sort((a, b) => order.indexOf(a.layer) - order.indexOf(b.layer) || (a.kind === 'text' ? 1 : 0) - (b.kind === 'text' ? 1 : 0));
    for (const s of shapes) {
      doc.save();
      doc.lineWidth(0.5).strokeColor(s.layer === 'score' ? COLORS.kraft : COLORS.ink);
      if (s.kind === 'rect') {
        doc.rect(p(s.x), p(s.y), p(s.w), p(s.h));
        if (s.style === 'shaded') doc.fill(COLORS.tab);
        else doc.stroke();
      } else if (s.kind === 'circle') {
        doc.circle(p(s.cx), p(s.cy), p(s.r)).stroke();
      } else if (s.kind === 'line') {
        if (s.style === 'dashed' || s.layer === 'score') doc.dash(4, { space: 3 });
        if (s.layer === 'legend' && s.style === 'dashed') doc.strokeColor(COLORS.kraft);
        doc.moveTo(p(s.x1), p(s.y1)).lineTo(p(s.x2), p(s.y2)).stroke();
      } else {
        doc.font(s.bold ? 'sans-bold' : 'sans').fontSize(s.sizePt).fillColor(COLORS.ink);
        const text = printable(doc, s.text);
        const x = s.anchor === 'middle' ? p(s.x) - doc.widthOfString(text) / 2 : p(s.x);
        doc.text(text, x, p(s.y), { lineBreak: false, baseline: 'alphabetic' });
      }
      doc.restore();
    }
  }
  doc.end();
  return done;
}
