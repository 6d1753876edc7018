/**
 * The 1:1 cutting template (P3): every piece of the cut list drawn to size with its exact outline,
 * laid out over as many pages as needed with the shared sheet planner, as SVG pages (width and
 * height in physical units, so they import into cutting software at size) and as a PDF.
 *
 * Every page carries the tutorial's title, "Page x of y", a 1 in and a 25 mm test square and the
 * legend of line styles; page 1 adds the printing note, how to join tiled parts and the blade
 * cautions. A piece larger than the printable area is split into overlapping parts
 * (template-pieces.ts) so it can be printed, taped and cut: nothing is left to "cut by
 * measurement" unless its sizes cannot make its shape.
 *
 * One layout feeds both outputs: positions are worked out exactly in inches (fractions) and
 * only turned into floats when drawn. Each piece is drawn once with "x2" in its label (a template
 * is traced or cut out and reused; `copies: 'quantity'` draws every copy instead).
 */
import Fraction from 'fraction.js';
import PDFDocument from 'pdfkit';
import { pathData, placementsOf, planSheets, type PlanPiece } from '@shared/geometry';
import { DEFAULT_PRECISION, inches, ROUND_SHAPES, toInches, type Length, type Piece, type RulerPrecision } from '@shared/measure';
import { palette } from '@shared/palette';
import { printable, registerFonts } from './fonts';
import { pdfBuffer } from './pdf-buffer';
import { paperSize, type PaperSize } from './sizes';
import {
  boxFits,
  drawPiece,
  GAP,
  joinLetter,
  labelLines,
  nearEqualNotes,
  sizeLine,
  textWidthIn,
  tiledBoxes,
  tilingOf,
  wholeBox,
  wrapWords,
  type PartBox,
  type PieceDrawing,
} from './template-pieces';
import { arrowHead, hatch, translate, type TemplateLayer, type TemplateShape } from './template-shapes';
import type { Paper } from './types';

export type { TemplateShape } from './template-shapes';

/**
 * A piece that would take more printed parts than this is listed under "Not drawn" instead: a
 * hundred taped pages is already more than anyone assembles, and each part repeats the drawing.
 */
export const MAX_PARTS_PER_PIECE = 100;

export interface TemplateOptions {
  paper: Paper;
  /** The tutorial's title, printed on every page. */
  title?: string;
  /** Ruler precision for the inch sizes of pieces given in millimetres. */
  precision?: RulerPrecision;
  /** 'one' (default): each piece once, "x2" in its label; 'quantity': every copy drawn. */
  copies?: 'one' | 'quantity';
}

export interface TemplatePage {
  /** From 1. */
  number: number;
  shapes: TemplateShape[];
}

/** A piece the template does not draw, with why. */
export interface TemplateOmission {
  piece: string;
  text: string;
}

/** Where a piece (or one part of a tiled piece) was drawn: for the tests and for anyone measuring the output. */
export interface TemplatePart {
  /** Index of the piece in the cut list. */
  piece: number;
  name: string;
  page: number;
  turned: boolean;
  /** The piece's size as drawn (turned or not), inches. */
  width: number;
  height: number;
  /** Where the drawn piece's top-left corner (0, 0) lies on the page, inches. */
  origin: { x: number; y: number };
  /** The window of the piece this part shows, inches in the piece's drawn frame. */
  window: { x0: number; y0: number; x1: number; y1: number };
  tile: { col: number; row: number; cols: number; rows: number } | null;
  joins: { letter: string; dir: 'v' | 'h'; at: number; side: 'before' | 'after' }[];
}

export interface TemplateLayout {
  paper: PaperSize;
  pages: TemplatePage[];
  parts: TemplatePart[];
  omitted: TemplateOmission[];
}

