import { describe, expect, it } from 'vitest';
import { extractMentionsFromCues } from '../measure';
import { mentionWords } from './context';
import { materialFromWords, pieceNameFromWords } from './piece-words';

// Worked examples of our own, in the way makers talk on camera; the names are the nouns they said.
describe('naming a piece from the words around its measurement', () => {
  it.each([
    [{ before: 'Next cut the wall strips, two strips of kraft', said: 'ten and nine sixteenths by two and a half inches', after: '' }, 'Wall strip'],
    [{ before: 'And the lid rim is two strips', said: 'ten and three quarters by one inch', after: ', scored at a quarter inch' }, 'Lid rim strip'],
    [{ before: 'So first we are going to cut the base, um, a', said: 'circle six and three eighths across', after: 'from the kraft cardstock' }, 'Base circle'],
    [{ before: 'Cut the front panel', said: 'five by seven', after: '' }, 'Front panel'],
    [{ before: 'and a patterned', said: 'mat two by three', after: '', topic: 'Add the label and mat' }, 'Label mat'],
    [{ before: 'Cut a kraft panel', said: 'three by two inches', after: 'and', topic: 'Add the label and mat' }, 'Label panel'],
    [{ before: 'Cut a', said: 'circle six and seven sixteenths across', after: ', just a hair bigger', topic: 'Make the lid' }, 'Lid circle'],
    [{ before: 'You want', said: 'four and a quarter by five and a half', after: 'for the inside insert' }, 'Inside insert'],
    [{ before: 'Then a', said: 'mat of four by five', after: '' }, 'Mat'],
  ])('%o -> %s', (words, name) => {
    expect(pieceNameFromWords(words)).toBe(name);
  });

  it('says nothing when no piece was named, so the crafter names it', () => {
    expect(pieceNameFromWords({ before: 'Okay so it is', said: 'six by four', after: 'there' })).toBeNull();
  });
});

describe('the material of a piece from the words around it', () => {
  const known = ['kraft cardstock', 'patterned paper'];
  it('matches a said word to a known material ("kraft" is the kraft cardstock)', () => {
    expect(materialFromWords({ before: 'two strips of kraft', said: 'ten by two', after: '' }, known)).toBe('kraft cardstock');
    expect(materialFromWords({ before: 'and a patterned', said: 'mat two by three', after: '' }, known)).toBe('patterned paper');
    expect(materialFromWords({ before: 'a', said: 'circle six across', after: 'from the kraft cardstock' }, known)).toBe('kraft cardstock');
  });
  it('keeps a material said that the tutorial does not have yet', () => {
    expect(materialFromWords({ before: 'a strip of vellum', said: 'six by one', after: '' }, known)).toBe('vellum');
  });
  it('takes the only material when none was said, and none when there are several', () => {
    expect(materialFromWords({ before: 'cut a panel', said: 'six by four', after: '' }, ['white cardstock'])).toBe('white cardstock');
    expect(materialFromWords({ before: 'cut a panel', said: 'six by four', after: '' }, known)).toBeNull();
  });
});

describe('the words around each mention of a transcript', () => {
  it('splits a cue with two sizes at the first one, and takes the chapter as the topic', () => {
    const cues = [
      {
        startMs: 48_000,
        endMs: 52_000,
        text: 'Finally the label. Cut a kraft panel three by two inches and a patterned mat two and seven eighths by one and three quarters.',
      },
    ];
    const mentions = extractMentionsFromCues(cues);
    const around = mentionWords(cues, mentions, [{ title: 'Add the label and mat', startMs: 48_000 }]);
    expect(around.map((w) => w.before)).toEqual(['Cut a kraft panel', 'and a patterned mat']);
    expect(around.map((w) => pieceNameFromWords(w))).toEqual(['Label panel', 'Label mat']);
    expect(around.map((w) => materialFromWords(w, ['kraft cardstock', 'patterned paper']))).toEqual(['kraft cardstock', 'patterned paper']);
  });
});
