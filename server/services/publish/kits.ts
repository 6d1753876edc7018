/**
 * Kits as a PDF (Letter or A4): the kit planner's figures and the pre-cut checklist, one row a
 * piece with its size in inches and millimetres, how many per kit and in all, and a box to tick
 * for each kit. The layout is the flow writer's (pdf-flow.ts), as the handout's: rows never split
 * across pages and the column titles repeat on each new page.
 */
import PDFDocument from 'pdfkit';
import { formatMoney } from '@shared/money';
import { palette } from '@shared/palette';
import type { KitPlanDto } from '@shared/schemas/class';
import { registerFonts } from './fonts';
import { pdfBuffer } from './pdf-buffer';
import { addTable, drawFooters, FlowWriter, headingRows, spacer, STYLES, tableRowMaker, textRows, type CellDrawing, type TextStyle } from './pdf-flow';
import { paperSize } from './sizes';
import type { Paper } from './types';

export type KitsPdfInput = { title: string; studioName: string; when: string; place: string; plan: KitPlanDto; paper: Paper };

/** 3/4 in at the sides and top; the bottom leaves room for the footer. */
const MARGINS = { side: 54, top: 54, bottom: 62 };
const BOX = 9;
const BOX_GAP = 4;
const { table: TABLE, tableHead: TABLE_HEAD, small: SMALL } = STYLES;
const LINE: TextStyle = { font: 'sans', size: 9, lineHeight: 12 };
const WARN: TextStyle = { ...TABLE, color: palette.rosehip };

type Cell = { text: string; style: TextStyle }[];
const cell = (text: string, style: TextStyle = TABLE): Cell => [{ text, style }];

/** The materials, their sheets and what they cost, then the totals against the kit fee. */
function drawFigures(w: FlowWriter, plan: KitPlanDto): void {
  const { doc } = w;
  const money = (n: number) => formatMoney(n, plan.currency);
  const row = tableRowMaker(doc, w.width, [0.34, 0.22, 0.12, 0.16, 0.16]);
  const header = row(
    ['Material', 'Stock sheet', 'Sheets', 'Per sheet', 'Cost'].map((t) => cell(t, TABLE_HEAD)),
    true,
  );
  const body = plan.materials.map((m) =>
    row([
      // A material's problems (a piece that does not fit its sheet) sit under its name.
      [{ text: m.material, style: TABLE }, ...m.errors.map((e) => ({ text: e, style: { ...WARN, size: 7.5, lineHeight: 10 } }))],
      cell(m.sheetLabel),
      cell(String(m.sheets)),
      cell(m.sheetPriceCents !== null && m.sheetPriceCurrency ? formatMoney(m.sheetPriceCents, m.sheetPriceCurrency) : '—'),
      m.costCents !== null ? cell(money(m.costCents)) : cell(m.costNote ?? '—', WARN),
    ]),
  );
  addTable(w, { heading: headingRows(doc, 'Materials and cost', w.width), header, body });
  const totals = [
    `${plan.kits} kits (${plan.seats} seats + ${plan.spares} spare${plan.spares === 1 ? '' : 's'})`,
    `Total ${money(plan.totalCostCents)} · per kit ${money(plan.costPerKitCents)} · kit fee ${money(plan.kitFeeCents)}`,
    `Margin ${money(plan.marginCents)} (${money(plan.marginPerSeatCents)} a seat)${plan.complete ? '' : ' — some materials have no price yet, so the cost is incomplete'}`,
  ];
  w.keep([spacer(6), ...totals.flatMap((t) => textRows(doc, t, LINE, w.width))]);
}

/** The pre-cut checklist: a row a piece and a box a kit, ticked as each kit's bag is filled. */
function drawChecklist(w: FlowWriter, plan: KitPlanDto): void {
  const { doc } = w;
  const boxShare = Math.max((BOX + BOX_GAP) / w.width, 0.36);
  const row = tableRowMaker(doc, w.width, [...[0.27, 0.22, 0.1, 0.1, 0.31].map((s) => s * (1 - boxShare)), boxShare]);
  const perRow = Math.max(1, Math.floor((boxShare * w.width - 6) / (BOX + BOX_GAP)));
  const boxes: CellDrawing = {
    h: Math.ceil(plan.kits / perRow) * (BOX + BOX_GAP) - BOX_GAP,
    draw: (x, y) => {
      for (let n = 0; n < plan.kits; n++) {
        const bx = x + (n % perRow) * (BOX + BOX_GAP);
        const by = y + Math.floor(n / perRow) * (BOX + BOX_GAP);
        doc.save().lineWidth(0.7).strokeColor(palette.ink).rect(bx, by, BOX, BOX).stroke().restore();
      }
    },
  };
  const titles = ['Piece', 'Material', 'Each', 'All', 'Size (in / mm)', `One box a kit (${plan.kits})`];
  const header = row(
    titles.map((t) => cell(t, TABLE_HEAD)),
    true,
  );
  const body = plan.pieces.map((p) =>
    row([
      cell(p.name, TABLE_HEAD),
      cell(p.material),
      cell(String(p.perKit)),
      cell(String(p.total)),
      [
        { text: p.sizeInches, style: TABLE },
        { text: p.sizeMm, style: TABLE },
      ],
      boxes,
    ]),
  );
  addTable(w, { heading: headingRows(doc, 'Pre-cut checklist', w.width), header, body });
  const note = 'Cut every piece for all the kits, tick one box per kit as its pieces go into its bag, and keep the spares apart for mistakes on the day.';
  w.keep([spacer(6), ...textRows(doc, note, { ...TABLE, color: palette.pencil }, w.width)]);
}

/** The kits PDF of a class, Letter or A4, with the figures first and the checklist after. */
export async function kitsPdf(input: KitsPdfInput): Promise<Buffer> {
  const paper = paperSize(input.paper);
  const doc = new PDFDocument({
    size: paper.points,
    margin: 0,
    autoFirstPage: false,
    bufferPages: true,
    info: { Title: `Kits: ${input.title}`, Creator: 'Cardwright' },
  });
  const done = pdfBuffer(doc);
  registerFonts(doc);
  const w = new FlowWriter(doc, paper.points, MARGINS);
  const { plan } = input;

  w.add(textRows(doc, `Kits: ${input.title}`, STYLES.title, w.width));
  w.add([spacer(2), ...textRows(doc, `${input.studioName} · ${input.when} · ${input.place}`, { ...SMALL, size: 9, lineHeight: 12 }, w.width)]);
  if (plan.empty) {
    w.add([spacer(12), ...textRows(doc, plan.emptyMessage ?? 'No cut list yet.', STYLES.body, w.width, { color: palette.rosehip })]);
  } else {
    drawFigures(w, plan);
    drawChecklist(w, plan);
  }
  drawFooters(w, `Kits: ${input.title} · ${input.studioName}`);

  doc.flushPages();
  doc.end();
  return done;
}
