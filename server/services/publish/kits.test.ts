import { describe, expect, it } from 'vitest';
import type { KitPlanDto } from '@shared/schemas/class';
import { kitsPdf } from './kits';
import { probePdf } from './pdf-probe';

const piece = (i: number): KitPlanDto['pieces'][number] => ({
  name: `Panel ${i}`,
  material: i % 2 ? 'Kraft cardstock' : 'Vellum',
  shape: 'rect',
  perKit: 2,
  total: 18,
  sizeInches: '4 1/4 × 5 1/2 in',
  sizeMm: '108.0 × 139.7 mm',
});

const plan = (pieces: number, over: Partial<KitPlanDto> = {}): KitPlanDto => ({
  classId: 'c1',
  seats: 8,
  spares: 1,
  kits: 9,
  currency: 'USD',
  kitFeeCents: 1500,
  empty: false,
  emptyMessage: null,
  pieces: Array.from({ length: pieces }, (_, i) => piece(i + 1)),
  materials: [
    {
      materialId: 'm1',
      material: 'Kraft cardstock',
      sheetLabel: '12 × 12 in',
      sheets: 3,
      sheetPriceCents: 125,
      sheetPriceCurrency: 'USD',
      costCents: 375,
      costNote: null,
      errors: [],
    },
    {
      materialId: 'm2',
      material: 'Vellum',
      sheetLabel: '8 1/2 × 11 in',
      sheets: 2,
      sheetPriceCents: null,
      sheetPriceCurrency: null,
      costCents: null,
      costNote: 'No price yet',
      errors: ['Panel 9 does not fit on the stock sheet'],
    },
  ],
  totalCostCents: 375,
  costPerKitCents: 42,
  marginCents: 11625,
  marginPerSeatCents: 1453,
  complete: false,
  working: [],
  ...over,
});

const input = (p: KitPlanDto, paper: 'letter' | 'a4' = 'letter') => ({
  title: 'Lantern card',
  studioName: 'Paper Lantern Studio',
  when: 'Saturday 6 March 2027, 10:00–12:00',
  place: 'Back room',
  plan: p,
  paper,
});

describe('kits PDF', () => {
  it('prints the figures, every piece of the checklist and a box a kit', async () => {
    const pages = await probePdf(await kitsPdf(input(plan(3))));
    const text = pages.map((p) => p.text).join(' ');
    for (const s of [
      'Kits: Lantern card',
      'Materials and cost',
      'Kraft cardstock',
      'No price yet',
      'Panel 9 does not fit',
      'Pre-cut checklist',
      'One box a kit (9)',
    ])
      expect(text).toContain(s);
    for (const i of [1, 2, 3]) expect(text).toContain(`Panel ${i}`);
    expect(text).toContain('108.0 × 139.7 mm');
    // $3.75 total, per kit 42 cents, margin $116.25 ($14.53 a seat): the plan's own figures, printed.
    expect(text).toContain('$3.75');
    expect(text).toContain('$116.25');
    // Nine kits, three pieces: 27 boxes of 9 x 9 pt, drawn as rectangles.
    const boxes = pages.flatMap((p) => p.paths).filter((b) => b.rect && Math.abs(b.width - 9) < 0.5 && Math.abs(b.height - 9) < 0.5);
    expect(boxes).toHaveLength(27);
  });

  it('a long checklist runs onto more pages with its column titles repeated and every page numbered', async () => {
    const pages = await probePdf(await kitsPdf(input(plan(60, { materials: [] }), 'a4')));
    expect(pages.length).toBeGreaterThan(1);
    // A4 is 595.28 x 841.89 pt (ISO 216: 210 x 297 mm).
    expect(pages[0]!.width).toBeCloseTo(595.28, 1);
    pages.forEach((p, i) => {
      expect(p.text).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(p.text).toContain('Kits: Lantern card · Paper Lantern Studio');
    });
    for (const p of pages.slice(1)) expect(p.text).toContain('One box a kit (9)');
    const all = pages.map((p) => p.text).join(' ');
    for (let i = 1; i <= 60; i++) expect(all).toContain(`Panel ${i} `);
  });

  it('an empty plan says what to do instead of a table', async () => {
    const pages = await probePdf(await kitsPdf(input(plan(0, { empty: true, emptyMessage: 'There is no cut list yet: add pieces in the Cut list section.' }))));
    const text = pages.map((p) => p.text).join(' ');
    expect(text).toContain('There is no cut list yet');
    expect(text).not.toContain('Pre-cut checklist');
  });
});
