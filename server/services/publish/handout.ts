/**
 * The printable class handout (P2) as a PDF: title and cover photo, a QR code to the video (or
 * the public page), supplies, the cut list with fractions and millimetres, the numbered steps
 * with small photos, tips, cautions and the usual safety notes, page numbers in the footer.
 *
 * Text is wrapped here, line by line, rather than by pdfkit, so every block's height is known
 * before it is drawn: a step moves to the next page whole when it does not fit, and a step's
 * photos always start on the same page as its text.
 */
import type { JSONContent } from '@tiptap/core';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { groupSupplies, supplyDetails } from '@shared/editor/render-parts';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { docIntro, docSteps, inlineText, shortUrl, topLevelCallouts } from './doc-parts';
import { printable, registerFonts, type FontName } from './fonts';
import { fitWidth, imageSize, resizeJpeg } from './images';
import { toRenderSupplies } from './render-inputs';
import { detectHazards, safetyNotes } from './safety';
import { paperSize, pieceSizeText, scoreLineText } from './sizes';
import { pdfBuffer } from './pdf-buffer';
import type { Paper, PublishBundle, PublishStill } from './types';

export interface HandoutOptions {
  paper: Paper;
}

const INK = '#22303C';
const PENCIL = '#8A8F98';
const KRAFT = '#A87B4F';
const SAGE = '#6E8B74';
const ROSEHIP = '#B5475B';
const RULE = '#D9D2C7';

const MARGIN = 54; // 3/4 in
const BOTTOM = 62; // room for the footer
const PHOTO_COL = 144; // 2 in
const PHOTO_MAX_H = 216; // 3 in
const COL_GAP = 14;
const QR_SIZE = 72; // 1 in: scans from arm's length

interface TextStyle {
  font: FontName;
  size: number;
  lineHeight: number;
  color?: string;
}

const BODY: TextStyle = { font: 'serif', size: 9.5, lineHeight: 14 };
const QUOTE: TextStyle = { font: 'serif-italic', size: 9.5, lineHeight: 14 };
const SMALL: TextStyle = { font: 'sans', size: 7.5, lineHeight: 10, color: PENCIL };
const TABLE: TextStyle = { font: 'sans', size: 8, lineHeight: 10.5 };
const TABLE_HEAD: TextStyle = { font: 'sans-bold', size: 8, lineHeight: 10.5 };
const H2: TextStyle = { font: 'serif-bold', size: 13, lineHeight: 18 };
const STEP_TITLE: TextStyle = { font: 'serif-bold', size: 11, lineHeight: 15 };
const TITLE: TextStyle = { font: 'serif-bold', size: 22, lineHeight: 28 };

/** Something drawn at a position, whose height is known in advance. */
interface Row {
  h: number;
  draw: (x: number, y: number) => void;
  /** Dropped when it would open a page (space between blocks). */
  spacer?: boolean;
}

const spacer = (h: number): Row => ({ h, draw: () => undefined, spacer: true });
const heightOf = (rows: readonly Row[]) => rows.reduce((s, r) => s + r.h, 0);

/** Places rows down the page, starting new pages as needed (pages are buffered for the footer). */
class Writer {
  readonly top = MARGIN;
  readonly bottom: number;
  readonly left = MARGIN;
  readonly width: number;
  page = 0;
  y = MARGIN;

  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly pageSize: [number, number],
  ) {
    this.bottom = pageSize[1] - BOTTOM;
    this.width = pageSize[0] - 2 * MARGIN;
    doc.addPage({ size: pageSize, margin: 0 });
  }

  get room(): number {
    return this.bottom - this.y;
  }

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

  add(rows: readonly Row[]): void {
    const end = this.flow(rows, this.left);
    this.goTo(end.page, end.y);
  }
}

