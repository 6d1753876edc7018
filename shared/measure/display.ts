import { formatLength, formatMm, inchesNumber, mmNumber, roundForDisplay, serializeLength, toInches, toMm, type Length } from './length';
import { DEFAULT_PRECISION, nearestMark, type RulerPrecision } from './ruler';

/** How a length shows in the interface: the crafter's own form, and the other system in a lighter tone. */
export interface LengthDisplay {
  /** "10 9/16 in", "13 mm" */
  primary: string;
  /** "268.3 mm" beside inches; "≈ 1/2 in" (nearest ruler mark) beside metric */
  secondary: string;
}

/**
 * A length too small for its usual rounding (a card's caliper, 0.3 mm) in decimals with two
 * significant digits ("0.012 in", "0.025 mm"), so a non-zero length never reads as zero.
 */
function smallDecimal(value: Parameters<typeof roundForDisplay>[0], unit: string): string {
  for (let decimals = 2; decimals < 8; decimals++) {
    const text = roundForDisplay(value, decimals);
    if (/[1-9]\d/.test(text.replace('.', ''))) return `${text} ${unit}`;
  }
  return `${roundForDisplay(value, 8)} ${unit}`;
}

const isZero = (l: Length) => l.value.n === 0n;

/** The two texts to show for a length (see LengthDisplay). */
export function displayLength(l: Length, precision: RulerPrecision = DEFAULT_PRECISION): LengthDisplay {
  if (l.unit === 'in') {
    const mm = formatMm(l);
    return { primary: formatLength(l), secondary: mm === '0 mm' && !isZero(l) ? smallDecimal(toMm(l), 'mm') : mm };
  }
  const mark = nearestMark(l, precision);
  // Below half a ruler mark the nearest mark is 0, which says nothing about a real thickness.
  if (isZero(mark.mark) && !isZero(l)) return { primary: formatLength(l), secondary: `≈ ${smallDecimal(toInches(l), 'in')}` };
  return { primary: formatLength(l), secondary: `${mark.onRuler ? '' : '≈ '}${formatLength(mark.mark)}` };
}

/** A length for JSON (API responses, logs): Fraction's bigints do not serialize, so send these. */
export interface LengthSummary {
  /** Exact form for storage, read back with parseStoredLength: "169/16 in". */
  stored: string;
  /** As the crafter writes it: "10 9/16 in". */
  display: string;
  /** Floats for drawing only. */
  inches: number;
  mm: number;
}

/** The JSON-friendly summary of a length. */
export function lengthSummary(l: Length): LengthSummary {
  return { stored: serializeLength(l), display: formatLength(l), inches: inchesNumber(l), mm: mmNumber(l) };
}
