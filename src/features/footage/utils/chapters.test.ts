import { describe, expect, it } from 'vitest';
import { parseTimestamp } from '@shared/transcript/timestamp';
import { chapterIndexAt, chapterListProblems, chapterListText, firstChapterFix, nextChapterName } from './chapters';

const ch = (id: string, title: string, at: string) => ({ id, title, startMs: parseTimestamp(at)! });

describe('chapterListText', () => {
  // Chapter lines in video descriptions: "m:ss Title", first at 0:00, hours only past the hour
  // (from memory, a common video-platform rule; REFERENCES.md "Timed text").
  it('writes m:ss lines in time order whatever order the chapters come in', () => {
    const text = chapterListText([ch('b', 'Score the walls', '2:05'), ch('a', 'Introduction', '0:00'), ch('c', 'Add the lid', '1:02:03')]);
    expect(text).toBe('0:00 Introduction\n2:05 Score the walls\n1:02:03 Add the lid');
  });
  it('keeps each chapter on one line, so a pasted title cannot start a bogus chapter', () => {
    expect(chapterListText([ch('a', '  Cut the\nbase   panel ', '0:00')])).toBe('0:00 Cut the base panel');
  });
});

describe('nextChapterName', () => {
  it('counts on from the chapters there are', () => {
    expect(nextChapterName([])).toBe('Chapter 1');
    expect(nextChapterName([{ title: 'Introduction' }, { title: 'Cut the base' }])).toBe('Chapter 3');
  });
  it('skips a name already taken (a renamed or deleted chapter can leave "Chapter 3" in use)', () => {
    expect(nextChapterName([{ title: 'Chapter 3' }, { title: 'chapter 4' }])).toBe('Chapter 5');
  });
});

describe('firstChapterFix', () => {
  it('asks for nothing when a chapter starts at 0:00, or within the second that reads 0:00', () => {
    expect(firstChapterFix([])).toBeNull();
    expect(firstChapterFix([ch('a', 'Intro', '0:00'), ch('b', 'Cut', '0:30')])).toBeNull();
    expect(firstChapterFix([{ id: 'a', title: 'Intro', startMs: 400 }])).toBeNull();
  });
  it('moves a first chapter that starts in the opening seconds back to 0:00', () => {
    expect(firstChapterFix([ch('b', 'Cut', '0:30'), ch('a', 'Gather supplies', '0:04')])).toEqual({ kind: 'move', chapter: 'a' });
  });
  // 10 s: the shortest chapter platforms keep (from memory, a common video-platform rule).
  it('adds an introduction when moving the first chapter would swallow 10 s or more', () => {
    expect(firstChapterFix([ch('a', 'Cut', '0:10')])).toEqual({ kind: 'add' });
  });
});

describe('chapterIndexAt', () => {
  const list = [ch('a', 'Intro', '0:00'), ch('b', 'Cut', '0:30'), ch('c', 'Fold', '1:00')];
  it('is the last chapter started at or before the playhead, inclusive of its first millisecond', () => {
    expect(chapterIndexAt(list, 29_999)).toBe(0);
    expect(chapterIndexAt(list, 30_000)).toBe(1);
    expect(chapterIndexAt(list, 3_600_000)).toBe(2);
    expect(chapterIndexAt([ch('b', 'Cut', '0:30')], 1000)).toBe(-1);
  });
});

describe('chapterListProblems', () => {
  it('says nothing for three chapters of 10 s or more', () => {
    expect(chapterListProblems([ch('a', 'Intro', '0:00'), ch('b', 'Cut', '0:10'), ch('c', 'Fold', '0:20')], 30_000)).toEqual([]);
  });
  it('names too few chapters, and each one shorter than 10 s (the last one runs to the end)', () => {
    const p = chapterListProblems([ch('a', 'Intro', '0:00'), ch('b', 'Cut', '0:25')], 30_000);
    expect(p).toEqual(['there are fewer than three chapters', '“Cut” is shorter than 10 seconds']);
  });
});