/** Lines of `text` no wider than `width` (the first line `firstWidth`); an over-long word is broken. */
function wrap(doc: PDFKit.PDFDocument, text: string, style: TextStyle, width: number, firstWidth = width): string[] {
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
    line = '';
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

function drawLine(doc: PDFKit.PDFDocument, text: string, style: TextStyle, x: number, y: number, options: { align?: 'right'; width?: number; color?: string; link?: string } = {}): void {
  doc.font(style.font).fontSize(style.size).fillColor(options.color ?? style.color ?? INK);
  const t = printable(doc, text);
  const dx = options.align === 'right' && options.width ? options.width - doc.widthOfString(t) : 0;
  // The baseline sits so that the cap height is centred in the line.
  const baseline = y + (style.lineHeight + style.size * 0.7) / 2;
  doc.text(t, x + dx, baseline, { lineBreak: false, baseline: 'alphabetic', ...(options.link ? { link: options.link } : {}) });
}

/** One row per line of text. */
function textRows(doc: PDFKit.PDFDocument, text: string, style: TextStyle, width: number, options: { indent?: number; color?: string } = {}): Row[] {
  const indent = options.indent ?? 0;
  return wrap(doc, text, style, width - indent).map((line) => ({ h: style.lineHeight, draw: (x, y) => drawLine(doc, line, style, x + indent, y, { color: options.color }) }));
}

function headingRows(doc: PDFKit.PDFDocument, text: string, width: number): Row[] {
  return [
    spacer(12),
    {
      h: H2.lineHeight + 8,
      draw: (x, y) => {
        drawLine(doc, text, H2, x, y);
        // The dashed score-line rule, the one decorative motif (DESIGN.md).
        doc.save().moveTo(x, y + H2.lineHeight + 3).lineTo(x + width, y + H2.lineHeight + 3).lineWidth(0.6).dash(3, { space: 2 }).strokeColor(KRAFT).stroke().undash().restore();
      },
    },
  ];
}

/** A paragraph-like block with an optional marker ("•", "2.") or label ("Tip") before its first line. */
function markedRows(
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
      if (options.bar) doc.save().rect(x + indent - 8, y, 2, style.lineHeight).fill(options.bar).restore();
      if (i === 0 && options.marker) drawLine(doc, options.marker, style, x + indent - 11, y);
      if (i === 0 && options.label) drawLine(doc, options.label.text, { ...style, font: 'sans-bold', size: style.size - 1 }, x + indent, y, { color: options.label.color });
      drawLine(doc, line, style, x + indent + (i === 0 ? labelW : 0), y);
    },
  }));
}

/** The rows of a step's (or callout's) text blocks; stills are left to the caller. */
function blockRows(doc: PDFKit.PDFDocument, nodes: readonly JSONContent[] | undefined, width: number, indent = 0): Row[] {
  const rows: Row[] = [];
  for (const n of nodes ?? []) {
    switch (n.type) {
      case 'paragraph': {
        const lines = markedRows(doc, inlineText(n.content, { links: 'short' }), BODY, width, { indent });
        if (lines.length) rows.push(...lines, spacer(4));
        break;
      }
      case 'bulletList':
      case 'orderedList': {
        let k = typeof n.attrs?.start === 'number' ? n.attrs.start : 1;
        for (const item of n.content ?? []) {
          const marker = n.type === 'bulletList' ? '•' : `${k++}.`;
          const [first, ...rest] = item.content ?? [];
          if (first?.type === 'paragraph') rows.push(...markedRows(doc, inlineText(first.content, { links: 'short' }), BODY, width, { indent: indent + 14, marker }));
          rows.push(...blockRows(doc, first?.type === 'paragraph' ? rest : item.content, width, indent + 14));
        }
        rows.push(spacer(4));
        break;
      }
      case 'blockquote':
        for (const p of n.content ?? []) if (p.type === 'paragraph') rows.push(...markedRows(doc, inlineText(p.content, { links: 'short' }), QUOTE, width, { indent: indent + 12 }));
        rows.push(spacer(4));
        break;
      case 'tip':
      case 'caution':
        rows.push(...calloutRows(doc, n.type, n.content, width, indent));
        break;
      default:
        break;
    }
  }
  return rows;
}

