export type CueMatch = { cue: number; start: number; end: number };
export type TextPart = { text: string; match: number | null };

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * Every occurrence of `query` in the cues' text, case-insensitive, in reading order. Offsets are
 * into the original text (a regular expression with the `i` flag, not lower-casing, because
 * lower-casing can change a string's length and shift offsets).
 */
export function findMatches(texts: string[], query: string): CueMatch[] {
  const q = query.trim();
  if (!q) return [];
  const re = new RegExp(escape(q), 'giu');
  const out: CueMatch[] = [];
  texts.forEach((text, cue) => {
    for (const m of text.matchAll(re)) out.push({ cue, start: m.index, end: m.index + m[0].length });
  });
  return out;
}

/**
 * Splits a cue's text around its matches; each matched part carries the match's overall number
 * so the current one can be told apart. `matches` must be this cue's, in order, with `first` the
 * overall number of the first of them.
 */
export function splitByMatches(text: string, matches: { start: number; end: number }[], first: number): TextPart[] {
  const parts: TextPart[] = [];
  let at = 0;
  matches.forEach((m, i) => {
    if (m.start > at) parts.push({ text: text.slice(at, m.start), match: null });
    parts.push({ text: text.slice(m.start, m.end), match: first + i });
    at = m.end;
  });
  if (at < text.length) parts.push({ text: text.slice(at), match: null });
  return parts;
}

/** The next match to step to, wrapping round at both ends (Enter forward, Shift+Enter back). */
export function stepMatch(current: number, count: number, direction: 1 | -1): number {
  if (count === 0) return -1;
  if (current < 0) return direction === 1 ? 0 : count - 1;
  return (current + direction + count) % count;
}
