import { describe, expect, it } from 'vitest';
import { serializeLength } from './length';
import { extractMentions, extractMentionsFromCues, type Cue, type TextMention } from './mentions';

const brief = (ms: TextMention[]) => ms.map((m) => ({ kind: m.kind, values: m.values.map(serializeLength), approx: m.approx }));
const one = (text: string) => {
  const ms = extractMentions(text);
  expect(ms, text).toHaveLength(1);
  return ms[0]!;
};

// Phrase table: each row is a sentence of our own (a gatefold card, a round gift box,
// a hexagon treat box) and the mention it must give.
const KINDS: [string, 'size' | 'score' | 'length' | 'diameter', string[]][] = [
  // sizes, in the order spoken
  ['cut the card base 4 1/4 by 5 1/2', 'size', ['17/4 in', '11/2 in']],
  ['a panel 4 x 6', 'size', ['4 in', '6 in']],
  ['a panel 4 × 6 inches', 'size', ['4 in', '6 in']],
  ['grab a 4x6 photo mat', 'size', ['4 in', '6 in']],
  ['make it 4 inches wide by 6 long', 'size', ['4 in', '6 in']],
  ['6 long by 4 wide', 'size', ['6 in', '4 in']],
  ['10 by 15 cm', 'size', ['10 cm', '15 cm']],
  ['four and a quarter by five and a half', 'size', ['17/4 in', '11/2 in']],
  ['4" x 6"', 'size', ['4 in', '6 in']],
  ['the box is 4 by 4 by 2 inches', 'size', ['4 in', '4 in', '2 in']],
  ['12 × 12 inch patterned paper', 'size', ['12 in', '12 in']],
  ['the mat is three and seven eighths by five and one eighth', 'size', ['31/8 in', '41/8 in']],
  ['4 inches wide and 6 inches tall', 'size', ['4 in', '6 in']],
  ['a 105 x 148 mm insert', 'size', ['105 mm', '148 mm']],
  // score lists: each X a length even without a unit
  ['score at 4 1/4', 'score', ['17/4 in']],
  ['score it at 2 and at 4', 'score', ['2 in', '4 in']],
  ['score at 1, at 2 and at 3', 'score', ['1 in', '2 in', '3 in']],
  ['score at 1 2 and 3', 'score', ['1 in', '2 in', '3 in']],
  ['score at 2, 4 and 6 inches', 'score', ['2 in', '4 in', '6 in']],
  ['score the long side at two and a half and at five', 'score', ['5/2 in', '5 in']],
  ['score it at 4 1/4 on the long side and at 8 1/2', 'score', ['17/4 in', '17/2 in']],
  ['then score at 1 cm and at 2 cm', 'score', ['1 cm', '2 cm']],
  ['scoring at half an inch', 'score', ['1/2 in']],
  // diameters
  ['cut a circle 4 inches across', 'diameter', ['4 in']],
  ['punch an inch and a half circle', 'diameter', ['3/2 in']],
  ['a three inch circle for the lid', 'diameter', ['3 in']],
  ['a 6 diameter base', 'diameter', ['6 in']],
  ['it is 4 in diameter', 'diameter', ['4 in']],
  ['a circle with a diameter of 3 1/2 inches', 'diameter', ['7/2 in']],
  ['a circle about 3 and a half inches across', 'diameter', ['7/2 in']],
  ['two 2 1/2 inch circles', 'diameter', ['5/2 in']],
  // plain lengths
  ['a strip ten and nine sixteenths long', 'length', ['169/16 in']],
  ['ten and nine sixteenths', 'length', ['169/16 in']],
  ['trim a quarter inch off', 'length', ['1/4 in']],
  ['leave a sixteenth of an inch', 'length', ['1/16 in']],
  ['a 13 mm strip', 'length', ['13 mm']],
  ['leave ⅝ at the top', 'length', ['5/8 in']],
];