function calloutRows(doc: PDFKit.PDFDocument, kind: 'tip' | 'caution', content: readonly JSONContent[] | undefined, width: number, indent = 0): Row[] {
  const color = kind === 'tip' ? SAGE : ROSEHIP;
  const rows: Row[] = [];
  (content ?? []).forEach((p, i) => {
    const text = p.type === 'paragraph' ? inlineText(p.content, { links: 'short' }) : inlineText((p.content ?? []).flatMap((li) => li.content?.[0]?.content ?? []), { links: 'short' });
    rows.push(...markedRows(doc, text, BODY, width, { indent: indent + 10, bar: color, ...(i === 0 ? { label: { text: kind === 'tip' ? 'Tip' : 'Caution', color } } : {}) }));
  });
  if (rows.length) rows.push(spacer(5));
  return rows;
}

interface PrintPhoto {
  data: Buffer;
  width: number;
  height: number;
  caption: string;
}

function photoRows(doc: PDFKit.PDFDocument, photos: readonly PrintPhoto[], column: number): Row[] {
  return photos.flatMap((p) => {
    // At most 3 in tall, so a portrait photo never outgrows a page.
    const h = Math.min((column * p.height) / p.width, PHOTO_MAX_H);
    const width = (h * p.width) / p.height;
    const caption = p.caption ? wrap(doc, p.caption, SMALL, column) : [];
    return [
      {
        h: h + caption.length * SMALL.lineHeight + 8,
        draw: (x: number, y: number) => {
          doc.image(p.data, x + column - width, y, { width, height: h });
          caption.forEach((c, i) => drawLine(doc, c, SMALL, x, y + h + 2 + i * SMALL.lineHeight));
        },
      },
    ];
  });
}

/** The still behind a still node: one of the bundle's stills by id. */
function stillFor(node: JSONContent, stills: ReadonlyMap<string, PublishStill>): PublishStill | undefined {
  const id = node.attrs?.stillId;
  return typeof id === 'string' ? stills.get(id) : undefined;
}

async function printPhoto(still: PublishStill, widthPx: number, caption: string): Promise<PrintPhoto> {
  const size = fitWidth(await imageSize(still.file), widthPx);
  return { data: await resizeJpeg(still.file, size, 82), ...size, caption };
}

function stillsOf(nodes: readonly JSONContent[] | undefined): JSONContent[] {
  const out: JSONContent[] = [];
  for (const n of nodes ?? []) {
    if (n.type === 'still') out.push(n);
    else if (n.content && n.type !== 'tip' && n.type !== 'caution') out.push(...stillsOf(n.content));
  }
  return out;
}

/**
 * The handout PDF, Letter or A4, with Merriweather for headings and text and Inter for small
 * labels embedded. Photos are resized for print first (about 200 dpi at their printed size).
 */
