import { describe, expect, it } from 'vitest';
import { chapterNotes } from './chapter-notes';

// The rule checked is from memory, a common video-platform rule (REFERENCES.md "Timed text"):
// first line at 0:00, at least three chapters, each at least 10 s long.
const s = (m: number, sec = 0) => (m * 60 + sec) * 1000;

describe('chapterNotes', () => {
  it('says nothing for a list that keeps the rule (from memory)', () => {
    const chapters = [
      { title: 'Supplies', startMs: 0 },
      { title: 'Cut the base', startMs: s(1, 5) },
      { title: 'Wrap the lid', startMs: s(4, 30) },
    ];
    expect(chapterNotes(chapters, s(8))).toEqual([]);
  });

  it('says nothing when there are no chapters (the panel says that itself)', () => {
    expect(chapterNotes([], s(5))).toEqual([]);
  });

  it('reads a start under one second as 0:00, as the description prints it', () => {
    const chapters = [
      { title: 'Supplies', startMs: 400 },
      { title: 'Score', startMs: s(1) },
      { title: 'Glue', startMs: s(2) },
    ];
    expect(chapterNotes(chapters, s(3))).toEqual([]);
  });

  it('notes a first chapter away from 0:00 and counts the added introduction (from memory)', () => {
    const chapters = [
      { title: 'Score the card', startMs: s(0, 42) },
      { title: 'Fold the gatefold', startMs: s(2) },
    ];
    const notes = chapterNotes(chapters, s(5));
    expect(notes).toHaveLength(1);
    expect(notes[0]).toContain('starts at 0:42, not 0:00');
    // Introduction + two chapters = three lines: the count rule holds.
  });

  it('notes fewer than three chapters (from memory)', () => {
    const notes = chapterNotes(
      [
        { title: 'Intro', startMs: 0 },
        { title: 'Fold', startMs: s(1) },
      ],
      s(3),
    );
    expect(notes).toEqual(['Video sites usually show chapters only when there are at least three; this list has two.']);
    expect(chapterNotes([{ title: 'All of it', startMs: 0 }], s(3))[0]).toContain('this list has one');
  });

  it('names chapters shorter than 10 seconds, the last one measured to the end of the video (from memory)', () => {
    const chapters = [
      { title: 'Hello', startMs: 0 },
      { title: 'Cut', startMs: s(0, 9) },
      { title: 'Glue', startMs: s(1) },
      { title: 'Done', startMs: s(1, 55) },
    ];
    expect(chapterNotes(chapters, s(2))).toEqual(['“Hello”, “Done” last under 10 seconds; video sites may not show the chapters.']);
  });

  it('counts the added introduction as a short chapter when the first starts within 10 s', () => {
    const notes = chapterNotes(
      [
        { title: 'Cut', startMs: s(0, 4) },
        { title: 'Score', startMs: s(1) },
        { title: 'Glue', startMs: s(2) },
      ],
      null,
    );
    expect(notes).toHaveLength(2);
    expect(notes[1]).toBe('“Introduction” lasts under 10 seconds; video sites may not show the chapters.');
  });

  it('does not judge the last chapter without the recording length', () => {
    expect(
      chapterNotes(
        [
          { title: 'a', startMs: 0 },
          { title: 'b', startMs: s(1) },
          { title: 'c', startMs: s(2) },
        ],
        null,
      ),
    ).toEqual([]);
  });
});
