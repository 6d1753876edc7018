import { evaluate } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { cleanSpokenText, spokenSentences, tidySpokenWords } from './clean-spoken-text';
import { showMeasurements } from './show-measurements';

// Transcripts below are our own inventions (a hexagon treat box, a gatefold card, a round gift box).
// The kinds of disfluency handled, filled pauses, repetitions and false starts, follow the usual
// classification of speech disfluencies (E. Shriberg, "Preliminaries to a Theory of Speech
// Disfluencies", PhD thesis, UC Berkeley, 1994; from memory).

describe('fillers', () => {
  it.each([
    // A spoken "so" opening a sentence goes too.
    ['um so today we are making a treat box', 'Today we are making a treat box.'],
    ['uh cut the uhm strip', 'Cut the strip.'],
    ['the lid is, er, a bit bigger', 'The lid is a bit bigger.'],
    ['you know the kind you fill with sweets', 'The kind you fill with sweets.'],
    ['fold it like I said along the score', 'Fold it along the score.'],
    ['okay so now we glue the tab', 'Now we glue the tab.'],
    ['hmm, the strip is ten millimetres wide', 'The strip is 10 mm wide.'],
    ['leave a bit extra, like, for the overlap', 'Leave a bit extra for the overlap.'],
  ])('%j', (spoken, written) => expect(cleanSpokenText(spoken)).toBe(written));

  it('keeps "you know" when it means something, and never eats "mm" (millimetres)', () => {
    expect(cleanSpokenText('do you know how to score a card')).toBe('Do you know how to score a card.');
    expect(cleanSpokenText('you know how a gatefold opens')).toBe('You know how a gatefold opens.');
    expect(cleanSpokenText('the tab is 12 mm')).toBe('The tab is 12 mm.');
    expect(cleanSpokenText('fold it like this')).toBe('Fold it like this.');
  });
});

describe('stutters and repeats', () => {
  it.each([
    ['th- the base goes first', 'The base goes first.'],
    ['we will cu- trim the edge', 'We will trim the edge.'],
    ['I I like a bone folder', 'I like a bone folder.'],
    ['glue the the tab', 'Glue the tab.'],
    ['a strip one inch inch wide', 'A strip 1 in wide.'],
    ['and then and then press it flat', 'Then press it flat.'],
    ['the, the lid', 'The lid.'],
  ])('%j', (spoken, written) => expect(cleanSpokenText(spoken)).toBe(written));

  it('keeps repeats that are grammar, and repeated numbers', () => {
    expect(tidySpokenWords('I had had enough')).toBe('I had had enough');
    expect(tidySpokenWords('I know that that works')).toBe('I know that that works');
    expect(tidySpokenWords('cut two two inch squares')).toBe('cut two two inch squares');
  });

  it('does not join words across a sentence end', () => {
    expect(cleanSpokenText('fold it. It should stand up')).toBe('Fold it. It should stand up.');
  });
});

describe('sentences', () => {
  it('gives each sentence a capital and a full stop (common practice of written English)', () => {
    expect(spokenSentences('first score the card\nthen fold it in half\nis it straight?')).toEqual([
      'First score the card.',
      'Then fold it in half.',
      'Is it straight?',
    ]);
  });

  it('splits a long unpunctuated run before a new-topic word', () => {
    const run =
      'what I do is I take my strip and I wrap it around the circle and then I glue it down and so now we can move on to the lid which is a bit bigger';
    expect(spokenSentences(run)).toEqual([
      'What I do is I take my strip and I wrap it around the circle and then I glue it down.',
      'Now we can move on to the lid which is a bit bigger.',
    ]);
  });

  it('capitalises "I" and drops sentences with nothing left in them', () => {
    expect(cleanSpokenText("okay. i'm going to add a bow. um. yeah")).toBe("I'm going to add a bow.");
  });

  it('drops caption annotations', () => {
    expect(cleanSpokenText('[music] welcome back [laughs] to the studio')).toBe('Welcome back to the studio.');
  });

  it('keeps decimal points inside a sentence', () => {
    expect(cleanSpokenText('the mat is 2.5 cm smaller. then glue it')).toBe('The mat is 2.5 cm smaller. Then glue it.');
  });
});

describe('measurements in display form', () => {
  it('writes spoken lengths as a crafter writes them', () => {
    expect(cleanSpokenText('cut the base ten and nine sixteenths by four and a quarter inches')).toBe('Cut the base 10 9/16 x 4 1/4 in.');
    // 10 9/16 = 10.5625: cross-checked with mathjs.
    expect(evaluate('10 + 9/16')).toBe(10.5625);
  });

  it.each([
    ['score at two and at four', 'score at 2 in and 4 in'],
    ['score it at one and a half inches', 'score it at 1 1/2 in'],
    ['roughly four inches wide', 'roughly 4 in wide'],
    ['a half inch border', 'a 1/2 in border'],
    ['cut a circle three inches in diameter', 'cut a 3 in circle'],
    ['a 12 by 12 sheet', 'a 12 x 12 in sheet'],
    ['cut it to five and a half inches, sorry, five and three quarters', 'cut it to 5 3/4 in'],
  ])('%j', (spoken, shown) => expect(showMeasurements(spoken)).toBe(shown));

  it('reads bare numbers in the tutorial default unit', () => {
    expect(showMeasurements('the strip is 4 by 20', { defaultUnit: 'mm' })).toBe('the strip is 4 x 20 mm');
  });

  it('can leave measurements alone', () => {
    expect(cleanSpokenText('cut it ten inches', { measurements: false })).toBe('Cut it ten inches.');
  });

  it('finds a measurement split by a pause', () => {
    expect(cleanSpokenText('cut it four and a quarter by\nfive and a half inches')).toBe('Cut it 4 1/4 x 5 1/2 in.');
  });
});

// Our own lines: a maker repeating a size to be sure it was heard.
describe('spoken repeats of a measurement', () => {
  it.each([
    ['cut it ten and a half, ten and a half inches long', 'Cut it 10 1/2 in long.'],
    ['the strip is four by six, four by six inches', 'The strip is 4 x 6 in.'],
    ["score at one inch, that's one inch from the edge", 'Score at 1 in from the edge.'],
  ])('%j', (spoken, written) => expect(cleanSpokenText(spoken)).toBe(written));

  it('keeps two equal values that are two different things', () => {
    expect(cleanSpokenText('cut one inch strips and score them at one inch')).toBe('Cut 1 in strips and score them at 1 in.');
    expect(cleanSpokenText('two panels, four by six and four by six')).toBe('Two panels, 4 x 6 in and 4 x 6 in.');
  });
});
