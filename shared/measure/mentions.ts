import type { Length, LengthUnit } from './length';
import { Grammar, isCountNoun, type MentionKind, type ParseOptions, type RawMention } from './grammar';
import { clean, tokenize, type Token } from './tokenize';
import { COUNT_GAP_WORDS, COUNT_PHRASES, RESTATE_WORDS, SMALL_NUMBERS, TENS } from './words';

export type { MentionKind, ParseOptions } from './grammar';

/** A measurement found in text. */
export interface Mention {
  kind: MentionKind;
  /** One value for a length or diameter, two (or three) for a size, one per line for a score list, the low and high end of a range. */
  values: Length[];
  /** Said with "about", "roughly", "just over" ... */
  approx: boolean;
  /** The speaker's words, as written in the source. */
  text: string;
  /** The speaker withdrew it straight after ("four inches, sorry, five"): the next mention replaces it. */
  corrected?: boolean;
  /** Repeated score lines ("every quarter inch", "at one inch intervals"): the step; `values` holds the first line. */
  every?: Length;
  /** How many were said before it ("three 4 by 6 mats", "two two-inch strips"): the quantity of a piece made from it. */
  count?: number;
}

/** A mention in plain text, with character offsets. */
export interface TextMention extends Mention {
  start: number;
  end: number;
}

/** A timed line of a transcript (the shape shared/transcript produces). */
export interface Cue {
  startMs: number;
  endMs: number;
  text: string;
}

/** A mention in a transcript, timed by its cues. */
export interface CueMention extends Mention {
  /** Index of the cue the mention starts in. */
  cueIndex: number;
  /** Start of that cue. */
  startMs: number;
  /** End of the cue the mention ends in: the start cue's own end unless it runs on into the next cue. */
  endMs: number;
}

/** After a correction and the few words that restate ("sorry, it should be"), where the value meant starts. */
function afterCorrection(tokens: readonly Token[], i: number): number {
  let k = i + 1;
  for (let n = 0; n < 4; n++) {
    const t = tokens[k];
    if (!t || t.kind !== 'word' || !RESTATE_WORDS.has(t.text)) break;
    k++;
  }
  return k;
}

/** The count said before a mention ("three 4 by 6 mats", "two strips 2 inches wide"), if any. */
function countBefore(g: Grammar, tokens: readonly Token[], first: number, floor: number): number | undefined {
  const cardinalEndingAt = (k: number): number | undefined => {
    if (k < floor) return undefined;
    const t = tokens[k];
    if (!t) return undefined;
    // part of a bigger number or a score list ("three and", "score at 2 4 inch ...")
    const before = tokens[k - 1];
    if (
      before &&
      before.kind === 'word' &&
      (before.text === 'point' || before.text === 'at' || before.text === 'and' || before.text === 'by' || before.text === 'x')
    )
      return undefined;
    if (before && (before.kind === 'x' || before.kind === 'num' || before.kind === 'frac')) return undefined;
    if (t.kind === 'num') return !t.decimal && t.value && t.value.d === 1n && t.value.n >= 1n && t.value.n <= 999n ? Number(t.value.n) : undefined;
    if (t.kind !== 'word') return undefined;
    const small = SMALL_NUMBERS.get(t.text);
    if (small !== undefined && small >= 1) {
      const tens = before && before.kind === 'word' ? TENS.get(before.text) : undefined;
      if (tens !== undefined) return k - 1 >= floor ? tens + small : undefined;
      return small;
    }
    const tens = TENS.get(t.text);
    if (tens !== undefined) return tens;
    for (const [phrase, n] of COUNT_PHRASES) {
      const start = k - phrase.length + 1;
      if (start >= floor && phrase.every((w, m) => tokens[start + m]?.kind === 'word' && tokens[start + m]!.text === w)) return n;
    }
    return undefined;
  };
  const direct = cardinalEndingAt(first - 1);
  if (direct !== undefined) return direct;
  // "four kraft strips at 2 by 11": a count, up to one describing word, a plural noun, a joining word
  let k = first - 1;
  if (tokens[k]?.kind === 'word' && COUNT_GAP_WORDS.has(tokens[k]!.text)) k--;
  const noun = tokens[k];
  if (!noun || noun.kind !== 'word' || !isCountNoun(noun.text)) return undefined;
  for (let back = 1; back <= 2; back++) {
    const n = cardinalEndingAt(k - back);
    if (n !== undefined) return n;
    const between = tokens[k - back];
    if (!between || between.kind !== 'word' || g.canStart(k - back)) return undefined;
  }
  return undefined;
}

