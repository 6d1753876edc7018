import Fraction from 'fraction.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inches, millimetres, toInches, type Length } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import { guillotineCuts, layoutProblems, type LaidRect } from './guillotine';
import { placementsOf, planSheets, type PlanInput, type SheetPlan } from './sheet-plan';
import { sheetSize } from './sheets';

const L = (s: string): Length => parseLength(s)!;
const twelve = { width: inches(12), height: inches(12) };

/** Every sheet pattern is used, inside its sheet, free of overlaps and cuttable edge to edge. */
function sound(plan: SheetPlan, sheet: { width: Length; height: Length }): void {
  const laid = placementsOf(plan);
  for (const pattern of plan.patterns) {
    const rects = laid.filter((p) => p.sheet === pattern.first);
    expect(rects.length, `sheet ${pattern.first} is used`).toBeGreaterThan(0);
    expect(rects.length).toBe(pattern.pieces);
    expect(layoutProblems(rects, sheet), `sheet ${pattern.first}`).toEqual([]);
  }
  expect(plan.patterns.reduce((n, p) => n + p.count, 0)).toBe(plan.sheets);
  expect(plan.sheets).toBeGreaterThanOrEqual(plan.areaLowerBound);
}

describe('guillotine checker', () => {
  const r = (x: number, y: number, w: number, h: number): LaidRect => ({ x: inches(x), y: inches(y), width: inches(w), height: inches(h) });
  const sq3 = { width: inches(3), height: inches(3) };

  it('finds the edge-to-edge cuts of a simple layout', () => {
    const tree = guillotineCuts([r(0, 0, 1, 3), r(1, 0, 2, 3)], sq3);
    expect(tree).toMatchObject({ kind: 'cut', axis: 'x', first: { kind: 'piece', index: 0 }, second: { kind: 'piece', index: 1 } });
    expect(tree?.kind === 'cut' && tree.at.equals(1)).toBe(true);
  });

  it('rejects a pinwheel, which no trimmer can cut', () => {
    const pinwheel = [r(0, 0, 2, 1), r(2, 0, 1, 2), r(1, 2, 2, 1), r(0, 1, 1, 2), r(1, 1, 1, 1)];
    expect(guillotineCuts(pinwheel, sq3)).toBeNull();
    expect(layoutProblems(pinwheel, sq3)).toEqual(['the layout cannot be cut edge to edge']);
  });

  it('reports overlaps and pieces off the sheet', () => {
    expect(layoutProblems([r(0, 0, 2, 2), r(1, 1, 2, 2)], sq3)).toEqual(['rectangles 0 and 1 overlap']);
    expect(layoutProblems([r(2, 0, 2, 1)], sq3)).toEqual(['rectangle 0 lies outside the sheet']);
  });
});