// Layout constants, exact, in inches.
const MARGIN = new Fraction(1, 2);
const SQUARE_IN = inches(1);
// 25 mm = 125/127 in exactly (1 in = 25.4 mm, NIST SP 811).
const SQUARE_MM: Length = { value: new Fraction(25), unit: 'mm' };
/** The title row, then the squares and the legend, then a gap before the pieces. */
const TITLE_ROW = new Fraction(5, 16);
const HEADER = TITLE_ROW.add(1).add(new Fraction(1, 4));
const NOTE_LINE = new Fraction(5, 32);
const NOTE_PT = 7.5;
const PT = 72;

const num = (f: Fraction): number => f.valueOf();

/** The blade cautions on page 1 (common practice for craft classes), ending with the maker's own judgement. */
export const TEMPLATE_CAUTIONS = [
  'Blades: cut away from your fingers, on a cutting mat; change a dull blade (it slips and tears); keep knives and blades out of children’s reach and supervise children who cut.',
  'These notes are general: use your own judgement, follow your tools’ instructions and the rules of your venue or school.',
];

interface LegendItem {
  look: 'cut' | 'score' | 'tab' | 'overlap' | 'join' | 'grain' | 'centre' | 'notch';
  text: string;
}

function legendItems(used: { tiles: boolean; notches: boolean; grain: boolean; centres: boolean; tabs: boolean }): LegendItem[] {
  const items: LegendItem[] = [
    { look: 'cut', text: 'cut line (solid)' },
    { look: 'score', text: 'score line: fold (dashed)' },
  ];
  if (used.tabs) items.push({ look: 'tab', text: 'glue tab (shaded)' });
  if (used.notches) items.push({ look: 'notch', text: 'notches: cut up to the fold' });
  if (used.tiles) {
    items.push({ look: 'overlap', text: 'overlap (hatched): the part before lies here' });
    items.push({ look: 'join', text: 'join line: trim, match A to A, tape' });
  }
  if (used.grain) items.push({ look: 'grain', text: 'grain direction' });
  if (used.centres) items.push({ look: 'centre', text: 'centre: compass point' });
  return items;
}

/** A small drawing of a line style, `w` wide, with its middle at y. */
function legendSample(look: LegendItem['look'], x: number, y: number, w: number): TemplateShape[] {
  switch (look) {
    case 'cut':
      return [{ kind: 'line', layer: 'legend', look: 'cut', x1: x, y1: y, x2: x + w, y2: y }];
    case 'score':
      return [{ kind: 'line', layer: 'legend', look: 'score', style: 'dashed', x1: x, y1: y, x2: x + w, y2: y }];
    case 'tab':
      return [{ kind: 'rect', layer: 'legend', look: 'tab', style: 'shaded', x, y: y - 0.06, w, h: 0.12 }];
    case 'notch':
      return [
        { kind: 'rect', layer: 'legend', look: 'tab', style: 'shaded', x, y: y - 0.06, w, h: 0.12 },
        ...[0.1, 0.2, 0.3].map((t): TemplateShape => ({
          kind: 'line',
          layer: 'legend',
          look: 'notch',
          x1: x + w * t * 2.5,
          y1: y - 0.06,
          x2: x + w * t * 2.5,
          y2: y + 0.06,
        })),
      ];
    case 'overlap':
      return [...hatch({ x0: x, y0: y - 0.07, x1: x + w, y1: y + 0.07 }, 1 / 16, 'legend').map((s) => ({ ...s, look: 'overlap' as const }))];
    case 'join':
      return [
        { kind: 'line', layer: 'legend', look: 'join', x1: x + w / 2, y1: y - 0.08, x2: x + w / 2, y2: y + 0.08 },
        { ...arrowHead(x + w / 2, y, 'right', 0.1, 'legend'), look: 'join' },
        { ...arrowHead(x + w / 2, y, 'left', 0.1, 'legend'), look: 'join' },
      ];
    case 'grain':
      return [
        { kind: 'line', layer: 'legend', look: 'mark', x1: x + 0.08, y1: y, x2: x + w - 0.08, y2: y },
        { ...arrowHead(x, y, 'left', 0.08, 'legend'), look: 'mark' },
        { ...arrowHead(x + w, y, 'right', 0.08, 'legend'), look: 'mark' },
      ];
    case 'centre':
      return [
        { kind: 'line', layer: 'legend', look: 'mark', x1: x + w / 2 - 0.08, y1: y, x2: x + w / 2 + 0.08, y2: y },
        { kind: 'line', layer: 'legend', look: 'mark', x1: x + w / 2, y1: y - 0.08, x2: x + w / 2, y2: y + 0.08 },
      ];
  }
}

