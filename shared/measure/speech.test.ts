import { describe, expect, it } from 'vitest';
import { serializeLength } from './length';
import { extractMentions, extractMentionsFromCues, type TextMention } from './mentions';
import { APPROX_PHRASES, APPROX_SUFFIXES, CORRECTION_PHRASES } from './words';

// Issue 11: speech as transcripts write it. Every sentence here is our own (a gatefold card, a
// pillow box, a tea-light lantern); the expected values are worked by hand from the words.

const brief = (ms: TextMention[]) =>
  ms.map((m) => ({
    kind: m.kind,
    values: m.values.map(serializeLength),
    approx: m.approx,
    ...(m.corrected ? { corrected: true } : {}),
    ...(m.every ? { every: serializeLength(m.every) } : {}),
    ...(m.count !== undefined ? { count: m.count } : {}),
  }));
/** The mentions a text gives that the speaker did not take back. */
const live = (text: string) => brief(extractMentions(text).filter((m) => !m.corrected));

describe('self-corrections through commas, full stops, dashes and cue boundaries (worked examples)', () => {
  it.each([
    ['the strip is 4 inches, no wait, 5', ['5 in']],
    ['cut it three and a half. Sorry, three and five eighths', ['29/8 in']],
    ['the panel is 6 inches... actually, 6 and a quarter', ['25/4 in']],
    ['trim it to 2 cm; I mean, 2.5 cm', ['5/2 cm']],
    ['the tag is three inches — make that three and a half', ['7/2 in']],
    ['mark it at 7 inches. Scratch that. 7 and 1/8.', ['57/8 in']],
    ['two and a quarter, correction, two and three eighths', ['19/8 in']],
    ["it's 5 inches. I'm sorry. 5 and 3/4 inches.", ['23/4 in']],
    ['the lid band is 10 inches, oops, 11 inches', ['11 in']],
    ['cut it 4 inches, no, sorry, it should be 4 and a half', ['9/2 in']],
    ['the wall is 3 inches, my mistake, 3 and 5/16', ['53/16 in']],
    ['use 12 mm, hang on, 15 mm', ['15 mm']],
    ['cut it 8 inches, no no, 8 and an eighth', ['65/8 in']],
  ])('%s', (text, meant) => {
    const ms = extractMentions(text);
    expect(ms.length, JSON.stringify(brief(ms))).toBe(2);
    expect(ms[0]!.corrected).toBe(true);
    expect(ms[1]!.corrected).toBeUndefined();
    expect(ms[1]!.values.map(serializeLength)).toEqual(meant);
  });

  it('a correction of one side of a size keeps the corrected size whole ("five by seven, sorry, five by seven and a half")', () => {
    expect(brief(extractMentions('five by seven, sorry, five by seven and a half'))).toEqual([
      { kind: 'size', values: ['5 in', '7 in'], approx: false, corrected: true },
      { kind: 'size', values: ['5 in', '15/2 in'], approx: false },
    ]);
    expect(live('four by six — actually four and a quarter by six')).toEqual([{ kind: 'size', values: ['17/4 in', '6 in'], approx: false }]);
    // only the second side said again: it replaces that side
    expect(live('the mat is 3 by 5, sorry, 5 and a quarter')).toEqual([{ kind: 'size', values: ['3 in', '21/4 in'], approx: false }]);
  });

  it('every correction phrase of the lexicon separates the withdrawn value from the meant one', () => {
    for (const phrase of CORRECTION_PHRASES) {
      const said = phrase.join(' ');
      const text = `cut the strip 6 inches, ${said}, 7 inches`;
      const ms = extractMentions(text);
      expect(brief(ms), text).toEqual([
        { kind: 'length', values: ['6 in'], approx: false, corrected: true },
        { kind: 'length', values: ['7 in'], approx: false },
      ]);
    }
  });

  it('a correction across a cue boundary still withdraws the earlier value', () => {
    const ms = extractMentionsFromCues([
      { startMs: 0, endMs: 2000, text: 'the base strip is eleven inches,' },
      { startMs: 2000, endMs: 4000, text: 'no wait, eleven and a half.' },
    ]);
    expect(ms.map((m) => [serializeLength(m.values[0]!), Boolean(m.corrected), m.startMs])).toEqual([
      ['11 in', true, 0],
      ['23/2 in', false, 2000],
    ]);
  });

  it('a value ruled out with "not" is marked; words that are not corrections leave values alone', () => {
    expect(live('cut it not 4 inches but 5 inches')).toEqual([{ kind: 'length', values: ['5 in'], approx: false }]);
    expect(brief(extractMentions('cut it 4 inches. No glue yet. Then score at 2'))).toEqual([
      { kind: 'length', values: ['4 in'], approx: false },
      { kind: 'score', values: ['2 in'], approx: false },
    ]);
  });
});

