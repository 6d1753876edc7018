import { formatLength, formatMm, inchesNumber, mmNumber, serializeLength, type Length } from './length';
import { DEFAULT_PRECISION, nearestMark, type RulerPrecision } from './ruler';

/** How a length shows in the interface: the crafter's own form, and the other system in a lighter tone. */
export interface LengthDisplay {
  /** "10 9/16 in", "13 mm" */
  primary: string;
  /** "268.3 mm" beside inches; "≈ 1/2 in" (nearest ruler mark) beside metric */
  secondary: string;
}

/** The two texts to show for a length (see LengthDisplay). */
export function displayLength(l: Length, precision: RulerPrecision = DEFAULT_PRECISION): LengthDisplay {
  if (l.unit === 'in') return { primary: formatLength(l), secondary: formatMm(l) };
  const mark = nearestMark(l, precision);
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