describe('extractMentions: kinds (M1, M2)', () => {
  it.each(KINDS)('%s', (text, kind, values) => {
    const m = one(text);
    expect(m.kind).toBe(kind);
    expect(m.values.map(serializeLength)).toEqual(values);
    expect(text.slice(m.start, m.end)).toBe(m.text);
  });
});

describe('extractMentions: approximate', () => {
  it.each([
    'about 4 inches',
    'around 4 inches',
    'roughly 4 inches',
    'approximately 4 inches',
    'probably 4 inches',
    'just over 4 inches',
    'just under 4 inches',
    'a little more than 4 inches',
    'a little bit more than 4 inches',
    'a little longer than 4 inches',
    'a little bit longer than 4 inches',
    'about 4 by 6',
    'a circle roughly 3 inches across',
    '4 inches or so',
  ])('%s', (text) => {
    const m = one(text);
    expect(m.approx).toBe(true);
    expect(m.text.length).toBeGreaterThan(0);
  });

  it('keeps the approximate words in the quoted text', () => {
    expect(one('cut it just over 4 inches').text).toBe('just over 4 inches');
  });

  it('an exact length is not approximate', () => {
    expect(one('cut it 4 inches').approx).toBe(false);
  });
});

describe('extractMentions: not lengths', () => {
  it.each([
    'two pieces',
    'three buttons',
    'ten minutes',
    '5 gems',
    '$4.99',
    'at 3:15',
    'this kit is $12.50 and takes about 20 minutes',
    'you need 3 sheets and 2 brads',
    'fold it in half',
    'fold the card in half and then in half again',
    'wait thirty seconds for the glue',
    'two and a half minutes',
    'a third of the paper',
    'three quarters of the way down',
    'use 110 lb cardstock',
    'tilt it 45 degrees',
    'set it to 50%',
    'the A4 sheet and the A2 card',
    'step 3 of 10',
    'I made 12 of these last year',
    'half of them',
    'a quarter of an hour',
    'it is 2 feet long',
    'the 2nd and 3rd layers',
  ])('%s', (text) => {
    expect(extractMentions(text)).toEqual([]);
  });
});

describe('extractMentions: messy speech', () => {
  it('finds a size through fillers, stutters and no punctuation', () => {
    const ms = extractMentions('so um you know cut the the panel four and a quarter inch inch by uh five and a half and then like set it aside');
    expect(brief(ms)).toEqual([{ kind: 'size', values: ['17/4 in', '11/2 in'], approx: false }]);
  });

  it('does not split a stuttered length in two', () => {
    const ms = extractMentions('cut it four and a half four and a half inches long');
    expect(brief(ms)).toEqual([{ kind: 'length', values: ['9/2 in'], approx: false }]);
  });

  it('a self-correction keeps both, marks the withdrawn one, and the size after it is whole', () => {
    const ms = extractMentions('cut the mat four and a half sorry four and a quarter by five and a half');
    expect(brief(ms)).toEqual([
      { kind: 'length', values: ['9/2 in'], approx: false },
      { kind: 'size', values: ['17/4 in', '11/2 in'], approx: false },
    ]);
    expect(ms[0]!.corrected).toBe(true);
    expect(ms[1]!.corrected).toBeUndefined();
  });

  it('a bare number right after a correction is the length meant, in the same unit', () => {
    const ms = extractMentions('the strip is 4 inches no wait 5');
    expect(brief(ms)).toEqual([
      { kind: 'length', values: ['4 in'], approx: false },
      { kind: 'length', values: ['5 in'], approx: false },
    ]);
    expect(ms[0]!.corrected).toBe(true);
  });

  it('a correction inside a score list replaces the score line', () => {
    const ms = extractMentions('score it at 2 sorry 2 1/4 and at 5');
    expect(brief(ms)).toEqual([{ kind: 'score', values: ['9/4 in', '5 in'], approx: false }]);
  });

  it('a correction inside a size replaces the second side', () => {
    const ms = extractMentions('cut it 4 by 5 I mean 6 inches');
    expect(brief(ms)).toEqual([{ kind: 'size', values: ['4 in', '6 in'], approx: false }]);
  });

  it('reads a run-on sentence with several measurements in order', () => {
    const text =
      'okay so for the hexagon treat box you want a strip of kraft cardstock twelve by three and score it at two at four at six at eight and at ten then you cut two circles well hexagons about three inches across and a lid a sixteenth of an inch bigger';
    const ms = extractMentions(text);
    expect(brief(ms)).toEqual([
      { kind: 'size', values: ['12 in', '3 in'], approx: false },
      { kind: 'score', values: ['2 in', '4 in', '6 in', '8 in', '10 in'], approx: false },
      { kind: 'diameter', values: ['3 in'], approx: true },
      { kind: 'length', values: ['1/16 in'], approx: false },
    ]);
    for (const m of ms) expect(text.slice(m.start, m.end)).toBe(m.text);
  });

  it('a count before a real length does not block it ("2 4 inch squares")', () => {
    const m = one('cut 2 4 inch squares');
    expect(m.values.map(serializeLength)).toEqual(['4 in']);
    expect(m.text).toBe('4 inch');
  });

  it('a count after a score list is not a score line', () => {
    expect(brief(extractMentions('score at 4 and 3 pieces'))).toEqual([{ kind: 'score', values: ['4 in'], approx: false }]);
  });

  it('uses the default unit', () => {
    expect(brief(extractMentions('score at 10 and 20', { defaultUnit: 'mm' }))).toEqual([{ kind: 'score', values: ['10 mm', '20 mm'], approx: false }]);
  });
});

