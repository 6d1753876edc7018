import type { Length, LengthUnit } from './length';
import { Grammar, type MentionKind, type ParseOptions, type RawMention } from './grammar';
import { clean, tokenize, type Token } from './tokenize';

export type { MentionKind, ParseOptions } from './grammar';

/** A measurement found in text. */
export interface Mention {
  kind: MentionKind;
  /** One value for a length or diameter, two (or three) for a size, one per line for a score list. */
  values: Length[];
  /** Said with "about", "roughly", "just over" ... */
  approx: boolean;
  /** The speaker's words, as written in the source. */
  text: string;
  /** The speaker withdrew it straight after ("four inches, sorry, five"): the next mention replaces it. */
  corrected?: boolean;
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
    const m = g.score(i) ?? g.circle(i) ?? g.fromLength(i, weakOk, weakOk ? weakUnit : undefined);
    if (!m) {
      i++;
      continue;
    }
    const last = out[out.length - 1];
    if (last && m.first > last.end) {
      let allCorr = true;
      for (let k = last.end; k < m.first; k++) if (!g.isCorrection(k)) allCorr = false;
      if (allCorr) last.corrected = true;
    }
    out.push(m);
    i = Math.max(m.end, i + 1);
    if (g.isCorrection(i)) {
      // "four inches, no, five": the bare number after a correction is the length meant
      weakAt = i + 1;
      weakUnit = g.lastExplicitUnit(m, m.first);
    }
  }
  return out;
}

function toMention(m: RawMention, text: string): Mention {
  const base: Mention = { kind: m.kind, values: m.values, approx: m.approx, text };
  if (m.corrected) base.corrected = true;
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
