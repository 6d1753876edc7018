import Fraction from 'fraction.js';
import { APPROX_PHRASES, CORRECTION_PHRASES, DENOMINATORS, FILLER_PAIRS, FILLERS, ISH_SUFFIX, SMALL_NUMBERS, TENS, UNIT_WORDS } from './words';

/**
 * num: digits ("10", "1.75"); frac: "9/16" or a unicode fraction; word: letters;
 * inch: a double-quote or double-prime touching a number; feet: a prime touching a number;
 * x: the multiplication sign; comma; stop: sentence punctuation; time: "3:15";
 * money: "$4.99"; pct: "40%"; corr: a self-correction ("sorry", "I mean");
 * other: a symbol that breaks a phrase.
 */
export type TokenKind = 'num' | 'frac' | 'word' | 'inch' | 'feet' | 'x' | 'comma' | 'stop' | 'time' | 'money' | 'pct' | 'corr' | 'other';

/** One token, with where it came from so a mention can quote the speaker's words. */
export interface Token {
  kind: TokenKind;
  /** Lower-cased text. */
  text: string;
  /** Exact value for num and frac tokens. */
  value: Fraction | null;
  /** A num written with a decimal point. */
  decimal: boolean;
  /** A frac written as a single unicode character. */
  unicode: boolean;
  /** Offsets into the source text. */
  start: number;
  end: number;
  /** Which source (cue) the token came from. */
  src: number;
  /** Touches the previous token of the same source (no space between). */
  adj: boolean;
  /** Joined to the previous token by a hyphen with no spaces ("two-inch", "4-inch"). */
  hyph?: boolean;
}

const UNICODE_FRACTIONS: ReadonlyMap<string, [number, number]> = new Map([
  ['½', [1, 2]],
  ['⅓', [1, 3]],
  ['⅔', [2, 3]],
  ['¼', [1, 4]],
  ['¾', [3, 4]],
  ['⅕', [1, 5]],
  ['⅖', [2, 5]],
  ['⅗', [3, 5]],
  ['⅘', [4, 5]],
  ['⅙', [1, 6]],
  ['⅚', [5, 6]],
  ['⅐', [1, 7]],
  ['⅛', [1, 8]],
  ['⅜', [3, 8]],
  ['⅝', [5, 8]],
  ['⅞', [7, 8]],
  ['⅑', [1, 9]],
  ['⅒', [1, 10]],
]);

const INCH_MARKS = new Set(['"', '″', '”', '“', '＂']);
const FOOT_MARKS = new Set(["'", '′', '’']);
const MONEY = new Set(['$', '£', '€', '¥', '¢']);
const STOPS = new Set(['.', '!', '?', ';', '…', '。']);
const DASHES = new Set(['-', '–', '—', '‐', '−']);
const SEPARATORS = new Set(['(', ')', '[', ']', '{', '}', ':', '_', '<', '>', '|', '\\']);

function isDigit(c: number): boolean {
  return c >= 48 && c <= 57;
}

function isAsciiLetter(c: number): boolean {
  return (c >= 97 && c <= 122) || (c >= 65 && c <= 90);
}

const LETTER = /\p{L}/u;
function isLetter(ch: string, c: number): boolean {
  if (c < 128) return isAsciiLetter(c);
  return LETTER.test(ch);
}

function isSpace(c: number): boolean {
  return c === 32 || (c >= 9 && c <= 13) || c === 160 || c === 0x2009 || c === 0x202f || c === 0x200b || c === 0xfeff;
}

function decimalFraction(intPart: string, fracPart: string): Fraction {
  const scale = 10n ** BigInt(fracPart.length);
  return new Fraction(BigInt(intPart || '0') * scale + BigInt(fracPart || '0'), scale);
}