/** The count said just after a mention: "4 by 6, two of them", "3 inch circles, 2 of those". */
function countAfter(tokens: readonly Token[], end: number): number | undefined {
  let k = end;
  if (tokens[k]?.kind === 'comma') k++;
  const t = tokens[k];
  const of = tokens[k + 1];
  const them = tokens[k + 2];
  if (!t || !of || !them || of.text !== 'of' || !['them', 'those', 'these'].includes(them.text)) return undefined;
  if (t.kind === 'num' && t.value && t.value.d === 1n && t.value.n >= 1n && t.value.n <= 999n) return Number(t.value.n);
  const n = t.kind === 'word' ? SMALL_NUMBERS.get(t.text) : undefined;
  return n !== undefined && n >= 1 ? n : undefined;
}

function scan(tokens: Token[], opts: ParseOptions): RawMention[] {
  const g = new Grammar(tokens, opts);
  const out: RawMention[] = [];
  const n = g.length;
  let weakAt = -1;
  let weakUnit: LengthUnit | undefined;
  let i = 0;
  while (i < n) {
    if (!g.canStart(i)) {
      i++;
      continue;
    }
    const weakOk = i === weakAt;
    const m = g.score(i) ?? g.range(i) ?? g.circle(i) ?? g.fromLength(i, weakOk, weakOk ? weakUnit : undefined);
    if (!m) {
      i++;
      continue;
    }
    const last = out[out.length - 1];
    if (last && m.first > last.end && g.isCorrection(last.end) && afterCorrection(tokens, last.end) === m.first) last.corrected = true;
    // "not 4 inches but 5", "5 inches, not 4 inches": the value said with "not" is the one ruled out
    const before = tokens[m.first - 1];
    if (before && before.kind === 'word' && before.text === 'not' && !m.approx) m.corrected = true;
    if (m.kind !== 'score') {
      const count = countBefore(g, tokens, m.first, last ? last.end : 0) ?? countAfter(tokens, m.end);
      if (count !== undefined) m.count = count;
    }
    out.push(m);
    i = Math.max(m.end, i + 1);
    if (g.isCorrection(i)) {
      // "four inches, no, five": the bare number after a correction is the length meant
      weakAt = afterCorrection(tokens, i);
      weakUnit = g.lastExplicitUnit(m, m.first);
    }
  }
  return out;
}

function toMention(m: RawMention, text: string): Mention {
  const base: Mention = { kind: m.kind, values: m.values, approx: m.approx, text };
  if (m.corrected) base.corrected = true;
  if (m.every) base.every = m.every;
  if (m.count !== undefined) base.count = m.count;
  return base;
}

/** Every measurement in a piece of text (spoken or written), in order. Never throws. */
export function extractMentions(text: string, opts: ParseOptions = {}): TextMention[] {
  const tokens = clean(tokenize(text));
  return scan(tokens, opts).map((m) => {
    const start = tokens[m.first]!.start;
    const end = tokens[m.end - 1]!.end;
    return { ...toMention(m, text.slice(start, end)), start, end };
  });
}

/**
 * Every measurement in a timed transcript. The cues are read as one stream,
 * so a measurement split over a cue boundary ("four and a quarter by" |
 * "five and a half") is found once, timed from the cue where it starts.
 */
export function extractMentionsFromCues(cues: readonly Cue[], opts: ParseOptions = {}): CueMention[] {
  const raw: Token[] = [];
  for (let c = 0; c < cues.length; c++) tokenize(cues[c]!.text, c, raw);
  const tokens = clean(raw);
  return scan(tokens, opts).map((m) => {
    const a = tokens[m.first]!;
    const b = tokens[m.end - 1]!;
    let text: string;
    if (a.src === b.src) text = cues[a.src]!.text.slice(a.start, b.end);
    else {
      const parts = [cues[a.src]!.text.slice(a.start).trim()];
      for (let c = a.src + 1; c < b.src; c++) parts.push(cues[c]!.text.trim());
      parts.push(cues[b.src]!.text.slice(0, b.end).trim());
      text = parts.filter((p) => p !== '').join(' ');
    }
    const startCue = cues[a.src]!;
    const endCue = cues[b.src]!;
    return { ...toMention(m, text), cueIndex: a.src, startMs: startCue.startMs, endMs: Math.max(startCue.endMs, endCue.endMs) };
  });
}
