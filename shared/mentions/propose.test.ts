import { describe, expect, it } from 'vitest';
import { extractMentionsFromCues, formatLength, inches, type Length } from '../measure';
import { proposePieces, scoreAxis, type KeyedMention } from './propose';

// A scenario of our own: a gatefold card with a belly band, said the way makers talk on camera.
const cues = [
  { startMs: 0, endMs: 5_000, text: "Hello everyone, today we're making a gatefold card with a belly band." },
  {
    startMs: 5_000,
    endMs: 15_000,
    text: 'First cut the card base from white cardstock, eight and a half by five and a half, and score it at two and an eighth and at six and three eighths.',
  },
  { startMs: 15_000, endMs: 25_000, text: 'Next the front panels, two panels of patterned paper four by five and a quarter.' },
  { startMs: 25_000, endMs: 35_000, text: 'Then the belly band, a strip eleven by one and a half inches. Score it at a quarter inch along the long side.' },
  { startMs: 35_000, endMs: 45_000, text: 'Cut a circle three inches across for the sentiment.' },
  { startMs: 80_000, endMs: 85_000, text: 'Oh and score it at one inch.' },
];
const keyed = (): KeyedMention[] => extractMentionsFromCues(cues).map((m) => ({ ...m, key: `${m.startMs}:${m.text}` }));
const show = (l: Length) => formatLength(l);

describe('finished pieces from the mentions of a transcript', () => {
  const found = keyed();
  const proposals = [...proposePieces(cues, found, [], { tutorial: [], studio: [] }).values()];

  it('proposes one piece per size and diameter, none for the score lists', () => {
    expect(proposals.map((p) => p.name)).toEqual(['Card base', 'Front panel', 'Belly band strip', 'Sentiment circle']);
  });

  it('takes the material said, the count said as the quantity', () => {
    expect(proposals.map((p) => p.material)).toEqual(['white cardstock', 'patterned paper', '', '']);
    expect(proposals.map((p) => p.quantity)).toEqual([1, 2, 1, 1]);
  });

  it('takes the score list said next to a size into that piece, on the side it fits', () => {
    const base = proposals[0]!;
    // 6 3/8 in only fits along the 8 1/2 in side of a 8 1/2 x 5 1/2 in card base.
    expect(base.scoreLines.map((s) => `${s.axis} ${show(s.at)}`)).toEqual(['width 2 1/8 in', 'width 6 3/8 in']);
    expect(base.scoreKey).toBe(found.find((m) => m.kind === 'score')!.key);
    // "along the long side": the line runs beside the 11 in side, so it is measured across the 1 1/2 in side.
    const band = proposals[2]!;
    expect(band.scoreLines.map((s) => `${s.axis} ${show(s.at)}`)).toEqual(['height 1/4 in']);
  });

  it('leaves a score list said long after or beyond another size on its own', () => {
    const lone = found.find((m) => m.startMs === 80_000)!;
    expect(proposals.some((p) => p.scoreKey === lone.key)).toBe(false);
    expect(proposals[1]!.scoreLines).toEqual([]);
    expect(proposals[3]!.shape).toBe('circle');
    expect(show(proposals[3]!.width)).toBe('3 in');
  });

  it("uses the tutorial's only material when none was said, and a studio's earlier one only when said", () => {
    const one = [...proposePieces(cues, found, [], { tutorial: ['kraft cardstock'], studio: ['white cardstock smooth'] }).values()];
    expect(one.map((p) => p.material)).toEqual(['white cardstock smooth', 'patterned paper', 'kraft cardstock', 'kraft cardstock']);
  });

  it('names a piece nobody named by its time', () => {
    const c = [{ startMs: 62_000, endMs: 66_000, text: 'Okay, so six by four.' }];
    const m = extractMentionsFromCues(c).map((x) => ({ ...x, key: 'k' }));
    const p = proposePieces(c, m, [], { tutorial: [], studio: [] }).get('k')!;
    expect(p).toMatchObject({ name: 'Piece said at 1:02', nameSaid: false, quantity: 1 });
  });
});

describe('the side score lines are measured along', () => {
  const w = inches(8.5);
  const h = inches(5.5);
  it('a single line at half the longer side is a fold in half (A2 card base 8 1/2 x 5 1/2 folded at 4 1/4: common practice)', () => {
    expect(scoreAxis([inches(4.25)], w, h, 'score it at four and a quarter')).toBe('width');
  });
  it('a line that fits either side goes on the shorter side unless the words say otherwise (common practice)', () => {
    expect(scoreAxis([inches(1)], w, h, 'score at one inch')).toBe('height');
    expect(scoreAxis([inches(1)], w, h, 'score at one inch on the short side')).toBe('width');
  });
});