/** Splits one text into tokens (appended to `out`), remembering offsets and the source index. */
export function tokenize(text: string, src = 0, out: Token[] = []): Token[] {
  const n = text.length;
  let i = 0;
  let lastEnd = -1;
  let hyphenAt = -1;
  const push = (kind: TokenKind, start: number, end: number, value: Fraction | null = null, extra: Partial<Token> = {}) => {
    const hyph = start === hyphenAt;
    out.push({
      kind,
      text: kind === 'word' ? text.slice(start, end).toLowerCase().replace(/’/g, "'") : text.slice(start, end),
      value,
      decimal: false,
      unicode: false,
      start,
      end,
      src,
      adj: start === lastEnd,
      ...(hyph ? { hyph } : {}),
      ...extra,
    });
    lastEnd = end;
  };
  const prev = () => {
    const p = out[out.length - 1];
    return p && p.src === src ? p : undefined;
  };

  while (i < n) {
    const ch = text[i]!;
    const c = text.charCodeAt(i);
    if (isSpace(c)) {
      i++;
      continue;
    }
    if (isDigit(c) || (ch === '.' && i + 1 < n && isDigit(text.charCodeAt(i + 1)) && !(i > 0 && isDigit(text.charCodeAt(i - 1))))) {
      const start = i;
      while (i < n && isDigit(text.charCodeAt(i))) i++;
      const intPart = text.slice(start, i);
      // time of day or a timestamp: never a length
      if (text[i] === ':' && isDigit(text.charCodeAt(i + 1)) && isDigit(text.charCodeAt(i + 2))) {
        i += 3;
        while (text[i] === ':' && isDigit(text.charCodeAt(i + 1)) && isDigit(text.charCodeAt(i + 2))) i += 3;
        if ((text[i] === '.' || text[i] === ',') && isDigit(text.charCodeAt(i + 1))) {
          i++;
          while (i < n && isDigit(text.charCodeAt(i))) i++;
        }
        push('time', start, i);
        continue;
      }
      if (text[i] === '.' && i + 1 < n && isDigit(text.charCodeAt(i + 1))) {
        i++;
        const fs = i;
        while (i < n && isDigit(text.charCodeAt(i))) i++;
        const value = decimalFraction(intPart, text.slice(fs, i));
        if (text[i] === '%') {
          push('pct', start, ++i);
          continue;
        }
        push('num', start, i, value, { decimal: true });
        continue;
      }
      if ((text[i] === '/' || text[i] === '⁄') && i + 1 < n && isDigit(text.charCodeAt(i + 1)) && intPart !== '') {
        i++;
        const ds = i;
        while (i < n && isDigit(text.charCodeAt(i))) i++;
        const den = BigInt(text.slice(ds, i));
        if (den === 0n) {
          push('other', start, i);
          continue;
        }
        push('frac', start, i, new Fraction(BigInt(intPart), den));
        continue;
      }
      if (text[i] === '%') {
        push('pct', start, ++i);
        continue;
      }
      push('num', start, i, new Fraction(BigInt(intPart)));
      continue;
    }
    if (isLetter(ch, c)) {
      const start = i;
      i++;
      while (i < n) {
        const cc = text.charCodeAt(i);
        if (isLetter(text[i]!, cc)) i++;
        else if ((text[i] === "'" || text[i] === '’') && i + 1 < n && isLetter(text[i + 1]!, text.charCodeAt(i + 1))) i += 2;
        else break;
      }
      const word = text.slice(start, i);
      const p = prev();
      const afterNumber = p !== undefined && p.end === start && (p.kind === 'num' || p.kind === 'frac');
      // "a4", "mp4", "h264" are names; but "4x6" is a size
      if (i < n && isDigit(text.charCodeAt(i)) && !((word === 'x' || word === 'X') && afterNumber)) {
        while (i < n && (isDigit(text.charCodeAt(i)) || isAsciiLetter(text.charCodeAt(i)))) i++;
      }
      push('word', start, i);
      continue;
    }
    const uf = UNICODE_FRACTIONS.get(ch);
    if (uf) {
      push('frac', i, i + 1, new Fraction(uf[0], uf[1]), { unicode: true });
      i++;
      continue;
    }
    const p = prev();
    const touchesNumber = p !== undefined && p.end === i && (p.kind === 'num' || p.kind === 'frac');
    if (INCH_MARKS.has(ch)) {
      push(touchesNumber ? 'inch' : 'other', i, i + 1);
      i++;
      continue;
    }
    if (FOOT_MARKS.has(ch)) {
      if (touchesNumber) push('feet', i, i + 1);
      i++;
      continue;
    }
    if (MONEY.has(ch)) {
      const start = i;
      i++;
      while (i < n && text[i] === ' ') i++;
      while (i < n && (isDigit(text.charCodeAt(i)) || ((text[i] === '.' || text[i] === ',') && isDigit(text.charCodeAt(i + 1))))) i++;
      push('money', start, i);
      continue;
    }
    if (ch === '×' || ch === '✕' || ch === '⨯') {
      push('x', i, i + 1);
      i++;
      continue;
    }
    if (ch === ',' || ch === '，') {
      push('comma', i, i + 1);
      i++;
      continue;
    }
    if (STOPS.has(ch)) {
      push('stop', i, i + 1);
      i++;
      continue;
    }
    if (ch === '&') {
      push('word', i, i + 1, null, { text: 'and' });
      i++;
      continue;
    }
    if (ch === '~') {
      push('word', i, i + 1, null, { text: '~' });
      i++;
      continue;
    }
    if (ch === '+' && (text.startsWith('+/-', i) || text.startsWith('+-', i))) {
      // "+/- 1/16": plus or minus
      const w = text[i + 1] === '/' ? 3 : 2;
      push('word', i, i + w, null, { text: '±' });
      i += w;
      continue;
    }
    if (ch === '±') {
      push('word', i, i + 1, null, { text: '±' });
      i++;
      continue;
    }
    if (DASHES.has(ch)) {
      // A dash between two numbers is a range ("4-5 inches", "5 – 6 mm"), except "1-1/2" (a mixed
      // number as hardware is labelled); a hyphen inside a word joins it ("two-inch").
      const p = prev();
      const before = p !== undefined && (p.kind === 'num' || p.kind === 'frac') && (p.end === i || ch !== '-');
      let k = i + 1;
      if (ch !== '-') while (k < n && text[k] === ' ') k++;
      if (before && k < n && isDigit(text.charCodeAt(k)) && (p.end === i || k > i + 1 || ch !== '-') && !/^\d+\s*\/\s*\d/.test(text.slice(k, k + 12))) {
        push('word', i, i + 1, null, { text: 'to' });
        i++;
        continue;
      }
      if (p !== undefined && p.end === i && k === i + 1 && i + 1 < n && !isSpace(text.charCodeAt(i + 1))) hyphenAt = i + 1;
      i++;
      continue;
    }
    if (SEPARATORS.has(ch)) {
      i++;
      continue;
    }
    // a surrogate pair (emoji) is one symbol
    const w = c >= 0xd800 && c <= 0xdbff && i + 1 < n ? 2 : 1;
    push('other', i, i + w);
    i += w;
  }
  return out;
}

