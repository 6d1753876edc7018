import type { Length } from './length';
import { Grammar, type ParseOptions } from './grammar';
import { clean, tokenize } from './tokenize';

/** A length read from a whole input, with whether it was said as approximate. */
export interface ReadLength {
  length: Length;
  approx: boolean;
  /** A unit was written; otherwise the default unit was used. */
  explicitUnit: boolean;
}

/**
 * Reads one length that makes up the whole input ("6 3/8", "ten and nine
 * sixteenths", "13 mm", "⅝ in", "half an inch"). A bare number is accepted
 * here, since the caller asked for a length. Null when the input is not
 * exactly one length. Never throws.
 */
export function readLength(text: string, opts: ParseOptions = {}): ReadLength | null {
  const tokens = clean(tokenize(text));
  let n = tokens.length;
  while (n > 0 && tokens[n - 1]!.kind === 'stop') n--;
  if (n === 0) return null;
  const g = new Grammar(tokens.slice(0, n), opts);
  const l = g.lengthAt(0);
  if (!l || l.end !== n) return null;
  return { length: l.length, approx: l.approx, explicitUnit: l.explicitUnit };
}

/** The length that makes up the whole input, or null (see `readLength`). */
export function parseLength(text: string, opts: ParseOptions = {}): Length | null {
  return readLength(text, opts)?.length ?? null;
}
