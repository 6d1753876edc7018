import { compareLengths, millimetres, parseStoredLength, type Length, type LengthUnit } from './length';
import { readLength, type ReadLength } from './parse-length';
import type { ParseOptions } from './grammar';

/**
 * The longest length Cardwright takes: 10 m. Card and paper craft works on sheets of 12 in and
 * rolls of a few metres (a cutting machine's roll feed runs to about 3.6 m, common practice);
 * 10 m leaves room for banners and garlands while catching a slip of the unit or a digit.
 */
export const MAX_LENGTH: Length = millimetres(10_000);
/** The shortest: 0.01 mm, below the thinnest paper (tissue is about 0.03 mm, from memory). */
export const MIN_LENGTH: Length = millimetres([1, 100]);

/** Words for the bounds, as the messages say them. */
export const MAX_LENGTH_TEXT = '10 m (10,000 mm, about 394 in)';
export const MIN_LENGTH_TEXT = '0.01 mm';

/** Why a length is out of bounds, in words; null when it is fine. Zero is refused unless `allowZero` (an overlap or a clearance may be none). */
export function lengthBoundsProblem(l: Length, opts: { allowZero?: boolean } = {}): string | null {
  if (l.value.s < 0n && l.value.n !== 0n) return 'A length cannot be negative';
  if (l.value.n === 0n) return opts.allowZero ? null : 'Enter a length above zero';
  if (compareLengths(l, MIN_LENGTH) < 0) return `Too small to cut: at least ${MIN_LENGTH_TEXT}`;
  if (compareLengths(l, MAX_LENGTH) > 0) return `Too long: at most ${MAX_LENGTH_TEXT}; check the unit and the digits`;
  return null;
}

const clip = (s: string) => (s.length > 40 ? `${s.slice(0, 39)}…` : s);

// A minus sign in front ("-3 in", "− 3", "minus 3"): the reader drops signs, so it is looked for here.
const NEGATIVE = /^\s*(?:[-\u2212\u2012\u2013\u2014\ufe63\uff0d]|minus\b|negative\b)/i;

/** The outcome of reading a typed length with its bounds: the length, or a sentence saying what is wrong. */
export type BoundedReading = ({ ok: true } & ReadLength) | { ok: false; message: string };

/**
 * Reads a typed or spoken length that makes up the whole text and checks it is one a crafter can
 * cut: not negative ("-3 in" is refused, not read as 3 in), above zero unless `allowZero`, at
 * least MIN_LENGTH and at most MAX_LENGTH. The form, the API schema and the server use it alike.
 */
export function readBoundedLength(text: string, opts: ParseOptions & { allowZero?: boolean } = {}): BoundedReading {
  if (text.trim() === '') return { ok: false, message: 'Enter a length' };
  if (NEGATIVE.test(text)) return { ok: false, message: 'A length cannot be negative; leave out the minus sign' };
  const r = readLength(text, opts);
  if (!r) return { ok: false, message: `Could not read “${clip(text.trim())}” as a length; try “4 1/4”, “ten and a half” or “108 mm”` };
  const problem = lengthBoundsProblem(r.length, opts);
  return problem ? { ok: false, message: problem } : { ok: true, ...r };
}

/**
 * The message for a typed length, or null when it reads and is in bounds. Without a default unit,
 * a bare number is refused only when it is out of bounds in inches and in millimetres alike (the
 * caller that knows the unit checks it exactly).
 */
export function lengthTextProblem(text: string, opts: { defaultUnit?: LengthUnit; allowZero?: boolean } = {}): string | null {
  if (opts.defaultUnit) {
    const r = readBoundedLength(text, opts);
    return r.ok ? null : r.message;
  }
  const asInches = readBoundedLength(text, { ...opts, defaultUnit: 'in' });
  if (asInches.ok) return null;
  const asMm = readBoundedLength(text, { ...opts, defaultUnit: 'mm' });
  return asMm.ok ? null : asInches.message;
}

/**
 * A stored length ("169/16 in") if it reads and lies within bounds, otherwise null: rows written
 * before the bounds, or by hand, must not break what is drawn and sent out from them.
 */
export function storedLengthOrNull(s: unknown, opts: { allowZero?: boolean } = {}): Length | null {
  if (typeof s !== 'string' || s.length > 200) return null;
  let l: Length;
  try {
    l = parseStoredLength(s);
  } catch {
    return null;
  }
  return lengthBoundsProblem(l, opts) ? null : l;
}