function isWord(t: Token | undefined, w?: string): boolean {
  return t !== undefined && t.kind === 'word' && (w === undefined || t.text === w);
}

const byFirstWord = (phrases: readonly (readonly string[])[]) => {
  const map = new Map<string, (readonly string[])[]>();
  for (const p of [...phrases].sort((a, b) => b.length - a.length)) {
    const list = map.get(p[0]!) ?? [];
    list.push(p);
    map.set(p[0]!, list);
  }
  return map;
};
const CORRECTIONS_BY_FIRST = byFirstWord(CORRECTION_PHRASES);
const HEDGES_BY_FIRST = byFirstWord(APPROX_PHRASES);

/** Length of the longest phrase of `map` that starts at tokens[i] (0 when none). */
export function phraseAt(tokens: readonly Token[], i: number, map: ReadonlyMap<string, readonly (readonly string[])[]>): number {
  const t = tokens[i];
  if (!t || t.kind !== 'word') return 0;
  const candidates = map.get(t.text);
  if (!candidates) return 0;
  for (const p of candidates) {
    let ok = true;
    for (let k = 1; k < p.length; k++) {
      const tk = tokens[i + k];
      if (!tk || tk.kind !== 'word' || tk.text !== p[k]) {
        ok = false;
        break;
      }
    }
    if (ok) return p.length;
  }
  return 0;
}