describe('planSheets (M6)', () => {
  it('four A2 panels (4 1/4 x 5 1/2) fit one 12 x 12 sheet, upright', () => {
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 1, pieces: [{ name: 'panel', width: L('4 1/4'), height: L('5 1/2'), qty: 4 }] });
    expect(plan.sheets).toBe(1);
    expect(placementsOf(plan)).toHaveLength(4);
    expect(placementsOf(plan).every((p) => !p.rotated)).toBe(true);
    // waste = 1 - 4 x 23.375 / 144
    expect(plan.wasteExact.equals(new Fraction(1).sub(new Fraction(4 * 23.375).div(144)))).toBe(true);
    sound(plan, twelve);
  });

  it('an exact tiling leaves no waste: four 6 x 6 squares on 12 x 12', () => {
    const plan = planSheets({ sheet: twelve, rotate: false, kits: 1, pieces: [{ name: 'square', width: inches(6), height: inches(6), qty: 4 }] });
    expect(plan.sheets).toBe(1);
    expect(plan.waste).toBe(0);
    sound(plan, twelve);
  });

  it('multiplies by kits plus spares', () => {
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 3, spares: 1, pieces: [{ name: 'tag', width: L('2'), height: L('3 1/2'), qty: 2 }] });
    expect(placementsOf(plan)).toHaveLength(8);
    sound(plan, twelve);
  });

  it('reports a piece that fits no sheet as an error and still places the rest', () => {
    const plan = planSheets({
      sheet: twelve,
      rotate: true,
      kits: 2,
      pieces: [
        { name: 'box wall', width: L('20 1/8'), height: L('2'), qty: 1 },
        { name: 'lid', width: L('4'), height: L('4'), qty: 1 },
      ],
    });
    expect(plan.errors).toEqual([
      { piece: 0, name: 'box wall', count: 2, reason: '"box wall" (20 1/8 in x 2 in) is larger than the 12 in x 12 in sheet, even turned' },
    ]);
    expect(placementsOf(plan).map((p) => p.name)).toEqual(['lid', 'lid']);
    expect(plan.sheets).toBe(1);
  });

  it('turns a piece only when turning is allowed (directional prints)', () => {
    const a4 = { width: millimetres(210), height: millimetres(297) };
    const strip = { name: 'strip', width: L('11'), height: L('2'), qty: 3 };
    const turned = planSheets({ sheet: a4, rotate: true, kits: 1, pieces: [strip] });
    expect(turned.errors).toEqual([]);
    expect(placementsOf(turned).every((p) => p.rotated)).toBe(true);
    sound(turned, a4);
    const upright = planSheets({ sheet: a4, rotate: false, kits: 1, pieces: [strip] });
    expect(placementsOf(upright)).toEqual([]);
    expect(upright.errors[0]!.reason).toContain('(turning is off)');
  });

  it('mixes inch pieces on a millimetre sheet exactly', () => {
    const a4 = sheetSize('a4')!;
    const plan = planSheets({ sheet: a4, rotate: true, kits: 1, pieces: [{ name: 'card front', width: L('4 1/8'), height: L('5 3/8'), qty: 4 }] });
    sound(plan, a4);
    for (const p of placementsOf(plan)) {
      expect(toInches(p.x).add(toInches(p.width)).lte(toInches(a4.width))).toBe(true);
      expect(toInches(p.y).add(toInches(p.height)).lte(toInches(a4.height))).toBe(true);
    }
  });

  it('no pieces, no sheets', () => {
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 0, pieces: [{ name: 'x', width: inches(1), height: inches(1), qty: 5 }] });
    expect(plan).toMatchObject({ sheets: 0, patterns: [], pieces: 0, waste: 0, areaLowerBound: 0, errors: [] });
  });

  it('refuses bad counts', () => {
    expect(() => planSheets({ sheet: twelve, rotate: true, kits: -1, pieces: [] })).toThrow(RangeError);
    expect(() => planSheets({ sheet: twelve, rotate: true, kits: 1, pieces: [{ name: 'x', width: inches(1), height: inches(1), qty: 1.5 }] })).toThrow(
      RangeError,
    );
  });

  it('every plan is cuttable, inside the sheet, without overlaps, places every piece, and is no better than the area bound (property)', () => {
    const pieceArb = fc.record({
      name: fc.constantFrom('base', 'mat', 'tag', 'wall', 'lid', 'flap'),
      w: fc.integer({ min: 1, max: 12 * 16 }),
      h: fc.integer({ min: 1, max: 12 * 16 }),
      qty: fc.integer({ min: 1, max: 6 }),
    });
    fc.assert(
      fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 12 }), fc.boolean(), fc.integer({ min: 1, max: 3 }), (ps, rotate, kits) => {
        const input: PlanInput = {
          sheet: twelve,
          rotate,
          kits,
          pieces: ps.map((p) => ({ name: p.name, width: inches([p.w, 16]), height: inches([p.h, 16]), qty: p.qty })),
        };
        const plan = planSheets(input);
        const wanted = ps.reduce((s, p) => s + p.qty * kits, 0);
        expect(placementsOf(plan)).toHaveLength(wanted);
        expect(plan.errors).toEqual([]);
        if (!rotate) expect(placementsOf(plan).some((p) => p.rotated)).toBe(false);
        sound(plan, twelve);
        // the lower bound itself: ceil(total area / sheet area)
        const area = ps.reduce((s, p) => s + p.w * p.h * p.qty * kits, 0);
        expect(plan.areaLowerBound).toBe(Math.ceil(area / (192 * 192)));
      }),
      { numRuns: 150 },
    );
  });
});

