/**
 * The printable class handout (P2) as a PDF: title and cover photo, a QR code to the video (or
 * the public page), supplies, the cut list with fractions and millimetres, the numbered steps
 * with small photos, tips, cautions and the usual safety notes, page numbers in the footer.
 *
 * The layout is the flow writer's (pdf-flow.ts): every block's height is known before it is
 * drawn, so a step moves to the next page whole when it does not fit and its photos start on the
 * same page as its text. Each section is a function of its own (handout-sections.ts).
 */
import PDFDocument from 'pdfkit';
import { registerFonts } from './fonts';
import { drawCover, drawCutList, drawHeader, drawIntro, drawSteps, drawSupplies, drawTipsAndSafety } from './handout-sections';
import { drawFooters, FlowWriter } from './pdf-flow';
import { paperSize } from './sizes';
import { pdfBuffer } from './pdf-buffer';
import type { Paper, PublishBundle } from './types';

export interface HandoutOptions {
  paper: Paper;
  /** A class handout: the class's own cautions instead of the ones found in the tutorial. */
  safetyNotes?: readonly string[];
  /** A class handout: when and where, under the byline. */
  classNote?: string;
}

/** 3/4 in at the sides and top; the bottom leaves room for the footer. */
const MARGINS = { side: 54, top: 54, bottom: 62 };

/**
 * The handout PDF, Letter or A4, with Merriweather for headings and text and Inter for small
 * labels embedded. Photos are resized for print first (about 200 dpi at their printed size).
 */
export async function handoutPdf(bundle: PublishBundle, options: HandoutOptions): Promise<Buffer> {
  const paper = paperSize(options.paper);
  const { tutorial } = bundle;
  const doc = new PDFDocument({
    size: paper.points,
    margin: 0,
    autoFirstPage: false,
    bufferPages: true,
    info: { Title: tutorial.title, Author: tutorial.authorName, Creator: 'Cardwright' },
  });
  const done = pdfBuffer(doc);
  registerFonts(doc);
  const section = { w: new FlowWriter(doc, paper.points, MARGINS), bundle, safetyNotes: options.safetyNotes, classNote: options.classNote };

  await drawHeader(section);
  drawIntro(section);
  await drawCover(section);
  drawSupplies(section);
  drawCutList(section);
  await drawSteps(section);
  drawTipsAndSafety(section);
  drawFooters(section.w, [tutorial.title, tutorial.studioName].filter(Boolean).join(' · '));

  doc.flushPages();
  doc.end();
  return done;
}