describe('hedges make a length approximate, before or after the number (common practice: how crafters hedge)', () => {
  it.each([
    'a bit over 4 inches',
    'a tad under 4 inches',
    'a touch more than 4 inches',
    'a hair shy of 4 inches',
    'a smidge under 4 inches',
    'slightly less than 4 inches',
    'just past 4 inches',
    'plus or minus 4 inches',
    'more or less 4 inches',
    'roughly 4 inches',
    'barely 4 inches',
    'nearly 4 inches',
    'almost 4 inches',
    'approximately 4 inches',
    'approx. 4 inches',
    'six-ish inches',
    'sixish inches',
    '4ish inches',
    '4 inches-ish',
    '4 inches or so',
    '4 inches, give or take',
    '4 inches give or take an eighth',
    '4 inches plus or minus a sixteenth',
    '4 inches ± 1/16',
    '4 in +/- 1/32',
    '4 inches or thereabouts',
    '4 inches and change',
    "I'd say it's about 4 inches",
    'somewhere around 4 inches',
    'in the region of 10 cm',
    'no more than 4 inches',
    'at least 4 inches',
    'close to 4 by 6',
    'a circle a tad over 3 inches across',
  ])('%s', (text) => {
    const ms = extractMentions(text);
    expect(ms, text).toHaveLength(1);
    expect(ms[0]!.approx).toBe(true);
  });

  it('every hedge said before a length in the lexicon is read (test of each entry)', () => {
    for (const phrase of APPROX_PHRASES) {
      const text = `cut the strip ${phrase.join(' ')} 4 inches`;
      const ms = extractMentions(text);
      expect(ms.length, text).toBe(1);
      expect(ms[0]!.approx, text).toBe(true);
      expect(ms[0]!.values.map(serializeLength), text).toEqual(['4 in']);
    }
  });

  it('every hedge said after a length in the lexicon is read (test of each entry)', () => {
    for (const phrase of APPROX_SUFFIXES) {
      const text = `cut the strip 4 inches ${phrase.join(' ')} and set it aside`;
      const ms = extractMentions(text);
      expect(ms.length, text).toBe(1);
      expect(ms[0]!.approx, text).toBe(true);
      expect(ms[0]!.values.map(serializeLength), text).toEqual(['4 in']);
    }
  });

  it('the tolerance of "plus or minus" is part of the hedge, not a second length', () => {
    expect(brief(extractMentions('cut it 5 inches plus or minus a sixteenth'))).toEqual([{ kind: 'length', values: ['5 in'], approx: true }]);
  });

  it('a hedge after one length that starts the next belongs to the next ("4 inches, probably 5")', () => {
    const ms = extractMentions('make it 4 inches, probably 5 inches');
    expect(ms.map((m) => m.approx)).toEqual([false, true]);
  });

  it('exact lengths stay exact', () => {
    for (const text of ['cut it exactly 4 inches', 'a 4 by 6 mat', 'score at 2 and at 4'])
      for (const m of extractMentions(text)) expect(m.approx, text).toBe(false);
  });
});

describe('bare "inch and ..." (worked examples: one inch plus the fraction)', () => {
  it.each([
    ['inch and an eighth', '9/8 in'],
    ['mark it an inch and five sixteenths', '21/16 in'],
    ['cut it inch and five eighths', '13/8 in'],
    ['leave inch and a half at the top', '3/2 in'],
    ['the flap is inch and three quarters', '7/4 in'],
    ['centimetre and a half', '3/2 cm'],
  ])('%s', (text, value) => {
    const ms = extractMentions(text);
    expect(ms).toHaveLength(1);
    expect(ms[0]!.values.map(serializeLength)).toEqual([value]);
  });
});