// Stems that take a glued "-ish" ("sixish", "quarterish", "inchish").
const ISH_STEMS: ReadonlySet<string> = new Set([...SMALL_NUMBERS.keys(), ...TENS.keys(), ...DENOMINATORS.keys(), ...UNIT_WORDS.keys()]);

const isPause = (t: Token | undefined) => t !== undefined && (t.kind === 'comma' || t.kind === 'stop');

/**
 * Drops spoken fillers, folds self-corrections (and the commas, full stops and dashes around
 * them) into one `corr` token and collapses stutters ("inch inch", "the the"), so none of them
 * can hide a measurement or split one in two. Offsets still point at the original text.
 */
export function clean(tokens: readonly Token[]): Token[] {
  const out: Token[] = [];
  const n = tokens.length;
  for (let i = 0; i < n; i++) {
    const t = tokens[i]!;
    if (t.kind === 'word') {
      const next = tokens[i + 1];
      if (isWord(next) && FILLER_PAIRS.some(([a, b]) => a === t.text && b === next!.text)) {
        i++;
        continue;
      }
      // "no more than", "something like": a hedge, kept whole (not a correction, not a filler)
      const hedge = phraseAt(tokens, i, HEDGES_BY_FIRST);
      if (hedge > 1) {
        for (let k = 0; k < hedge; k++) out.push(tokens[i + k]!);
        i += hedge - 1;
        continue;
      }
      const corr = hedge > 0 ? 0 : phraseAt(tokens, i, CORRECTIONS_BY_FIRST);
      if (corr > 0) {
        while (isPause(out[out.length - 1])) out.pop();
        pushCorrection(out, t, tokens[i + corr - 1]!);
        i += corr - 1;
        while (isPause(tokens[i + 1])) i++;
        continue;
      }
      if (FILLERS.has(t.text)) continue;
      if (t.text.length > ISH_SUFFIX.length + 2 && t.text.endsWith(ISH_SUFFIX) && ISH_STEMS.has(t.text.slice(0, -ISH_SUFFIX.length))) {
        const cut = t.end - ISH_SUFFIX.length;
        out.push({ ...t, text: t.text.slice(0, -ISH_SUFFIX.length), end: cut });
        out.push({ ...t, text: ISH_SUFFIX, start: cut, adj: true });
        continue;
      }
    }
    const last = out[out.length - 1];
    if (last && last.kind === 'corr' && isPause(t)) continue;
    // "two two-inch strips": a count before a hyphenated size is not a stutter
    const countBeforeHyphen = tokens[i + 1]?.hyph === true && (t.kind === 'num' || t.kind === 'word');
    if (last && last.kind === t.kind && last.text === t.text && t.kind !== 'comma' && t.kind !== 'stop' && t.kind !== 'other' && !countBeforeHyphen) {
      // stutter: keep the first, but let a later unit mark etc. attach to the second's position
      continue;
    }
    out.push(t);
  }
  return out;
}

function pushCorrection(out: Token[], from: Token, to: Token): void {
  const last = out[out.length - 1];
  if (last && last.kind === 'corr') {
    last.end = to.src === last.src ? to.end : last.end;
    return;
  }
  out.push({ ...from, kind: 'corr', text: 'corr', value: null, end: to.src === from.src ? to.end : from.end });
}
