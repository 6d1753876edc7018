import { extractMentions } from '../measure';
import { showMeasurements } from '../draft/show-measurements';

/**
 * Phrases makers use when they move on to a new step (common practice in spoken tutorials).
 * Longer phrases come first so "first of all" wins over "first".
 */
const CUE_PHRASES = [
  "let's get started",
  "let's start",
  "let's begin",
  "we're going to start",
  "we'll start",
  'to start',
  'start by',
  'begin by',
  'first of all',
  'first off',
  'first',
  'the next step',
  'the next thing',
  'next up',
  'next',
  'after that',
  'while that dries',
  'now we',
  "now i'm",
  "now i'll",
  "now let's",
  "now you'll",
  'now for',
  'now',
  'then we',
  'then',
  'moving on',
  'time to',
  'go ahead and',
  'last but not least',
  'the last step',
  'to finish off',
  'to finish',
  'finally',
  'lastly',
  'last',
  "let's",
];
const phrase = (p: string) => p.replace(/'/g, "['’]").replace(/ /g, '\\s+');
// "Once that's done", "when the glue is dry", "after those are cut": the step comes after the comma.
const ONCE =
  /^(?:(?:so|okay|ok|alright|and|um|uh|well|right)[,\s]+)*((?:once|when|after|now that)\s+(?:that|it|this|those|these|everything|(?:the|your)\s+\w+)(?:['’]s|\s+is|\s+are|\s+has|\s+have)?(?:\s+(?:been|all))?\s+(?:done|dry|dried|set|in place|finished|cut|scored|glued|folded|ready))\b[,\s]*/i;
const LEAD = new RegExp(`^(?:(?:so|okay|ok|alright|all right|and|um|uh|well|right)[,\\s]+)*(${CUE_PHRASES.map(phrase).join('|')})\\b(?!['’])[,\\s]*`, 'i');
// Words between the cue and the action: "next we're going to score ..." -> "score ...".
const FILLER =
  /^(?:(?:we|i|you)(?:['’]re| are|['’]ll| will|['’]m| am|['’]ve| have)? (?:going to|gonna|want to|need to|have to|can|just|got to)?\s*|let['’]s\s+|(?:go ahead and|take|grab)\s+(?=\w+\s)|up\s+|(?:is|that['’]s|that is|it['’]s|it is)\s+(?:done|dry)[,\s]*|thing\s+(?:is|we do is)\s+|step\s+(?:is\s+)?(?:to\s+)?|by\s+|,\s*)+/i;
// A title does not end on a word that needs another after it.
const DANGLING = /\s+(?:the|a|an|and|or|of|to|with|for|at|by|from|into|onto|your|our|my|this|that|some|then|so|but|about|which)$/i;

// Words that open a phrase a title can end before ("Cut the tag front | from the teal cardstock").
const PHRASE_START = /^(?:from|with|using|into|onto|on|in|for|to|around|along|through|over|under|so|while|because|until|and)$/i;

/** Titles stay short enough to read in a chapter list at a glance. */
export const MAX_TITLE_WORDS = 7;

export type ChapterSuggestion = { startMs: number; title: string; phrase: string; cueText: string };

const titleCase = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * A short title from spoken words: measurements in their display form (`10 9/16 x 2 1/2 in`), the
 * first clause, at most MAX_TITLE_WORDS words, cut at a word boundary that never falls inside a
 * measurement and never leaves a dangling "the" or "and". Empty when nothing is left.
 */
export function shortTitle(words: string): string {
  let t = words
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/(?<=\w)[.!?](\s.*)?$/, '');
  t = showMeasurements(t).trim();
  // The first clause, when it says enough on its own.
  const clause = /^(.*?\S\s+\S.*?)\s*[,;:\u2013\u2014]\s/.exec(`${t} `);
  if (clause) t = clause[1]!;
  const spans = extractMentions(t).map((m) => [m.start, m.end] as const);
  const tokens = [...t.matchAll(/\S+/g)];
  if (tokens.length > MAX_TITLE_WORDS) {
    let cut = tokens[MAX_TITLE_WORDS - 1]!.index! + tokens[MAX_TITLE_WORDS - 1]![0].length;
    // A cut inside a trailing phrase ("... from the teal | cardstock") ends the title before that phrase
    // instead; a cut where a new phrase starts ("in the middle | of the panel") is a boundary already.
    const next = tokens[MAX_TITLE_WORDS]![0];
    for (let k = MAX_TITLE_WORDS - 1; k >= 3 && !PHRASE_START.test(next) && !/^(?:of|then|the|a|an)$/i.test(next); k--) {
      if (!PHRASE_START.test(tokens[k]![0])) continue;
      if (!spans.some(([a, b]) => a < tokens[k]!.index! && tokens[k]!.index! < b)) cut = tokens[k - 1]!.index! + tokens[k - 1]![0].length;
      break;
    }
    const inside = spans.find(([a, b]) => a < cut && cut < b);
    if (inside) {
      // Keep the whole measurement when the title reaches into it, unless that makes it long.
      const words = t.slice(0, inside[1]).split(' ').length;
      cut = words <= MAX_TITLE_WORDS + 4 ? inside[1] : inside[0];
    }
    t = t.slice(0, cut);
  }
  let prev = '';
  while (prev !== t) {
    prev = t;
    t = t.replace(/[\s,;:\u2013\u2014-]+$/, '').replace(DANGLING, '');
  }
  return t ? titleCase(t) : '';
}

/** The words after a step phrase ("next we're going to score the base" -> "score the base"), or null when the line opens with none. */
function afterCue(text: string): { phrase: string; rest: string } | null {
  const m = ONCE.exec(text.trim()) ?? LEAD.exec(text.trim());
  if (!m) return null;
  return { phrase: m[1]!.toLowerCase().replace(/\s+/g, ' '), rest: text.trim().slice(m[0].length).replace(FILLER, '') };
}

/**
 * A chapter title from the line spoken at a moment (a chapter marked at the playhead): its words
 * after any step phrase and spoken filler, shortened as `shortTitle` does. Empty when the line says
 * nothing to name a chapter by (the caller then numbers it).
 */
export function titleFromLine(text: string): string {
  const cued = afterCue(text);
  const rest = (cued ? cued.rest : text.trim().replace(/^(?:(?:so|okay|ok|alright|all right|and|um|uh|well|right)[,\s]+)+/i, '')).replace(FILLER, '');
  const t = shortTitle(rest);
  // One or two words ("Okay", "Right there") name nothing.
  return t.split(' ').length >= 2 ? t : '';
}

/**
 * Suggests chapters where a cue opens with a step phrase ("first", "next", "then", "now we",
 * "let's", "once that's done" ...). The first suggestion is at 0:00 (an "Introduction" when the
 * talk opens otherwise), and suggestions closer than 10 s to the previous one are dropped, so each
 * chapter has some length.
 */
export function suggestChapters(cues: { startMs: number; text: string }[], opts: { minGapMs?: number } = {}): ChapterSuggestion[] {
  const minGap = opts.minGapMs ?? 10_000;
  const out: ChapterSuggestion[] = [];
  for (const cue of cues) {
    const cued = afterCue(cue.text);
    if (!cued) continue;
    const title = shortTitle(cued.rest);
    if (!title) continue;
    const prev = out[out.length - 1];
    if (prev && cue.startMs - prev.startMs < minGap) continue;
    out.push({ startMs: cue.startMs, title, phrase: cued.phrase, cueText: cue.text });
  }
  if (cues.length && (!out.length || out[0]!.startMs > 0)) {
    if (out.length && out[0]!.startMs < minGap) out[0] = { ...out[0]!, startMs: 0 };
    else out.unshift({ startMs: 0, title: 'Introduction', phrase: '', cueText: cues[0]!.text });
  }
  return out;
}