describe('ranges: both ends, never exact (worked examples)', () => {
  it.each([
    ['somewhere from a quarter to three eighths', ['1/4 in', '3/8 in']],
    ['between two and two and a half', ['2 in', '5/2 in']],
    ['5 to 6 mm', ['5 mm', '6 mm']],
    ['the overlap can be anywhere from 1/2 to 3/4 inch', ['1/2 in', '3/4 in']],
    ['a border of between 1/8 and 1/4 inch', ['1/8 in', '1/4 in']],
    ['leave 4-5 mm', ['4 mm', '5 mm']],
    ['trim 3 or 4 inches off', ['3 in', '4 in']],
    ['from 10 to 12 cm wide', ['10 cm', '12 cm']],
    ['between 3 and 2 and a half inches', ['5/2 in', '3 in']],
  ])('%s', (text, values) => {
    const ms = extractMentions(text);
    expect(brief(ms)).toEqual([{ kind: 'range', values, approx: true }]);
  });

  it('is not a range: a change from one length to another, counts, times, a mixed number with a hyphen', () => {
    expect(extractMentions('trim it from 12 to 11 inches').map((m) => m.kind)).toEqual(['length']);
    expect(extractMentions('cut 2 or 3 strips')).toEqual([]);
    expect(extractMentions('between 2 and 3 pieces')).toEqual([]);
    expect(extractMentions('let it dry 5 to 10 minutes')).toEqual([]);
    expect(brief(extractMentions('a 1-1/2 inch strip'))).toEqual([{ kind: 'length', values: ['3/2 in'], approx: false }]);
  });
});

describe('repeated score lines: a step (worked examples)', () => {
  it.each([
    ['score every quarter inch down the flap', '1/4 in', '1/4 in'],
    ['score at one inch intervals', '1 in', '1 in'],
    ['score at every half inch', '1/2 in', '1/2 in'],
    ['score the strip every 1/2 inch along the long side', '1/2 in', '1/2 in'],
    ['score lines a quarter inch apart', '1/4 in', '1/4 in'],
    ['score at 1 cm increments', '1 cm', '1 cm'],
    ['score every inch', '1 in', '1 in'],
    ['score every other inch', '2 in', '2 in'],
    ['score at half-inch intervals starting at 1 inch', '1/2 in', '1 in'],
  ])('%s', (text, every, first) => {
    const ms = extractMentions(text);
    expect(ms).toHaveLength(1);
    expect(ms[0]!.kind).toBe('score');
    expect(serializeLength(ms[0]!.every!)).toBe(every);
    expect(ms[0]!.values.map(serializeLength)).toEqual([first]);
  });

  it('a plain score list has no step', () => {
    expect(extractMentions('score at 2 and at 4')[0]!.every).toBeUndefined();
  });
});

describe('counts before sizes set the quantity (worked examples)', () => {
  it.each([
    ['cut two two-inch strips', 'length', ['2 in'], 2],
    ['three 4 by 6 mats', 'size', ['4 in', '6 in'], 3],
    ['you need 6 1 inch squares', 'length', ['1 in'], 6],
    ['cut four strips 2 inches wide', 'length', ['2 in'], 4],
    ['two 2 1/2 inch circles', 'diameter', ['5/2 in'], 2],
    ['a pair of 3 by 3 squares', 'size', ['3 in', '3 in'], 2],
    ['twelve 1/2 inch dots', 'length', ['1/2 in'], 12],
    ['cut 4 by 6, two of them', 'size', ['4 in', '6 in'], 2],
  ])('%s', (text, kind, values, count) => {
    const ms = extractMentions(text);
    expect(brief(ms)).toEqual([{ kind, values, approx: false, count }]);
  });

  it('no count where none was said, and a stutter is not a count', () => {
    expect(extractMentions('cut it 4 by 6')[0]!.count).toBeUndefined();
    expect(extractMentions('cut it two two inches long')[0]!.count).toBeUndefined();
    expect(extractMentions('score at 1 2 and 3')[0]!.count).toBeUndefined();
  });
});
