/**
 * Flow layout for printed PDFs (the class handout, the kit checklist): text is wrapped here, line
 * by line, rather than by pdfkit, so every block's height is known before it is drawn. A block is
 * a list of `Row`s; `FlowWriter` places rows down the page and starts new pages, and `keep`
 * moves a block to the next page whole when it does not fit.
 *
 * Nothing here knows what a handout holds: the sections (handout-sections.ts) build rows from a
 * tutorial and hand them to the writer.
 */
import { palette } from '@shared/palette';
import { printable, type FontName } from './fonts';

/** A font, its size and the height of one line, in points. */
export interface TextStyle {
  font: FontName;
  size: number;
  lineHeight: number;
  color?: string;
}

/** The house styles of printed pages. */
export const STYLES = {
  body: { font: 'serif', size: 9.5, lineHeight: 14 },
  quote: { font: 'serif-italic', size: 9.5, lineHeight: 14 },
  small: { font: 'sans', size: 7.5, lineHeight: 10, color: palette.pencil },
  table: { font: 'sans', size: 8, lineHeight: 10.5 },
  tableHead: { font: 'sans-bold', size: 8, lineHeight: 10.5 },
  h2: { font: 'serif-bold', size: 13, lineHeight: 18 },
  stepTitle: { font: 'serif-bold', size: 11, lineHeight: 15 },
  title: { font: 'serif-bold', size: 22, lineHeight: 28 },
} as const satisfies Record<string, TextStyle>;

/** Something drawn at a position, whose height is known in advance. */
export interface Row {
  h: number;
  draw: (x: number, y: number) => void;
  /** Dropped when it would open a page (space between blocks). */
  spacer?: boolean;
}

/** Space between blocks; never drawn at the top of a page. */
export const spacer = (h: number): Row => ({ h, draw: () => undefined, spacer: true });
/** The height of a block. */
export const heightOf = (rows: readonly Row[]) => rows.reduce((s, r) => s + r.h, 0);

/** Page margins in points; `bottom` leaves room for a footer. */
export type Margins = { side: number; top: number; bottom: number };

/** Places rows down the page, starting new pages as needed (pages are buffered for the footer). */
export class FlowWriter {
  readonly top: number;
  readonly bottom: number;
  readonly left: number;
  readonly width: number;
  page = 0;
  y: number;

  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly pageSize: [number, number],
    readonly margins: Margins,
  ) {
    this.top = margins.top;
    this.left = margins.side;
    this.y = margins.top;
    this.bottom = pageSize[1] - margins.bottom;
    this.width = pageSize[0] - 2 * margins.side;
    doc.addPage({ size: pageSize, margin: 0 });
  }

  /** What is left of the current page below `y`. */
  get room(): number {
    return this.bottom - this.y;
  }

  /** The height of a whole page's writing area. */
  get fullPage(): number {
    return this.bottom - this.top;
  }

  atTop(): boolean {
    return this.y <= this.top + 0.01;
  }

  goTo(page: number, y: number): void {
    while (this.doc.bufferedPageRange().count <= page) this.doc.addPage({ size: this.pageSize, margin: 0 });
    this.doc.switchToPage(page);
    this.page = page;
    this.y = y;
  }

  newPage(): void {
    this.goTo(this.page + 1, this.top);
  }

  /** Starts a new page unless `h` fits in what is left (or the page is still empty). */
  ensure(h: number): void {
    if (h > this.room && !this.atTop()) this.newPage();
  }

  /** Rows in order down one column, breaking between rows only. Returns where the column ends. */
  flow(rows: readonly Row[], x: number, from: { page: number; y: number } = { page: this.page, y: this.y }): { page: number; y: number } {
    let page = from.page;
    let y = from.y;
    for (const row of rows) {
      if (row.h > this.bottom - y && y > this.top + 0.01) {
        page++;
        y = this.top;
      }
      if (row.spacer && y <= this.top + 0.01) continue;
      this.goTo(page, y);
      row.draw(x, y);
      y += row.h;
    }
    return { page, y };
  }

  /** Rows down the full width, from where the last block ended. */
  add(rows: readonly Row[]): void {
    const end = this.flow(rows, this.left);
    this.goTo(end.page, end.y);
  }

  /** A block kept together: on the next page when it does not fit here. */
  keep(rows: readonly Row[]): void {
    this.ensure(heightOf(rows));
    this.add(rows);
  }

  /** Two columns that start together (text and photos); the writer goes on below the longer one. */
  columns(left: { rows: readonly Row[]; x: number }, right: { rows: readonly Row[]; x: number }): void {
    const from = { page: this.page, y: this.y };
    const a = this.flow(left.rows, left.x, from);
    const b = this.flow(right.rows, right.x, from);
    const end = a.page > b.page || (a.page === b.page && a.y >= b.y) ? a : b;
    this.goTo(end.page, end.y);
  }
}