export async function handoutPdf(bundle: PublishBundle, options: HandoutOptions): Promise<Buffer> {
  const paper = paperSize(options.paper);
  const { tutorial } = bundle;
  const doc = new PDFDocument({ size: paper.points, margin: 0, autoFirstPage: false, bufferPages: true, info: { Title: tutorial.title, Author: tutorial.authorName, Creator: 'Cardwright' } });
  const done = pdfBuffer(doc);
  registerFonts(doc);
  const w = new Writer(doc, paper.points);
  const stills = new Map(bundle.stills.map((s) => [s.id, s]));

  // Header: title and byline beside the QR code. The video first (DESIGN.md P2), else the public page.
  const qrUrl = tutorial.videoUrl || tutorial.publicUrl;
  const qrLabel = tutorial.videoUrl ? 'Scan to watch the video' : 'Scan for the online tutorial';
  const titleWidth = qrUrl ? w.width - QR_SIZE - COL_GAP : w.width;
  const byline = [tutorial.authorName && `By ${tutorial.authorName}`, tutorial.studioName, tutorial.totalTimeMinutes ? `About ${minutes(tutorial.totalTimeMinutes)}` : '']
    .filter(Boolean)
    .join(' · ');
  const headRows = [...textRows(doc, tutorial.title, TITLE, titleWidth), spacer(2), ...textRows(doc, byline, { ...SMALL, size: 8.5, lineHeight: 12 }, titleWidth)];
  let headH = heightOf(headRows);
  if (qrUrl) {
    const png = await QRCode.toBuffer(qrUrl, { type: 'png', errorCorrectionLevel: 'M', margin: 1, scale: 8 });
    const x = w.left + w.width - QR_SIZE;
    doc.image(png, x, w.top, { width: QR_SIZE, height: QR_SIZE });
    const label = wrap(doc, qrLabel, SMALL, QR_SIZE + 10);
    label.forEach((l, i) => drawLine(doc, l, SMALL, x - 5, w.top + QR_SIZE + 2 + i * SMALL.lineHeight));
    drawLine(doc, shortUrl(qrUrl, 28), { ...SMALL, size: 6 }, x - 5, w.top + QR_SIZE + 2 + label.length * SMALL.lineHeight, { link: qrUrl });
    headH = Math.max(headH, QR_SIZE + (label.length + 1) * SMALL.lineHeight + 4);
  }
  w.flow(headRows, w.left);
  w.goTo(0, w.top + headH + 8);

  for (const p of docIntro(bundle.doc)) w.add([...textRows(doc, inlineText(p.content, { links: 'short' }), BODY, w.width), spacer(4)]);

  const cover = bundle.stills[0];
  if (cover) {
    const photo = await printPhoto(cover, 1400, '');
    let width = w.width;
    let h = (width * photo.height) / photo.width;
    const maxH = 230;
    if (h > maxH) {
      width = (width * maxH) / h;
      h = maxH;
    }
    const x = w.left + (w.width - width) / 2;
    w.add([spacer(4), { h: h + 6, draw: (_x, y) => doc.image(photo.data, x, y, { width, height: h }) }]);
  }

  // Supplies, grouped by category.
  const supplies = toRenderSupplies(bundle.supplies);
  if (supplies.length) {
    const rows: Row[][] = [];
    if (bundle.disclosure?.trim() && bundle.supplies.some((s) => s.sponsored && s.url)) rows.push([...textRows(doc, bundle.disclosure.trim(), { ...SMALL, font: 'sans' }, w.width), spacer(4)]);
    for (const g of groupSupplies(supplies)) {
      const items = g.items.map((s) => {
        const d = supplyDetails(s);
        const extra = [s.url ? shortUrl(s.url) : '', d.code ? `discount code ${d.code}` : ''].filter(Boolean).join(' · ');
        return [...markedRows(doc, `${s.name}${d.quantity}${d.note}`, BODY, w.width, { indent: 12, marker: '•' }), ...(extra ? textRows(doc, extra, SMALL, w.width, { indent: 12 }) : [])];
      });
      const label = textRows(doc, g.label, { font: 'sans-bold', size: 8, lineHeight: 13, color: KRAFT }, w.width);
      rows.push([...label, ...(items[0] ?? [])], ...items.slice(1));
    }
    const heading = headingRows(doc, 'Supplies', w.width);
    w.ensure(heightOf(heading) + heightOf(rows[0] ?? []) + heightOf(rows[1] ?? []));
    w.add(heading);
    for (const group of rows) {
      w.ensure(heightOf(group));
      w.add(group);
    }
  }

  // The cut list as a table: every number with its unit, inches and millimetres in their own columns.
  if (bundle.pieces.length) {
    const cols = [
      { title: 'Piece', share: 0.19 },
      { title: 'Material', share: 0.16 },
      { title: 'Qty', share: 0.05 },
      { title: 'Size (in)', share: 0.19 },
      { title: 'Size (mm)', share: 0.18 },
      { title: 'Score lines', share: 0.23 },
    ];
    const pad = 3;
    const widths = cols.map((c) => c.share * w.width);
    const xs = widths.map((_, i) => widths.slice(0, i).reduce((a, b) => a + b, 0));
    const tableRow = (cells: { text: string; style: TextStyle }[][], head = false): Row => {
      const lines = cells.map((parts, i) => parts.flatMap((p) => wrap(doc, p.text, p.style, widths[i]! - 2 * pad).map((l) => ({ l, style: p.style }))));
      const h = Math.max(...lines.map((ls) => heightOf(ls.map((x) => ({ h: x.style.lineHeight, draw: () => undefined }))))) + 2 * pad;
      return {
        h,
        draw: (x, y) => {
          if (head) doc.save().rect(x, y, w.width, h).fill('#F1ECE4').restore();
          lines.forEach((ls, i) => {
            let yy = y + pad;
            for (const { l, style } of ls) {
              drawLine(doc, l, style, x + xs[i]! + pad, yy);
              yy += style.lineHeight;
            }
          });
          doc.save().moveTo(x, y + h).lineTo(x + w.width, y + h).lineWidth(0.5).strokeColor(RULE).stroke().restore();
        },
      };
    };
    const header = tableRow(cols.map((c) => [{ text: c.title, style: TABLE_HEAD }]), true);
    const body = bundle.pieces.map((p) => {
      const size = pieceSizeText(p, bundle.precision, { unitEach: true });
      const notes = p.notes?.trim() ? [{ text: p.notes.trim(), style: { ...TABLE, size: 7, lineHeight: 9, color: PENCIL } }] : [];
      return tableRow([
        [{ text: p.name, style: TABLE_HEAD }, ...notes],
        [{ text: p.material, style: TABLE }],
        [{ text: String(p.quantity), style: TABLE }],
        [{ text: size.inches, style: TABLE }],
        [{ text: size.mm, style: TABLE }],
        p.scoreLines.length ? p.scoreLines.map((s) => ({ text: scoreLineText(s, bundle.precision, true), style: TABLE })) : [{ text: '—', style: { ...TABLE, color: PENCIL } }],
      ]);
    });
    const heading = headingRows(doc, 'Cut list', w.width);
    const whole = heightOf(heading) + header.h + heightOf(body);
    // A short table stays in one piece; a long one keeps at least its titles and first row together.
    w.ensure(whole <= w.fullPage * 0.6 ? whole : heightOf(heading) + header.h + (body[0]?.h ?? 0));
    w.add([...heading, header]);
    for (const row of body) {
      if (row.h > w.room) {
        w.newPage();
        // The column titles again at the top of the new page.
        w.add([header]);
      }
      w.add([row]);
    }
    const metric = bundle.pieces.some((p) => p.width.unit !== 'in');
    const note = `Millimetres are rounded to 0.1 mm.${metric ? ` Inch sizes of pieces given in millimetres are the nearest 1/${bundle.precision} in (marked ~).` : ''}`;
    w.add([spacer(3), ...textRows(doc, note, SMALL, w.width)]);
  }

  // Steps: text on the left, photos on the right; the whole step moves to a new page when it does not fit.
  const steps = docSteps(bundle.doc);
  if (steps.length) {
    const textW = w.width - PHOTO_COL - COL_GAP;
    const prepared = await Promise.all(
      steps.map(async (s) => {
        const photos: PrintPhoto[] = [];
        for (const n of stillsOf(s.body)) {
          const still = stillFor(n, stills);
          if (!still) continue;
          const caption = typeof n.attrs?.caption === 'string' && n.attrs.caption.trim() ? n.attrs.caption.trim() : still.caption.trim();
          photos.push(await printPhoto(still, 600, caption));
        }
        return { step: s, photos };
      }),
    );
    let first = true;
    for (const { step, photos } of prepared) {
      const hasPhotos = photos.length > 0;
      const width = hasPhotos ? textW : w.width;
      const time = step.atMs !== null ? `${formatTimestamp(step.atMs)} in the video` : '';
      doc.font('sans').fontSize(SMALL.size);
      const timeW = time ? doc.widthOfString(time) + 8 : 0;
      const titleLines = wrap(doc, `${step.number}. ${step.title}`, STEP_TITLE, w.width - timeW);
      const title: Row[] = titleLines.map((l, i) => ({
        h: STEP_TITLE.lineHeight,
        draw: (x, y) => {
          drawLine(doc, l, STEP_TITLE, x, y);
          if (i === 0 && time) drawLine(doc, time, { ...SMALL, lineHeight: STEP_TITLE.lineHeight }, x, y, { align: 'right', width: w.width });
        },
      }));
      title.push(spacer(3));
      const text = blockRows(doc, step.body, width);
      const pics = photoRows(doc, photos, PHOTO_COL);
      const total = heightOf(title) + Math.max(heightOf(text), heightOf(pics)) + 8;
      const heading = first ? headingRows(doc, 'Steps', w.width) : [];
      const block = heightOf(heading) + total;
      // A step taller than a page starts where its title, first lines and first photo fit, then flows on.
      const start = heightOf(heading) + heightOf(title) + Math.max(heightOf(text.slice(0, 4)), pics[0]?.h ?? 0);
      w.ensure(block <= w.fullPage ? block : start);
      if (first) w.add(heading);
      first = false;
      w.add(title);
      // Two columns that start together; only a step taller than a page continues on the next.
      const from = { page: w.page, y: w.y };
      const a = w.flow(text, w.left, from);
      const b = w.flow(pics, w.left + w.width - PHOTO_COL, from);
      const end = a.page > b.page || (a.page === b.page && a.y >= b.y) ? a : b;
      w.goTo(end.page, end.y);
      w.add([spacer(8)]);
    }
  }

  // Tips and cautions from the write-up, then the safety notes for the tools used.
  const callouts = topLevelCallouts(bundle.doc);
  const notes = safetyNotes(detectHazards(bundle));
  const blocks: Row[][] = [
    ...callouts.map((c) => calloutRows(doc, c.kind, c.content, w.width)),
    [spacer(2), ...textRows(doc, 'Safety', { font: 'sans-bold', size: 8, lineHeight: 13, color: ROSEHIP }, w.width)],
    ...notes.map((n) => [...markedRows(doc, n, BODY, w.width, { indent: 12, marker: '•' }), spacer(2)]),
  ];
  const heading = headingRows(doc, callouts.length ? 'Tips and safety' : 'Safety', w.width);
  if (!callouts.length) blocks.splice(0, 1);
  w.ensure(heightOf(heading) + heightOf(blocks[0] ?? []) + heightOf(blocks[1] ?? []));
  w.add(heading);
  for (const b of blocks) {
    w.ensure(heightOf(b));
    w.add(b);
  }

  // Footer on every page, in the bottom margin.
  const range = doc.bufferedPageRange();
  const footY = paper.points[1] - BOTTOM + 26;
  const footLeft = [tutorial.title, tutorial.studioName].filter(Boolean).join(' · ');
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    doc.save().moveTo(w.left, footY - 4).lineTo(w.left + w.width, footY - 4).lineWidth(0.5).dash(3, { space: 2 }).strokeColor(RULE).stroke().undash().restore();
    drawLine(doc, footLeft, SMALL, w.left, footY);
    drawLine(doc, `Page ${i + 1} of ${range.count}`, SMALL, w.left, footY, { align: 'right', width: w.width });
  }
  doc.flushPages();
  doc.end();
  return done;
}

function minutes(total: number): string {
  const m = Math.round(total);
  const h = Math.floor(m / 60);
  const rest = m % 60;
  return h ? `${h} h${rest ? ` ${rest} min` : ''}` : `${rest} min`;
}
