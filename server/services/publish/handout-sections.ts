/**
 * The class handout's sections, one function each, drawn through the flow layout (pdf-flow.ts):
 * header with the QR code, introduction, cover photo, supplies, cut list, steps, tips and safety.
 * Each takes the writer and the publish bundle, so another printed page (the kit checklist, a
 * class handout) can pick the sections it needs and add its own.
 */
import type { JSONContent } from '@tiptap/core';
import QRCode from 'qrcode';
import { groupSupplies, sponsoredTag, supplyDetails } from '@shared/editor/render-parts';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { palette } from '@shared/palette';
import { docIntro, docSteps, inlineText, shortUrl, topLevelCallouts } from './doc-parts';
import { fitWidth, imageSize, resizeJpeg } from './images';
import { toRenderSupplies } from './render-inputs';
import { detectHazards, safetyNotes } from './safety';
import { pieceSizeText, scoreLineText } from './sizes';
import {
  drawLine,
  heightOf,
  headingRows,
  markedRows,
  spacer,
  STYLES,
  tableRowMaker,
  addTable,
  textRows,
  wrap,
  type FlowWriter,
  type Row,
  type TextStyle,
} from './pdf-flow';
import type { PublishBundle, PublishStill } from './types';

const { body: BODY, quote: QUOTE, small: SMALL, table: TABLE, tableHead: TABLE_HEAD, stepTitle: STEP_TITLE, title: TITLE } = STYLES;

const PHOTO_COL = 144; // 2 in
const PHOTO_MAX_H = 216; // 3 in
const COL_GAP = 14;
const QR_SIZE = 72; // 1 in: scans from arm's length

/** What every section draws with. */
export type SectionContext = {
  w: FlowWriter;
  bundle: PublishBundle;
  /** A class handout: the class's own cautions instead of those found in the tutorial. */
  safetyNotes?: readonly string[];
  /** A class handout: when and where, under the byline. */
  classNote?: string;
};

/** The rows of a step's (or callout's) text blocks; stills are left to the caller. */
export function blockRows(doc: PDFKit.PDFDocument, nodes: readonly JSONContent[] | undefined, width: number, indent = 0): Row[] {
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
          if (first?.type === 'paragraph')
            rows.push(...markedRows(doc, inlineText(first.content, { links: 'short' }), BODY, width, { indent: indent + 14, marker }));
          rows.push(...blockRows(doc, first?.type === 'paragraph' ? rest : item.content, width, indent + 14));
        }
        rows.push(spacer(4));
        break;
      }
      case 'blockquote':
        for (const p of n.content ?? [])
          if (p.type === 'paragraph') rows.push(...markedRows(doc, inlineText(p.content, { links: 'short' }), QUOTE, width, { indent: indent + 12 }));
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