/** The header every page carries: title, page x of y, the two test squares and the legend. */
function pageHeader(page: number, pages: number, title: string | undefined, paperW: number, items: LegendItem[]): TemplateShape[] {
  const M = num(MARGIN);
  const right = paperW - M;
  const pageText = `Page ${page} of ${pages}`;
  const room = right - M - textWidthIn(pageText, false, 8) - 0.25;
  let head = title ? `Cutting template: ${title}` : 'Cutting template';
  // A long title is shortened, never run into the page number.
  while (head.length > 20 && textWidthIn(head, true, 10) > room) head = `${head.slice(0, -2).trimEnd()}…`;
  const shapes: TemplateShape[] = [
    { kind: 'text', layer: 'legend', x: M, y: M + 0.16, text: head, sizePt: 10, bold: true, anchor: 'start' },
    { kind: 'text', layer: 'legend', x: right, y: M + 0.16, text: pageText, sizePt: 8, anchor: 'end' },
  ];
  const top = M + num(TITLE_ROW);
  const inchSide = num(toInches(SQUARE_IN));
  const mmSide = num(toInches(SQUARE_MM));
  const mmX = M + inchSide + 0.25;
  shapes.push({ kind: 'rect', layer: 'square', x: M, y: top, w: inchSide, h: inchSide });
  shapes.push({ kind: 'text', layer: 'square', x: M + inchSide / 2, y: top + inchSide / 2 + 0.04, text: '1 in', sizePt: 8, anchor: 'middle' });
  shapes.push({ kind: 'rect', layer: 'square', x: mmX, y: top, w: mmSide, h: mmSide });
  shapes.push({ kind: 'text', layer: 'square', x: mmX + mmSide / 2, y: top + mmSide / 2 + 0.04, text: '25 mm', sizePt: 8, anchor: 'middle' });

  // The legend beside the squares, in as many columns of four as it needs.
  const lx = mmX + mmSide + 0.3;
  const sample = 0.4;
  const perCol = 4;
  let x = lx;
  for (let c = 0; c * perCol < items.length; c++) {
    const col = items.slice(c * perCol, c * perCol + perCol);
    col.forEach((item, i) => {
      const y = top + 0.12 + i * 0.25;
      shapes.push(...legendSample(item.look, x, y, sample));
      shapes.push({ kind: 'text', layer: 'legend', x: x + sample + 0.08, y: y + 0.03, text: item.text, sizePt: 6.5, anchor: 'start' });
    });
    x += sample + 0.08 + Math.max(...col.map((it) => textWidthIn(it.text, false, 6.5))) + 0.2;
  }
  return shapes;
}

/** Page 1's notes under the header: printing, joining tiled parts, cautions, anything not drawn. */
function firstPageNotes(
  width: number,
  tiles: boolean,
  omitted: TemplateOmission[],
): { lines: { text: string; bold?: boolean; caution?: boolean }[]; height: Fraction } {
  const lines: { text: string; bold?: boolean; caution?: boolean }[] = [];
  const add = (text: string, o: { bold?: boolean; caution?: boolean } = {}) => {
    for (const l of wrapWords(text, width, o.bold, NOTE_PT)) lines.push({ text: l, ...o });
  };
  add('Print at 100% (actual size); check the squares with a ruler.');
  if (tiles)
    add(
      'Pieces too large for one page are printed in parts: trim each part on its red join line where the triangles point at it, lay it on the next part’s hatched overlap so the triangles meet (join A to A), tape, then cut round the outline.',
    );
  for (const c of TEMPLATE_CAUTIONS) add(c, { caution: true });
  if (omitted.length) {
    add('Not drawn:', { bold: true });
    for (const o of omitted) add(o.text);
  }
  return { lines, height: NOTE_LINE.mul(lines.length).add(new Fraction(1, 8)) };
}

