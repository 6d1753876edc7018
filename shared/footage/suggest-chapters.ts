/** Phrases makers use when they move on to a new step (common practice in spoken tutorials). */
const CUE_PHRASES = [
  "let's start", "let's begin", "let's get started", 'to start', 'first', 'first of all', 'next', 'now we', "now i'm", "now let's", 'now for',
  'then we', 'after that', 'once that', 'the next step', 'moving on', 'finally', 'last', 'lastly', 'the last step', "we're going to start",
];
const LEAD = new RegExp(`^(?:(?:so|okay|ok|alright|all right|and|um|uh|well)[,\\s]+)*(${CUE_PHRASES.map((p) => p.replace(/'/g, "['’]")).join('|')})\\b[,\\s]*`, 'i');
// Words between the cue and the action: "next we're going to score ..." -> "score ...".
const FILLER = /^(?:(?:we|i|you)(?:['’]re| are|['’]ll| will|['’]m| am)? (?:going to|gonna|want to|need to|have to|can|just)?\s*|let['’]s\s+|up\s+|thing\s+(?:is|we do is)\s+|step\s+(?:is\s+)?(?:to\s+)?|by\s+|,\s*)+/i;

export type ChapterSuggestion = { startMs: number; title: string; phrase: string; cueText: string };

const titleCase = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** A short title from the words after the cue phrase ("Score the base panel"). */
function titleFrom(rest: string): string {
  const words = rest.replace(FILLER, '').replace(/[.!?].*$/, '').split(/\s+/).filter(Boolean).slice(0, 8);
  const t = words.join(' ').replace(/[,;:]+$/, '');
  return t ? titleCase(t) : '';
}

/**
 * Suggests chapters where a cue opens with a step phrase ("first", "next", "now we", "let's
 * start" ...). The first suggestion is at 0:00 (an "Introduction" when the talk opens otherwise),
 * and suggestions closer than 10 s to the previous one are dropped, so each chapter has some length.
 */
export function suggestChapters(cues: { startMs: number; text: string }[], opts: { minGapMs?: number } = {}): ChapterSuggestion[] {
  const minGap = opts.minGapMs ?? 10_000;
  const out: ChapterSuggestion[] = [];
  for (const cue of cues) {
    const m = LEAD.exec(cue.text.trim());
    if (!m) continue;
    const title = titleFrom(cue.text.trim().slice(m[0].length));
    if (!title) continue;
    const prev = out[out.length - 1];
    if (prev && cue.startMs - prev.startMs < minGap) continue;
    out.push({ startMs: cue.startMs, title, phrase: m[1].toLowerCase(), cueText: cue.text });
  }
  if (cues.length && (!out.length || out[0].startMs > 0)) {
    if (out.length && out[0].startMs < minGap) out[0] = { ...out[0], startMs: 0 };
    else out.unshift({ startMs: 0, title: 'Introduction', phrase: '', cueText: cues[0].text });
  }
  return out;
}
