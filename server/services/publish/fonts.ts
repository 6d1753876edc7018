/**
 * The fonts the PDFs embed: Merriweather (headings and body) and Inter (small labels), both from
 * the @fontsource packages so they ship with the app. pdfkit's fontkit reads their WOFF files;
 * it fails on the WOFF2 ones ("Offset is outside the bounds of the DataView"), so only WOFF is used.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';

const require = createRequire(import.meta.url);

/** Font names registered on every document by `registerFonts`. */
export type FontName = 'serif' | 'serif-bold' | 'serif-italic' | 'sans' | 'sans-bold';

const FILES: Record<FontName, string> = {
  serif: '@fontsource/merriweather/files/merriweather-latin-400-normal.woff',
  'serif-bold': '@fontsource/merriweather/files/merriweather-latin-700-normal.woff',
  'serif-italic': '@fontsource/merriweather/files/merriweather-latin-400-italic.woff',
  sans: '@fontsource/inter/files/inter-latin-400-normal.woff',
  'sans-bold': '@fontsource/inter/files/inter-latin-600-normal.woff',
};

const cache = new Map<FontName, Buffer>();

/** The font file's bytes, read once per process. */
export function fontData(name: FontName): Buffer {
  let data = cache.get(name);
  if (!data) {
    data = readFileSync(require.resolve(FILES[name]));
    cache.set(name, data);
  }
  return data;
}

/** Registers the five faces under their `FontName`s. */
export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const name of Object.keys(FILES) as FontName[]) doc.registerFont(name, fontData(name));
}

// Characters the fonts' Latin subsets lack, with what a reader would write instead.
const SUBSTITUTES: Record<string, string> = {
  '≈': '~',
  '⌀': 'dia. ',
  '→': '->',
  '↔': '<->',
  '←': '<-',
  '×': 'x',
  '½': '1/2',
  '¼': '1/4',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
  '⅓': '1/3',
  '⅔': '2/3',
};

interface GlyphFont {
  hasGlyphForCodePoint(cp: number): boolean;
}

/** The fontkit font behind pdfkit's current font (pdfkit keeps it on a private field). */
function currentGlyphFont(doc: PDFKit.PDFDocument): GlyphFont | null {
  const f = (doc as unknown as { _font?: { font?: Partial<GlyphFont> } })._font?.font;
  return f && typeof f.hasGlyphForCodePoint === 'function' ? (f as GlyphFont) : null;
}

const coverage = new Map<GlyphFont, Map<string, string>>();

/**
 * The text with every character the current font cannot draw replaced (a missing glyph prints
 * as an empty box): a known substitute, else the letter without its accent, else "?".
 */
export function printable(doc: PDFKit.PDFDocument, text: string): string {
  const font = currentGlyphFont(doc);
  if (!font) return text;
  let seen = coverage.get(font);
  if (!seen) coverage.set(font, (seen = new Map()));
  let out = '';
  for (const ch of text) {
    let r = seen.get(ch);
    if (r === undefined) {
      r = resolveChar(font, ch);
      seen.set(ch, r);
    }
    out += r;
  }
  return out;
}

function resolveChar(font: GlyphFont, ch: string): string {
  const cp = ch.codePointAt(0)!;
  if (cp < 0x20 || font.hasGlyphForCodePoint(cp)) return ch;
  const sub = SUBSTITUTES[ch];
  if (sub !== undefined && [...sub].every((c) => font.hasGlyphForCodePoint(c.codePointAt(0)!))) return sub;
  const base = ch.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
  if (base && base !== ch && [...base].every((c) => font.hasGlyphForCodePoint(c.codePointAt(0)!))) return base;
  return '?';
}

let measurer: PDFKit.PDFDocument | null = null;

/**
 * Text width in points with one of our fonts, for layouts drawn without a PDF (the SVG
 * template), so the SVG and the PDF wrap labels the same way.
 */
export function measureText(text: string, font: FontName, sizePt: number): number {
  if (!measurer) {
    measurer = new PDFDocument({ autoFirstPage: false });
    registerFonts(measurer);
  }
  measurer.font(font).fontSize(sizePt);
  return measurer.widthOfString(printable(measurer, text));
}