describe('extractMentionsFromCues', () => {
  const cues: Cue[] = [
    { startMs: 0, endMs: 3000, text: 'welcome back today a round gift box' },
    { startMs: 3000, endMs: 6000, text: 'cut the base circle three and' },
    { startMs: 6000, endMs: 9000, text: 'a half inches across and a strip' },
    { startMs: 9000, endMs: 12000, text: 'eleven by two and score it at' },
    { startMs: 12000, endMs: 15000, text: 'half an inch' },
    { startMs: 15000, endMs: 18000, text: 'then glue for ten minutes' },
  ];

  it('finds a measurement split over a cue boundary once, timed from where it starts', () => {
    const ms = extractMentionsFromCues(cues);
    expect(ms.map((m) => ({ kind: m.kind, values: m.values.map(serializeLength), cue: m.cueIndex, startMs: m.startMs, endMs: m.endMs }))).toEqual([
      { kind: 'diameter', values: ['7/2 in'], cue: 1, startMs: 3000, endMs: 9000 },
      { kind: 'size', values: ['11 in', '2 in'], cue: 3, startMs: 9000, endMs: 12000 },
      { kind: 'score', values: ['1/2 in'], cue: 3, startMs: 9000, endMs: 15000 },
    ]);
    expect(ms[0]!.text).toBe('circle three and a half inches across');
  });

  it('a mention inside one cue has that cue’s times', () => {
    const ms = extractMentionsFromCues([{ startMs: 61_000, endMs: 64_500, text: 'a 4 1/4 by 5 1/2 panel' }]);
    expect(ms).toHaveLength(1);
    expect(ms[0]).toMatchObject({ startMs: 61_000, endMs: 64_500, cueIndex: 0, text: '4 1/4 by 5 1/2' });
  });

  it('gives the same mentions as the joined text', () => {
    const joined = extractMentions(cues.map((c) => c.text).join(' '));
    const fromCues = extractMentionsFromCues(cues);
    expect(fromCues.map((m) => m.values.map(serializeLength))).toEqual(joined.map((m) => m.values.map(serializeLength)));
  });

  it('handles no cues and empty cues', () => {
    expect(extractMentionsFromCues([])).toEqual([]);
    expect(extractMentionsFromCues([{ startMs: 0, endMs: 1, text: '' }])).toEqual([]);
  });
});
