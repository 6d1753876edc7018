import { describe, expect, it } from 'vitest';
import { matchEarlierSupply, suppliesSaid } from './supplies-said';

// Our own scenario: a pop-up birthday card, said as makers talk on camera.
const cues = [
  { startMs: 0, endMs: 4000, text: "Hi everyone! For this one you'll need white cardstock, two sheets of designer paper and a tape runner." },
  { startMs: 4000, endMs: 9000, text: 'I cut everything on my paper trimmer, and the little window with a craft knife.' },
  { startMs: 9000, endMs: 14000, text: 'Glue the panel down with tacky glue, then add foam squares behind the sentiment.' },
  { startMs: 14000, endMs: 18000, text: 'The glue takes a minute, so hold it with clips. Then tie some jute twine around it.' },
  { startMs: 18000, endMs: 22000, text: 'A mat of kraft cardstock finishes it.' },
];

describe('supplies named in the talk', () => {
  const said = suppliesSaid(cues);
  it('finds each material, adhesive and tool once, in the order said, with its category', () => {
    expect(said.map((s) => [s.name, s.category])).toEqual([
      ['White cardstock', 'cardstock'],
      ['Designer paper', 'paper'],
      ['Tape runner', 'adhesive'],
      ['Paper trimmer', 'tool'],
      ['Craft knife', 'tool'],
      ['Tacky glue', 'adhesive'],
      ['Foam squares', 'adhesive'],
      ['Clips', 'tool'],
      ['Jute twine', 'embellishment'],
      ['Kraft cardstock', 'cardstock'],
    ]);
  });
  it('keeps a quantity said with it', () => {
    expect(said.find((s) => s.name === 'Designer paper')!.quantity).toBe('2 sheets');
  });
  it('reads "glue the panel down" as a verb, and "the glue" again as the same supply', () => {
    expect(said.filter((s) => s.head === 'glue')).toHaveLength(1);
  });
  it('brings the usual caution with a blade (common practice)', () => {
    expect(said.find((s) => s.name === 'Craft knife')!.caution).toMatch(/cutting mat/);
  });
});

describe("matching the studio's earlier supplies", () => {
  const earlier = [
    { name: 'Smooth white cardstock 80 lb' },
    { name: 'Kraft cardstock, heavyweight' },
    { name: 'Tacky glue (precision tip)' },
    { name: 'Foam tape' },
  ];
  const find = (name: string, head: string) => matchEarlierSupply({ name, head, category: 'cardstock', quantity: '', saidAtMs: 0 }, earlier)?.name ?? null;
  it('matches where the kind and every distinguishing word agree', () => {
    expect(find('Kraft cardstock', 'cardstock')).toBe('Kraft cardstock, heavyweight');
    expect(find('White cardstock', 'cardstock')).toBe('Smooth white cardstock 80 lb');
    expect(find('Tacky glue', 'glue')).toBe('Tacky glue (precision tip)');
  });
  it('does not match a different colour or kind', () => {
    expect(find('Teal cardstock', 'cardstock')).toBeNull();
    expect(find('Foam squares', 'foam squares')).toBeNull();
  });
});