/** A tip (sage) or caution (rosehip) with its label and a bar down the side. */
export function calloutRows(doc: PDFKit.PDFDocument, kind: 'tip' | 'caution', content: readonly JSONContent[] | undefined, width: number, indent = 0): Row[] {
  const color = kind === 'tip' ? palette.sage : palette.rosehip;
  const rows: Row[] = [];
  (content ?? []).forEach((p, i) => {
    const text =
      p.type === 'paragraph'
        ? inlineText(p.content, { links: 'short' })
        : inlineText(
            (p.content ?? []).flatMap((li) => li.content?.[0]?.content ?? []),
            { links: 'short' },
          );
    rows.push(
      ...markedRows(doc, text, BODY, width, {
        indent: indent + 10,
        bar: color,
        ...(i === 0 ? { label: { text: kind === 'tip' ? 'Tip' : 'Caution', color } } : {}),
      }),
    );
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

/** A still resized for print (about 200 dpi at its printed size). */
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

function minutes(total: number): string {
  const m = Math.round(total);
  const h = Math.floor(m / 60);
  const rest = m % 60;
  return h ? `${h} h${rest ? ` ${rest} min` : ''}` : `${rest} min`;
}

/** Title and byline beside the QR code: the video first (DESIGN.md P2), else the public page. */
export async function drawHeader({ w, bundle, classNote }: SectionContext): Promise<void> {
  const { doc } = w;
  const { tutorial } = bundle;
  const qrUrl = tutorial.videoUrl || tutorial.publicUrl;
  const qrLabel = tutorial.videoUrl ? 'Scan to watch the video' : 'Scan for the online tutorial';
  const titleWidth = qrUrl ? w.width - QR_SIZE - COL_GAP : w.width;
  const byline = [
    tutorial.authorName && `By ${tutorial.authorName}`,
    tutorial.studioName,
    tutorial.totalTimeMinutes ? `About ${minutes(tutorial.totalTimeMinutes)}` : '',
  ]
    .filter(Boolean)
    .join(' · ');
  const headRows = [
    ...textRows(doc, tutorial.title, TITLE, titleWidth),
    spacer(2),
    ...textRows(doc, byline, { ...SMALL, size: 8.5, lineHeight: 12 }, titleWidth),
    ...(classNote ? [spacer(2), ...textRows(doc, classNote, { font: 'sans-bold', size: 8.5, lineHeight: 12, color: palette.kraft }, titleWidth)] : []),
  ];
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
}

/** The write-up's opening paragraphs, before its first section. */
export function drawIntro({ w, bundle }: SectionContext): void {
  for (const p of docIntro(bundle.doc)) w.add([...textRows(w.doc, inlineText(p.content, { links: 'short' }), BODY, w.width), spacer(4)]);
}

/** The first still, centred, at most 230 pt tall. */
export async function drawCover({ w, bundle }: SectionContext): Promise<void> {
  const cover = bundle.stills[0];
  if (!cover) return;
  const photo = await printPhoto(cover, 1400, '');
  let width = w.width;
  let h = (width * photo.height) / photo.width;
  const maxH = 230;
  if (h > maxH) {
    width = (width * maxH) / h;
    h = maxH;
  }
  const x = w.left + (w.width - width) / 2;
  w.add([spacer(4), { h: h + 6, draw: (_x, y) => w.doc.image(photo.data, x, y, { width, height: h }) }]);
}

/** Supplies grouped by category, with the sponsorship disclosure when a link needs it. */
export function drawSupplies({ w, bundle }: SectionContext): void {
  const { doc } = w;
  const supplies = toRenderSupplies(bundle.supplies);
  if (!supplies.length) return;
  const rows: Row[][] = [];
  if (bundle.disclosure?.trim() && bundle.supplies.some((s) => s.sponsored && s.url))
    rows.push([...textRows(doc, bundle.disclosure.trim(), { ...SMALL, font: 'sans' }, w.width), spacer(4)]);
  for (const g of groupSupplies(supplies)) {
    const items = g.items.map((s) => {
      const d = supplyDetails(s);
      const extra = [s.url ? shortUrl(s.url) : '', d.code ? `discount code ${d.code}` : ''].filter(Boolean).join(' · ');
      return [
        ...markedRows(doc, `${s.name}${sponsoredTag(s)}${d.quantity}${d.note}`, BODY, w.width, { indent: 12, marker: '•' }),
        ...(extra ? textRows(doc, extra, SMALL, w.width, { indent: 12 }) : []),
      ];
    });
    const label = textRows(doc, g.label, { font: 'sans-bold', size: 8, lineHeight: 13, color: palette.kraft }, w.width);
    rows.push([...label, ...(items[0] ?? [])], ...items.slice(1));
  }
  const heading = headingRows(doc, 'Supplies', w.width);
  w.ensure(heightOf(heading) + heightOf(rows[0] ?? []) + heightOf(rows[1] ?? []));
  w.add(heading);
  for (const group of rows) w.keep(group);
}

/** The cut list as a table: every number with its unit, inches and millimetres in their own columns. */
export function drawCutList({ w, bundle }: SectionContext): void {
  const { doc } = w;
  if (!bundle.pieces.length) return;
  const cols = [
    { title: 'Piece', share: 0.19 },
    { title: 'Material', share: 0.16 },
    { title: 'Qty', share: 0.05 },
    { title: 'Size (in)', share: 0.19 },
    { title: 'Size (mm)', share: 0.18 },
    { title: 'Score lines', share: 0.23 },
  ];
  const tableRow = tableRowMaker(
    doc,
    w.width,
    cols.map((c) => c.share),
  );
  const header = tableRow(
    cols.map((c) => [{ text: c.title, style: TABLE_HEAD }]),
    true,
  );
  const faint = (style: TextStyle): TextStyle => ({ ...style, color: palette.pencil });
  const body = bundle.pieces.map((p) => {
    const size = pieceSizeText(p, bundle.precision, { unitEach: true });
    const notes = p.notes?.trim() ? [{ text: p.notes.trim(), style: faint({ ...TABLE, size: 7, lineHeight: 9 }) }] : [];
    return tableRow([
      [{ text: p.name, style: TABLE_HEAD }, ...notes],
      // The grain the piece must be cut with, as the template's arrow says it.
      [
        { text: p.material, style: TABLE },
        ...(p.grain && p.grain !== 'any' ? [{ text: `grain ↔ along its ${p.grain}`, style: faint({ ...TABLE, size: 7, lineHeight: 9 }) }] : []),
      ],
      [{ text: String(p.quantity), style: TABLE }],
      [{ text: size.inches, style: TABLE }],
      [{ text: size.mm, style: TABLE }],
      p.scoreLines.length ? p.scoreLines.map((s) => ({ text: scoreLineText(s, bundle.precision, true), style: TABLE })) : [{ text: '—', style: faint(TABLE) }],
    ]);
  });
  addTable(w, { heading: headingRows(doc, 'Cut list', w.width), header, body });
  const metric = bundle.pieces.some((p) => p.width.unit !== 'in');
  const note = `Millimetres are rounded to 0.1 mm.${metric ? ` Inch sizes of pieces given in millimetres are the nearest 1/${bundle.precision} in (marked ~).` : ''}`;
  w.add([spacer(3), ...textRows(doc, note, SMALL, w.width)]);
}

/** Numbered steps: text on the left, photos on the right; a step moves to a new page whole when it does not fit. */
export async function drawSteps({ w, bundle }: SectionContext): Promise<void> {
  const { doc } = w;
  const steps = docSteps(bundle.doc);
  if (!steps.length) return;
  const stills = new Map(bundle.stills.map((s) => [s.id, s]));
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
    w.columns({ rows: text, x: w.left }, { rows: pics, x: w.left + w.width - PHOTO_COL });
    w.add([spacer(8)]);
  }
}

/** Tips and cautions from the write-up, then the usual safety notes for the tools and materials used. */
export function drawTipsAndSafety({ w, bundle, safetyNotes: own }: SectionContext): void {
  const { doc } = w;
  const callouts = topLevelCallouts(bundle.doc);
  const notes = own ? [...own] : safetyNotes(detectHazards(bundle));
  const blocks: Row[][] = [
    ...callouts.map((c) => calloutRows(doc, c.kind, c.content, w.width)),
    [spacer(2), ...textRows(doc, 'Safety', { font: 'sans-bold', size: 8, lineHeight: 13, color: palette.rosehip }, w.width)],
    ...notes.map((n) => [...markedRows(doc, n, BODY, w.width, { indent: 12, marker: '•' }), spacer(2)]),
  ];
  const heading = headingRows(doc, callouts.length ? 'Tips and safety' : 'Safety', w.width);
  if (!callouts.length) blocks.splice(0, 1);
  w.ensure(heightOf(heading) + heightOf(blocks[0] ?? []) + heightOf(blocks[1] ?? []));
  w.add(heading);
  for (const b of blocks) w.keep(b);
}
