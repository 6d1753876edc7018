import type { MentionWords } from './piece-words';

type CueLike = { startMs: number; text: string };
type MentionLike = { cueIndex: number; text: string; startMs: number };
type ChapterLike = { title: string; startMs: number };

const SENTENCE_END = /[.!?](?=\s|$)/g;

/**
 * The words around each mention, for naming its piece and finding its material: the clause
 * before it (back to the start of its sentence or the end of the previous mention, whichever is
 * later), the words after it up to the end of the sentence or the next mention, and the title of
 * the chapter it falls in. Mentions must be in transcript order (as extractMentionsFromCues gives them).
 */
export function mentionWords(cues: readonly CueLike[], mentions: readonly MentionLike[], chapters: readonly ChapterLike[] = []): MentionWords[] {
  const sortedChapters = [...chapters].sort((a, b) => a.startMs - b.startMs);
  const topicAt = (ms: number) => {
    let t: string | undefined;
    for (const c of sortedChapters) if (c.startMs <= ms) t = c.title;
    return t;
  };
  // Where each mention sits in its cue, found left to right so a size said twice is told apart.
  const cursor = new Map<number, number>();
  const spans = mentions.map((m) => {
    const text = cues[m.cueIndex]?.text ?? '';
    const from = cursor.get(m.cueIndex) ?? 0;
    const at = text.indexOf(m.text, from);
    if (at < 0) return null;
    cursor.set(m.cueIndex, at + m.text.length);
    return { at, end: at + m.text.length };
  });
  return mentions.map((m, i) => {
    const span = spans[i];
    const text = cues[m.cueIndex]?.text ?? '';
    const topic = topicAt(m.startMs);
    if (!span) return { before: '', said: m.text, after: '', topic };
    const prev = i > 0 && mentions[i - 1]!.cueIndex === m.cueIndex ? spans[i - 1] : null;
    const next = i + 1 < mentions.length && mentions[i + 1]!.cueIndex === m.cueIndex ? spans[i + 1] : null;
    let start = prev ? prev.end : 0;
    for (const e of text.slice(0, span.at).matchAll(SENTENCE_END)) start = Math.max(start, e.index! + 1);
    const rest = text.slice(span.end);
    const stop = rest.search(/[.!?](?=\s|$)/);
    let end = stop < 0 ? text.length : span.end + stop;
    if (next && next.at < end) end = next.at;
    return { before: text.slice(start, span.at).trim(), said: m.text, after: text.slice(span.end, end).trim(), topic };
  });
}