describe('planSheets in bulk: copies are laid as blocks and identical sheets counted once', () => {
  it('10,000 one-inch squares on 12 x 12 sheets: 69 full sheets of 144 and one of 64 (worked by hand: 144 x 69 + 64 = 10,000)', () => {
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 10_000, pieces: [{ name: 'square', width: inches(1), height: inches(1), qty: 1 }] });
    expect(plan.sheets).toBe(70);
    expect(plan.pieces).toBe(10_000);
    expect(plan.patterns.map((p) => [p.count, p.pieces])).toEqual([
      [69, 144],
      [1, 64],
    ]);
    // one block holds the whole 12 x 12 grid
    expect(plan.patterns[0]!.blocks).toEqual([expect.objectContaining({ across: 12, down: 12, rotated: false })]);
    expect(plan.areaLowerBound).toBe(70);
    sound(plan, twelve);
  });

  it('the large case that used to stall the server: 40 tiny pieces x 999 x 50 kits come back as a few patterns of blocks', () => {
    const pieces = Array.from({ length: 40 }, (_, i) => ({
      name: `chip ${i + 1}`,
      width: inches([4 + (i % 5), 16]),
      height: inches([6 + (i % 7), 16]),
      qty: 999,
    }));
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 50, pieces });
    expect(plan.pieces).toBe(40 * 999 * 50);
    expect(plan.errors).toEqual([]);
    // the answer stays small: no more blocks than sheet patterns times pieces
    const blocks = plan.patterns.reduce((n, p) => n + p.blocks.length, 0);
    expect(plan.patterns.length).toBeLessThan(200);
    expect(blocks).toBeLessThan(2_000);
    expect(plan.sheets).toBeGreaterThanOrEqual(plan.areaLowerBound);
    // a sample of patterns is sound (the whole plan would be a million rectangles to list)
    for (const pattern of plan.patterns.slice(0, 5)) {
      const rects = placementsOf({ patterns: [{ ...pattern, count: 1 }], pieces: pattern.pieces });
      expect(layoutProblems(rects, twelve)).toEqual([]);
    }
  });

  // Worked by hand: only two 8 1/2 x 5 1/2 bases fit a 12 x 12 sheet, so 30 bases take 15 sheets; their
  // 3 1/2 in offcut strip holds six tags turned, but no mat; six 4 x 5 1/4 mats fit a sheet (3 x 2): 15 + 5 = 20.
  it('a class of 30 kits: 20 sheets in three patterns (fewest possible, by hand)', () => {
    const pieces = [
      { name: 'base', width: L('8 1/2'), height: L('5 1/2'), qty: 1 },
      { name: 'mat', width: L('4'), height: L('5 1/4'), qty: 1 },
      { name: 'tag', width: L('2'), height: L('3 1/2'), qty: 1 },
    ];
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 30, pieces });
    expect(plan.pieces).toBe(90);
    expect(plan.sheets).toBe(20);
    expect(plan.patterns).toHaveLength(3);
    expect(plan.patterns.map((p) => p.count).sort((a, b) => a - b)).toEqual([5, 5, 10]);
    sound(plan, twelve);
  });

  it('a spent time budget keeps the first complete try and says the search stopped early', () => {
    let t = 0;
    const now = () => (t += 1000);
    const plan = planSheets(
      { sheet: twelve, rotate: true, kits: 3, pieces: [{ name: 'panel', width: L('4 1/4'), height: L('5 1/2'), qty: 4 }] },
      { budgetMs: 10, now },
    );
    expect(plan.complete).toBe(false);
    expect(plan.pieces).toBe(12);
    sound(plan, twelve);
    expect(planSheets({ sheet: twelve, rotate: true, kits: 1, pieces: [] }).complete).toBe(true);
  });

  it('lengths with enormous denominators fall back to a fine grid and still give a sound plan', () => {
    const odd = (n: number) => ({ value: new Fraction(BigInt(n) * 10n ** 15n + 7n, 10n ** 15n), unit: 'in' as const });
    const plan = planSheets({
      sheet: { width: odd(12), height: L('12') },
      rotate: true,
      kits: 2,
      pieces: [{ name: 'odd', width: odd(3), height: odd(4), qty: 3 }],
    });
    expect(plan.pieces).toBe(6);
    for (const p of placementsOf(plan)) {
      expect(
        toInches(p.x)
          .add(toInches(p.width))
          .lte(toInches(odd(12))),
      ).toBe(true);
      expect(toInches(p.y).add(toInches(p.height)).lte(12)).toBe(true);
    }
    sound(plan, { width: odd(12), height: L('12') });
  });
});

