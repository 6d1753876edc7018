/**
 * The words and numbers every publish output prints for a size, made by the measurement
 * engine so the handout, the template, the blog and the description agree to the character.
 */
import { SHEET_SIZES } from '@shared/geometry';
import { displayLength, formatAmount, nearestMark, roundForDisplay, toMm, type Length, type Piece, type RulerPrecision, type ScoreLine } from '@shared/measure';
import type { Paper } from './types';

/**
 * A length in inches as the crafter writes it ("10 9/16 in"); a metric length shows its nearest
 * ruler mark, with "≈" when it is not exactly on it ("≈ 3 15/16 in").
 */
export function inchText(l: Length, precision: RulerPrecision): string {
  return l.unit === 'in' ? displayLength(l, precision).primary : displayLength(l, precision).secondary;
}

function inchAmount(l: Length, precision: RulerPrecision): { text: string; approx: boolean } {
  if (l.unit === 'in') return { text: formatAmount(l.value, 'in'), approx: false };
  const m = nearestMark(l, precision);
  return { text: formatAmount(m.mark.value, 'in'), approx: !m.onRuler };
}

/** A piece's size in both systems, and which one the crafter gave it in. */
export interface PieceSizeText {
  /** "10 9/16 x 2 1/2 in", "6 in circle", "≈ 3 15/16 x 1 15/16 in" */
  inches: string;
  /** "268.3 x 63.5 mm", "152.4 mm circle" */
  mm: string;
  /** The crafter's own system comes first wherever both are shown. */
  primary: 'in' | 'mm';
}

/**
 * The size of a piece as printed in labels ("10 9/16 x 2 1/2 in"), or with `unitEach` as in the
 * handout's table, where every number carries its unit for reading aloud ("10 9/16 in x 2 1/2 in").
 */
export function pieceSizeText(p: Pick<Piece, 'shape' | 'width' | 'height'>, precision: RulerPrecision, options: { unitEach?: boolean } = {}): PieceSizeText {
  const primary = p.width.unit === 'in' ? 'in' : 'mm';
  if (p.shape === 'circle') {
    const d = inchAmount(p.width, precision);
    return { inches: `${d.approx ? '≈ ' : ''}${d.text} in circle`, mm: `${roundForDisplay(toMm(p.width), 1)} mm circle`, primary };
  }
  const w = inchAmount(p.width, precision);
  const h = inchAmount(p.height, precision);
  const wMm = roundForDisplay(toMm(p.width), 1);
  const hMm = roundForDisplay(toMm(p.height), 1);
  const approx = w.approx || h.approx ? '≈ ' : '';
  if (options.unitEach) return { inches: `${approx}${w.text} in x ${h.text} in`, mm: `${wMm} mm x ${hMm} mm`, primary };
  return { inches: `${approx}${w.text} x ${h.text} in`, mm: `${wMm} x ${hMm} mm`, primary };
}

/** "2 1/8 in from the left (tab)": where a score line runs, in the crafter's unit. */
export function scoreLineText(s: ScoreLine, precision: RulerPrecision, withMm = false): string {
  const d = displayLength(s.at, precision);
  const at = withMm ? `${d.primary} (${d.secondary})` : d.primary;
  return `${at} from the ${s.axis === 'width' ? 'left' : 'top'}${s.tab ? ' (tab)' : ''}`;
}

/** A page's size, exactly, and its size in PDF points (1 pt = 1/72 in, PDF reference). */
export interface PaperSize {
  id: Paper;
  width: Length;
  height: Length;
  /** PDF MediaBox in points: Letter 612 x 792, A4 595.28 x 841.89. */
  points: [number, number];
  /** The SVG root's width and height with their unit, and the viewBox in that unit. */
  svg: { width: string; height: string; unit: 'in' | 'mm'; viewBox: string };
}

/** Letter (ANSI/ASME Y14.1) or A4 (ISO 216), from the shared sheet table. */
export function paperSize(paper: Paper): PaperSize {
  const sheet = SHEET_SIZES.find((s) => s.id === paper);
  if (!sheet) throw new RangeError(`unknown paper: ${String(paper)}`);
  if (paper === 'letter') {
    return {
      id: paper,
      width: sheet.width,
      height: sheet.height,
      points: [612, 792],
      svg: { width: '8.5in', height: '11in', unit: 'in', viewBox: '0 0 8.5 11' },
    };
  }
  // 210 x 297 mm is 595.2756 x 841.8898 pt; the PDF reference rounds it to two decimals.
  return {
    id: paper,
    width: sheet.width,
    height: sheet.height,
    points: [595.28, 841.89],
    svg: { width: '210mm', height: '297mm', unit: 'mm', viewBox: '0 0 210 297' },
  };
}