/** Lines of `text` no wider than `width` (the first line `firstWidth`); an over-long word is broken. */
export function wrap(doc: PDFKit.PDFDocument, text: string, style: TextStyle, width: number, firstWidth = width): string[] {
  doc.font(style.font).fontSize(style.size);
  const clean = printable(doc, text.replace(/\s+/g, ' ').trim());
  if (!clean) return [];
  const fits = (s: string, w: number) => doc.widthOfString(s) <= w;
  const lines: string[] = [];
  let line = '';
  const limit = () => (lines.length === 0 ? firstWidth : width);
  for (const word of clean.split(' ')) {
    const next = line ? `${line} ${word}` : word;
    if (fits(next, limit())) {
      line = next;
      continue;
    }
    if (line) lines.push(line);
    let rest = word;
    while (!fits(rest, limit())) {
      let n = rest.length - 1;
      while (n > 1 && !fits(rest.slice(0, n), limit())) n--;
      lines.push(rest.slice(0, n));
      rest = rest.slice(n);
    }
    line = rest;
  }
  if (line) lines.push(line);
  return lines;
}

/** One line of text in a style, its cap height centred in the line; optionally right-aligned or a link. */
export function drawLine(
  doc: PDFKit.PDFDocument,
  text: string,
  style: TextStyle,
  x: number,
  y: number,
  options: { align?: 'right'; width?: number; color?: string; link?: string } = {},
): void {
  doc
    .font(style.font)
    .fontSize(style.size)
    .fillColor(options.color ?? style.color ?? palette.ink);
  const t = printable(doc, text);
  const dx = options.align === 'right' && options.width ? options.width - doc.widthOfString(t) : 0;
  // The baseline sits so that the cap height is centred in the line.
  const baseline = y + (style.lineHeight + style.size * 0.7) / 2;
  doc.text(t, x + dx, baseline, { lineBreak: false, baseline: 'alphabetic', ...(options.link ? { link: options.link } : {}) });
}

/** One row per line of text. */
export function textRows(doc: PDFKit.PDFDocument, text: string, style: TextStyle, width: number, options: { indent?: number; color?: string } = {}): Row[] {
  const indent = options.indent ?? 0;
  return wrap(doc, text, style, width - indent).map((line) => ({
    h: style.lineHeight,
    draw: (x, y) => drawLine(doc, line, style, x + indent, y, { color: options.color }),
  }));
}

/** A section heading over the dashed score-line rule, the one decorative motif (DESIGN.md). */
export function headingRows(doc: PDFKit.PDFDocument, text: string, width: number): Row[] {
  const H2 = STYLES.h2;
  return [
    spacer(12),
    {
      h: H2.lineHeight + 8,
      draw: (x, y) => {
        drawLine(doc, text, H2, x, y);
        doc
          .save()
          .moveTo(x, y + H2.lineHeight + 3)
          .lineTo(x + width, y + H2.lineHeight + 3)
          .lineWidth(0.6)
          .dash(3, { space: 2 })
          .strokeColor(palette.kraft)
          .stroke()
          .undash()
          .restore();
      },
    },
  ];
}