describe('planSheets: grain (common practice: a wall bends cleanly only with the grain running round it)', () => {
  const strip = { name: 'Wall strip', width: inches([169, 16]), height: inches([5, 2]), qty: 2, grain: 'length' as const };
  const sheet = { width: inches(12), height: inches(12) };

  it('lays a grain-bound strip only the way that runs its grain with the sheet’s', () => {
    const across = planSheets({ sheet, rotate: true, kits: 1, grain: 'width', pieces: [strip] });
    expect(placementsOf(across).map((p) => p.rotated)).toEqual([false, false]);
    const down = planSheets({ sheet, rotate: true, kits: 1, grain: 'height', pieces: [strip] });
    expect(placementsOf(down).map((p) => p.rotated)).toEqual([true, true]);
    // A sheet of unknown grain binds nothing: the plan keeps the strips upright (fewer turns).
    expect(placementsOf(planSheets({ sheet, rotate: true, kits: 1, pieces: [strip] })).every((p) => !p.rotated)).toBe(true);
  });

  it('turns a square only when its grain asks for it, and says so when turning is off', () => {
    const square = { name: 'Square', width: inches(3), height: inches(3), qty: 1, grain: 'length' as const };
    expect(placementsOf(planSheets({ sheet, rotate: true, kits: 1, grain: 'width', pieces: [square] }))[0]!.rotated).toBe(true);
    const stuck = planSheets({ sheet, rotate: false, kits: 1, grain: 'height', pieces: [strip] });
    expect(stuck.sheets).toBe(0);
    expect(stuck.errors[0]!.reason).toBe(
      '"Wall strip" needs its grain along its length, which lies across the sheet\'s grain, and turning is off for this material',
    );
    // On Letter with short grain the strip would have to lie across the 8 1/2 in width, which it does not fit.
    const letter = planSheets({ sheet: { width: inches([17, 2]), height: inches(11) }, rotate: true, kits: 1, grain: 'width', pieces: [strip] });
    expect(letter.errors[0]!.reason).toMatch(/only across its grain/);
    // Every layout that honours the grain is still cut edge to edge.
    for (const plan of [planSheets({ sheet, rotate: true, kits: 3, grain: 'height', pieces: [strip, square] })]) {
      const laid = placementsOf(plan);
      for (let s = 0; s < plan.sheets; s++)
        expect(
          layoutProblems(
            laid.filter((p) => p.sheet === s),
            sheet,
          ),
        ).toEqual([]);
    }
  });
});
