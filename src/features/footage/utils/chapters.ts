import { formatTimestamp } from '@shared/transcript/timestamp';
import { titleFromLine } from '@shared/footage/suggest-chapters';

type ChapterLike = { title: string; startMs: number };

/** "0:00 Title" lines in time order, the way video descriptions list chapters. */
export function chapterListText(chapters: ChapterLike[]): string {
  return [...chapters]
    .sort((a, b) => a.startMs - b.startMs)
    .map((c) => `${formatTimestamp(c.startMs)} ${c.title.replace(/\s+/g, ' ').trim()}`)
    .join('\n');
}

/** "Chapter N" for the next chapter: one more than there are, skipping names already used. */
export function nextChapterName(chapters: { title: string }[]): string {
  const used = new Set(chapters.map((c) => c.title.trim().toLowerCase()));
  let n = chapters.length + 1;
  while (used.has(`chapter ${n}`)) n += 1;
  return `Chapter ${n}`;
}

/**
 * The title of a chapter marked at `t`: taken from the line spoken there (the cue playing at `t`,
 * or one starting within the next two seconds, since a maker presses the key as they start
 * talking), or "Chapter N" when no line says anything to name it by or that title is taken.
 */
export function chapterTitleAt(chapters: { title: string }[], cues: { startMs: number; endMs: number; text: string }[], t: number): string {
  const cue = cues.find((c) => c.startMs <= t && t < c.endMs) ?? cues.find((c) => c.startMs > t && c.startMs - t <= 2000);
  const title = cue ? titleFromLine(cue.text) : '';
  const taken = new Set(chapters.map((c) => c.title.trim().toLowerCase()));
  return title && !taken.has(title.toLowerCase()) ? title : nextChapterName(chapters);
}

/** Chapters shorter than this are merged by video platforms (from memory, a common platform rule). */
export const MIN_CHAPTER_MS = 10_000;

export type FirstChapterFix = { kind: 'move'; chapter: string } | { kind: 'add' } | null;

/**
 * What to do when no chapter starts at 0:00: move the first one back when it starts within the
 * shortest chapter length (the opening seconds belong to it), otherwise add an introduction.
 */
export function firstChapterFix<C extends ChapterLike & { id: string }>(chapters: C[]): FirstChapterFix {
  if (chapters.length === 0) return null;
  const first = [...chapters].sort((a, b) => a.startMs - b.startMs)[0];
  // Chapter lists are written in whole seconds: anything under a second already reads 0:00.
  if (first.startMs < 1000) return null;
  return first.startMs < MIN_CHAPTER_MS ? { kind: 'move', chapter: first.id } : { kind: 'add' };
}

/** The chapter the playhead is in (the last one starting at or before `t`), or -1. */
export function chapterIndexAt(chapters: ChapterLike[], t: number): number {
  let found = -1;
  chapters.forEach((c, i) => {
    if (c.startMs <= t && (found < 0 || c.startMs >= chapters[found].startMs)) found = i;
  });
  return found;
}

/**
 * What keeps a chapter list from being read as chapters by video platforms, besides a first line
 * away from 0:00 (firstChapterFix covers that): at least three chapters, each at least 10 s long
 * (from memory, a common platform rule).
 */
export function chapterListProblems(chapters: ChapterLike[], durationMs: number): string[] {
  const sorted = [...chapters].sort((a, b) => a.startMs - b.startMs);
  const out: string[] = [];
  if (sorted.length < 3) out.push('there are fewer than three chapters');
  const short = sorted.filter((c, i) => {
    const end = i + 1 < sorted.length ? sorted[i + 1].startMs : durationMs;
    return end > 0 && end - c.startMs < MIN_CHAPTER_MS;
  });
  if (short.length) out.push(`${short.map((c) => `“${c.title}”`).join(', ')} ${short.length === 1 ? 'is' : 'are'} shorter than 10 seconds`);
  return out;
}