/**
 * Lays the cut list out on template pages: exact outlines, score lines, tabs, notches, centre
 * marks, grain arrows and labels; tiled parts with their joins; the header on every page. The
 * shared data for `templateSvg` and `templatePdf`.
 */
export function templateLayout(pieces: readonly Piece[], options: TemplateOptions): TemplateLayout {
  const paper = paperSize(options.paper);
  const precision = options.precision ?? DEFAULT_PRECISION;
  const copies = options.copies ?? 'one';
  const paperW = num(toInches(paper.width));
  const W = toInches(paper.width).sub(MARGIN.mul(2));
  const H = toInches(paper.height).sub(MARGIN.mul(2)).sub(HEADER);
  // Notched tabs are for a wall that wraps a round piece, so only when the cut list has one.
  const notchTabs = pieces.some((p) => ROUND_SHAPES.includes(p.shape));
  const notes = nearEqualNotes(pieces);
  let letters = 0;
  const nextLetter = () => joinLetter(letters++);

  const omitted: TemplateOmission[] = [];
  const boxes: PartBox[] = [];
  pieces.forEach((p, index) => {
    const lines = labelLines(p, precision, copies, notes.get(index) ?? []);
    const upright = drawPiece(p, index, false, { notchTabs, lines });
    if ('error' in upright) {
      omitted.push({ piece: p.name, text: `${lines[0]} ${sizeLine(p, precision)}: ${upright.error}` });
      return;
    }
    const whole = wholeBox(upright);
    if (boxFits(whole, W, H)) return void boxes.push(whole);
    const turned = drawPiece(p, index, true, { notchTabs, lines }) as PieceDrawing;
    if (!ROUND_SHAPES.includes(p.shape)) {
      const t = wholeBox(turned);
      if (boxFits(t, W, H)) return void boxes.push(t);
    }
    // Tiled, whichever way takes fewer parts (upright on a tie).
    const parts = (d: PieceDrawing) => ((t) => t.cols.length * t.rows.length)(tilingOf(d, W, H));
    const use = parts(turned) < parts(upright) ? turned : upright;
    if (parts(use) > MAX_PARTS_PER_PIECE) {
      omitted.push({ piece: p.name, text: `${lines[0]} ${sizeLine(p, precision)}: too large to print (${parts(use)} pages); cut it from its measurements` });
      return;
    }
    const tiles = tiledBoxes(use, W, H, nextLetter);
    for (const t of tiles) {
      if (!boxFits(t, W, H)) throw new Error(`template layout: part of "${p.name}" does not fit the page`);
    }
    boxes.push(...tiles);
  });

  const used = {
    tiles: boxes.some((b) => b.tile),
    notches: boxes.some((b) => b.shapes.some((s) => s.layer === 'notch')),
    grain: boxes.some((b) => b.drawing.grainAxis !== null),
    centres: boxes.some((b) => b.shapes.some((s) => s.layer === 'mark' && s.kind === 'line')),
    tabs: boxes.some((b) => b.shapes.some((s) => s.layer === 'tab')),
  };
  const items = legendItems(used);
  const first = firstPageNotes(num(W), used.tiles, omitted);

  const count = (b: PartBox) => (copies === 'quantity' ? Math.max(0, b.drawing.piece.quantity) : 1);
  const planPieces = (list: { b: PartBox; qty: number }[]): PlanPiece[] =>
    list.map(({ b, qty }, i) => ({ name: `${b.drawing.piece.name} ${i}`, width: inches(b.boxW), height: inches(b.boxH), qty }));

  const pages: TemplatePage[] = [{ number: 1, shapes: [] }];
  const parts: TemplatePart[] = [];
  const top = MARGIN.add(HEADER);
  const place = (b: PartBox, page: TemplatePage, x: Fraction, y: Fraction) => {
    const X = num(x);
    const Y = num(y);
    page.shapes.push(...b.shapes.map((s) => translate(s, X, Y)));
    const d = b.drawing;
    parts.push({
      piece: d.index,
      name: d.piece.name,
      page: page.number,
      turned: d.turned,
      width: num(d.w),
      height: num(d.h),
      origin: { x: X + b.offset.x, y: Y + b.offset.y },
      window: { x0: num(b.window.x0), y0: num(b.window.y0), x1: num(b.window.x1), y1: num(b.window.y1) },
      tile: b.tile,
      joins: b.joins,
    });
  };
  let remaining = boxes.map((b) => ({ b, qty: count(b) })).filter((x) => x.qty > 0);

  // Page 1 holds what fits below its notes; the rest go on full pages.
  const firstH = H.sub(first.height);
  const firstTop = top.add(first.height);
  if (remaining.length && firstH.compare(1) >= 0) {
    const plan = planSheets({ sheet: { width: inches(W.add(GAP)), height: inches(firstH.add(GAP)) }, rotate: false, kits: 1, pieces: planPieces(remaining) });
    const usedQty = new Map<number, number>();
    for (const pl of placementsOf(plan)) {
      if (pl.sheet !== 0) continue;
      place(remaining[pl.piece]!.b, pages[0]!, MARGIN.add(toInches(pl.x)), firstTop.add(toInches(pl.y)));
      usedQty.set(pl.piece, (usedQty.get(pl.piece) ?? 0) + 1);
    }
    remaining = remaining.map((x, i) => ({ b: x.b, qty: x.qty - (usedQty.get(i) ?? 0) })).filter((x) => x.qty > 0);
  }
  if (remaining.length) {
    const plan = planSheets({ sheet: { width: inches(W.add(GAP)), height: inches(H.add(GAP)) }, rotate: false, kits: 1, pieces: planPieces(remaining) });
    // Every box was checked against the full page above, so the planner has nothing to refuse.
    if (plan.errors.length) throw new Error(`template layout: ${plan.errors.map((e) => e.reason).join('; ')}`);
    for (let s = 0; s < plan.sheets; s++) pages.push({ number: pages.length + 1, shapes: [] });
    for (const pl of placementsOf(plan)) place(remaining[pl.piece]!.b, pages[pl.sheet + 1]!, MARGIN.add(toInches(pl.x)), top.add(toInches(pl.y)));
  }

  for (const page of pages) page.shapes.unshift(...pageHeader(page.number, pages.length, options.title, paperW, items));
  const noteTop = num(top);
  first.lines.forEach((l, i) => {
    pages[0]!.shapes.push({
      kind: 'text',
      layer: 'legend',
      ...(l.caution ? { tone: 'caution' as const } : {}),
      x: num(MARGIN),
      y: noteTop + i * num(NOTE_LINE) + 0.1,
      text: l.text,
      sizePt: NOTE_PT,
      bold: l.bold,
      anchor: 'start',
    });
  });
  return { paper, pages, parts, omitted };
}

