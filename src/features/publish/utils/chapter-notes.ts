import { formatTimestamp } from '@shared/transcript/timestamp';
import type { ChapterInfo } from '../api/get-description-chapters';

// Video platforms read a chapter list from a description only when its first line is at 0:00,
// it has at least three lines and each chapter lasts at least 10 s (from memory, a common
// video-platform rule; REFERENCES.md "Timed text").
const MIN_CHAPTERS = 3;
const MIN_CHAPTER_MS = 10_000;

/**
 * What to tell the person about the chapter list in the video description. The description adds
 * "0:00 Introduction" when the first chapter starts later (server/services/publish/description.ts),
 * so the counts and lengths here are those of the lines it will really print.
 */
export function chapterNotes(chapters: ChapterInfo[], durationMs: number | null): string[] {
  const sorted = chapters.filter((c) => Number.isFinite(c.startMs) && c.startMs >= 0).sort((a, b) => a.startMs - b.startMs);
  if (sorted.length === 0) return [];
  const notes: string[] = [];
  const lines = [...sorted];
  // Times print to the whole second, so anything under a second already reads 0:00.
  if (sorted[0]!.startMs >= 1000) {
    notes.push(
      `The first chapter starts at ${formatTimestamp(sorted[0]!.startMs)}, not 0:00, so the description begins with “0:00 Introduction”. Add a chapter at 0:00 in Footage to name it yourself.`,
    );
    lines.unshift({ title: 'Introduction', startMs: 0 });
  }
  if (lines.length < MIN_CHAPTERS) {
    notes.push(`Video sites usually show chapters only when there are at least three; this list has ${lines.length === 1 ? 'one' : 'two'}.`);
  }
  const short = lines.filter((c, i) => {
    const end = i + 1 < lines.length ? lines[i + 1]!.startMs : durationMs;
    return end != null && end - c.startMs < MIN_CHAPTER_MS;
  });
  if (short.length) {
    notes.push(
      `${short.map((c) => `“${c.title}”`).join(', ')} ${short.length === 1 ? 'lasts' : 'last'} under 10 seconds; video sites may not show the chapters.`,
    );
  }
  return notes;
}