/** A paragraph-like block with an optional marker ("•", "2.") or label ("Tip") before its first line. */
export function markedRows(
  doc: PDFKit.PDFDocument,
  text: string,
  style: TextStyle,
  width: number,
  options: { indent?: number; marker?: string; label?: { text: string; color: string }; bar?: string } = {},
): Row[] {
  const indent = options.indent ?? 0;
  let labelW = 0;
  if (options.label) {
    doc.font('sans-bold').fontSize(style.size - 1);
    labelW = doc.widthOfString(options.label.text) + 4;
  }
  const lines = wrap(doc, text, style, width - indent, width - indent - labelW);
  if (!lines.length && !options.label) return [];
  if (!lines.length) lines.push('');
  return lines.map((line, i) => ({
    h: style.lineHeight,
    draw: (x, y) => {
      if (options.bar)
        doc
          .save()
          .rect(x + indent - 8, y, 2, style.lineHeight)
          .fill(options.bar)
          .restore();
      if (i === 0 && options.marker) drawLine(doc, options.marker, style, x + indent - 11, y);
      if (i === 0 && options.label)
        drawLine(doc, options.label.text, { ...style, font: 'sans-bold', size: style.size - 1 }, x + indent, y, { color: options.label.color });
      drawLine(doc, line, style, x + indent + (i === 0 ? labelW : 0), y);
    },
  }));
}

/** Something a table cell draws besides text (the kit checklist's boxes): its height and how, from the cell's top left inside the padding. */
export type CellDrawing = { h: number; draw: (x: number, y: number) => void };

/**
 * A table of wrapped cells: one `Row` per table row, with a rule under it and a shaded head. A
 * cell is a list of text parts, each in its own style, or a drawing of its own.
 */
export function tableRowMaker(doc: PDFKit.PDFDocument, width: number, shares: readonly number[], pad = 3) {
  const widths = shares.map((s) => s * width);
  const xs = widths.map((_, i) => widths.slice(0, i).reduce((a, b) => a + b, 0));
  return (cells: ({ text: string; style: TextStyle }[] | CellDrawing)[], head = false): Row => {
    const lines = cells.map((parts, i) =>
      Array.isArray(parts) ? parts.flatMap((p) => wrap(doc, p.text, p.style, widths[i]! - 2 * pad).map((l) => ({ l, style: p.style }))) : [],
    );
    const heights = cells.map((c, i) => (Array.isArray(c) ? lines[i]!.reduce((s, x) => s + x.style.lineHeight, 0) : c.h));
    const h = Math.max(...heights) + 2 * pad;
    return {
      h,
      draw: (x, y) => {
        if (head) doc.save().rect(x, y, width, h).fill(palette.shade).restore();
        cells.forEach((c, i) => {
          if (!Array.isArray(c)) c.draw(x + xs[i]! + pad, y + pad);
        });
        lines.forEach((ls, i) => {
          let yy = y + pad;
          for (const { l, style } of ls) {
            drawLine(doc, l, style, x + xs[i]! + pad, yy);
            yy += style.lineHeight;
          }
        });
        doc
          .save()
          .moveTo(x, y + h)
          .lineTo(x + width, y + h)
          .lineWidth(0.5)
          .strokeColor(palette.rule)
          .stroke()
          .restore();
      },
    };
  };
}

/**
 * A table down the page: a short one (up to 60% of a page) stays whole; a long one keeps its
 * heading, column titles and first row together, breaks between rows only, and repeats the
 * column titles at the top of each new page.
 */
export function addTable(w: FlowWriter, table: { heading: readonly Row[]; header: Row; body: readonly Row[] }): void {
  const { heading, header, body } = table;
  const whole = heightOf(heading) + header.h + heightOf(body);
  w.ensure(whole <= w.fullPage * 0.6 ? whole : heightOf(heading) + header.h + (body[0]?.h ?? 0));
  w.add([...heading, header]);
  for (const row of body) {
    if (row.h > w.room) {
      w.newPage();
      w.add([header]);
    }
    w.add([row]);
  }
}

/** A footer on every buffered page, in the bottom margin: a dashed rule, `left` and "Page i of n". */
export function drawFooters(w: FlowWriter, left: string): void {
  const { doc } = w;
  const range = doc.bufferedPageRange();
  const footY = w.pageSize[1] - w.margins.bottom + 26;
  const small = STYLES.small;
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    doc
      .save()
      .moveTo(w.left, footY - 4)
      .lineTo(w.left + w.width, footY - 4)
      .lineWidth(0.5)
      .dash(3, { space: 2 })
      .strokeColor(palette.rule)
      .stroke()
      .undash()
      .restore();
    drawLine(doc, left, small, w.left, footY);
    drawLine(doc, `Page ${i + 1} of ${range.count}`, small, w.left, footY, { align: 'right', width: w.width });
  }
}