// ---------- drawing styles, shared by SVG and PDF ----------

interface Look {
  stroke?: string;
  fill?: string;
  width: number;
  dash?: [number, number];
}

const LOOKS: Record<TemplateLayer, Look> = {
  cut: { stroke: palette.ink, width: 0.5 },
  score: { stroke: palette.kraft, width: 0.5, dash: [4, 3] },
  tab: { fill: palette.tab, width: 0 },
  overlap: { stroke: palette.pencil, width: 0.35 },
  notch: { stroke: palette.ink, width: 0.5 },
  mark: { stroke: palette.ink, fill: palette.ink, width: 0.5 },
  join: { stroke: palette.rosehip, fill: palette.rosehip, width: 0.5 },
  square: { stroke: palette.ink, width: 0.5 },
  label: { fill: palette.ink, width: 0 },
  legend: { stroke: palette.ink, width: 0.5 },
};

const lookOf = (s: TemplateShape): Look => LOOKS[s.look ?? s.layer];

// ---------- SVG ----------

const XML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };
const xml = (s: string) => s.replace(/[&<>"']/g, (c) => XML_ESCAPES[c]!);

const SVG_GROUPS: { layer: TemplateLayer; id: string }[] = [
  { layer: 'tab', id: 'tabs' },
  { layer: 'overlap', id: 'overlap-zones' },
  { layer: 'notch', id: 'notches' },
  { layer: 'cut', id: 'cut-lines' },
  { layer: 'score', id: 'score-lines' },
  { layer: 'mark', id: 'marks' },
  { layer: 'join', id: 'join-lines' },
  { layer: 'square', id: 'test-squares' },
  { layer: 'label', id: 'labels' },
  { layer: 'legend', id: 'legend' },
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
  const title = options.title ? `Cutting template: ${options.title}` : 'Cutting template';

  return layout.pages.map((page) => {
    const clips = new Map<string, string>();
    const clipAttr = (s: TemplateShape): string => {
      if (!s.clip) return '';
      const key = `${n(s.clip.x)} ${n(s.clip.y)} ${n(s.clip.w)} ${n(s.clip.h)}`;
      if (!clips.has(key)) clips.set(key, `clip-${clips.size + 1}`);
      return ` clip-path="url(#${clips.get(key)})"`;
    };
    const paint = (s: TemplateShape, filled: boolean): string => {
      const look = lookOf(s);
      if (s.look === undefined || s.look === s.layer) {
        // The group carries the layer's look; only fills that differ are spelled out.
        return filled ? ` fill="${look.fill ?? palette.ink}" stroke="none"` : '';
      }
      if (filled) return ` fill="${look.fill ?? look.stroke ?? palette.ink}" stroke="none"`;
      const dash = look.dash ? ` stroke-dasharray="${pt(look.dash[0])} ${pt(look.dash[1])}"` : '';
      return ` fill="none" stroke="${look.stroke ?? 'none'}" stroke-width="${pt(look.width || 0.5)}"${dash}`;
    };
    const shape = (s: TemplateShape): string => {
      const c = clipAttr(s);
      switch (s.kind) {
        case 'rect':
          return `<rect x="${n(s.x)}" y="${n(s.y)}" width="${n(s.w)}" height="${n(s.h)}"${paint(s, s.style === 'shaded')}${c}/>`;
        case 'circle':
          return `<circle cx="${n(s.cx)}" cy="${n(s.cy)}" r="${n(s.r)}"${paint(s, false)}${c}/>`;
        case 'line':
          return `<line x1="${n(s.x1)}" y1="${n(s.y1)}" x2="${n(s.x2)}" y2="${n(s.y2)}"${paint(s, false)}${c}/>`;
        case 'path':
          return `<path d="${pathData(s.d, scale, decimals)}"${paint(s, s.style === 'shaded' || s.style === 'filled')}${c}/>`;
        case 'text': {
          const anchor = s.anchor === 'middle' ? ' text-anchor="middle"' : s.anchor === 'end' ? ' text-anchor="end"' : '';
          const weight = s.bold ? ' font-weight="600"' : '';
          return `<text x="${n(s.x)}" y="${n(s.y)}" font-size="${pt(s.sizePt)}"${anchor}${weight} fill="${s.tone === 'caution' ? palette.rosehip : palette.ink}" stroke="none"${c}>${xml(s.text)}</text>`;
        }
      }
    };
    const groups = SVG_GROUPS.map((g) => {
      const items = page.shapes.filter((s) => s.layer === g.layer);
      if (!items.length) return '';
      const look = LOOKS[g.layer];
      const stroke = look.stroke ? `fill="none" stroke="${look.stroke}" stroke-width="${pt(look.width)}"` : `fill="${look.fill}" stroke="none"`;
      const dash = look.dash ? ` stroke-dasharray="${pt(look.dash[0])} ${pt(look.dash[1])}"` : '';
      return `<g id="${g.id}" ${stroke}${dash}>${items.map(shape).join('')}</g>`;
    })
      .filter(Boolean)
      .join('\n');
    const defs = clips.size
      ? `<defs>${[...clips]
          .map(([key, id]) => {
            const [x, y, w, h] = key.split(' ');
            return `<clipPath id="${id}"><rect x="${x}" y="${y}" width="${w}" height="${h}"/></clipPath>`;
          })
          .join('')}</defs>\n`
      : '';
    return (
      `<?xml version="1.0" encoding="UTF-8"?>\n` +
      `<svg xmlns="http://www.w3.org/2000/svg" width="${svg.width}" height="${svg.height}" viewBox="${svg.viewBox}" font-family="Inter, Helvetica, Arial, sans-serif">\n` +
      `<title>${xml(`${title}, page ${page.number} of ${layout.pages.length}`)}</title>\n${defs}${groups}\n</svg>\n`
    );
  });
}

// ---------- PDF ----------

/** Fills first, so lines and text sit on top of the tab shading. */
const PDF_ORDER: TemplateLayer[] = ['tab', 'overlap', 'legend', 'notch', 'cut', 'score', 'mark', 'join', 'square', 'label'];

function drawPdfShape(doc: PDFKit.PDFDocument, s: TemplateShape): void {
  const p = (v: number) => v * PT;
  const look = lookOf(s);
  doc.save();
  if (s.clip) doc.rect(p(s.clip.x), p(s.clip.y), p(s.clip.w), p(s.clip.h)).clip();
  if (look.stroke) doc.lineWidth(look.width).strokeColor(look.stroke);
  if (look.dash) doc.dash(look.dash[0], { space: look.dash[1] });
  switch (s.kind) {
    case 'rect':
      doc.rect(p(s.x), p(s.y), p(s.w), p(s.h));
      if (s.style === 'shaded') doc.fill(look.fill ?? palette.tab);
      else doc.stroke();
      break;
    case 'circle':
      doc.circle(p(s.cx), p(s.cy), p(s.r)).stroke();
      break;
    case 'line':
      doc.moveTo(p(s.x1), p(s.y1)).lineTo(p(s.x2), p(s.y2)).stroke();
      break;
    case 'path':
      doc.path(pathData(s.d, PT, 3));
      if (s.style === 'shaded' || s.style === 'filled') doc.fill(look.fill ?? look.stroke ?? palette.ink);
      else doc.stroke();
      break;
    case 'text': {
      doc
        .font(s.bold ? 'sans-bold' : 'sans')
        .fontSize(s.sizePt)
        .fillColor(s.tone === 'caution' ? palette.rosehip : palette.ink);
      const text = printable(doc, s.text);
      const w = doc.widthOfString(text);
      const x = s.anchor === 'middle' ? p(s.x) - w / 2 : s.anchor === 'end' ? p(s.x) - w : p(s.x);
      doc.text(text, x, p(s.y), { lineBreak: false, baseline: 'alphabetic' });
      break;
    }
  }
  doc.restore();
}

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
  for (const page of layout.pages) {
    doc.addPage({ size: [pw, ph], margin: 0 });
    const shapes = [...page.shapes].sort(
      (a, b) => PDF_ORDER.indexOf(a.layer) - PDF_ORDER.indexOf(b.layer) || (a.kind === 'text' ? 1 : 0) - (b.kind === 'text' ? 1 : 0),
    );
    for (const s of shapes) drawPdfShape(doc, s);
  }
  doc.end();
  return done;
}
