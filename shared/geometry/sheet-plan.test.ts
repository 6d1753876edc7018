import Fraction from 'fraction.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inches, millimetres, toInches, type Length } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import { guillotineCuts, layoutProblems, type LaidRect } from './guillotine';
import { planSheets, type PlanInput, type SheetPlan } from './sheet-plan';
import { sheetSize } from './sheets';

const L = (s: string): Length => parseLength(s)!;
const twelve = { width: inches(12), height: inches(12) };

function sound(plan: SheetPlan, sheet: { width: Length; height: Length }): void {
  for (let s = 0; s < plan.sheets; s++) {
    const rects = plan.placements.filter((p) => p.sheet === s);
    expect(rects.length, `sheet ${s} is used`).toBeGreaterThan(0);
    expect(layoutProblems(rects, sheet), `sheet ${s}`).toEqual([]);
  }
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
    expect(plan.placements).toHaveLength(4);
    expect(plan.placements.every((p) => !p.rotated)).toBe(true);
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
    expect(plan.placements).toHaveLength(8);
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
    expect(plan.errors).toEqual([{ piece: 0, name: 'box wall', count: 2, reason: '"box wall" (20 1/8 in x 2 in) is larger than the 12 in x 12 in sheet, even turned' }]);
    expect(plan.placements.map((p) => p.name)).toEqual(['lid', 'lid']);
    expect(plan.sheets).toBe(1);
  });

  it('turns a piece only when turning is allowed (directional prints)', () => {
    const a4 = { width: millimetres(210), height: millimetres(297) };
    const strip = { name: 'strip', width: L('11'), height: L('2'), qty: 3 };
    const turned = planSheets({ sheet: a4, rotate: true, kits: 1, pieces: [strip] });
    expect(turned.errors).toEqual([]);
    expect(turned.placements.every((p) => p.rotated)).toBe(true);
    sound(turned, a4);
    const upright = planSheets({ sheet: a4, rotate: false, kits: 1, pieces: [strip] });
    expect(upright.placements).toEqual([]);
    expect(upright.errors[0]!.reason).toContain('(turning is off)');
  });

  it('mixes inch pieces on a millimetre sheet exactly', () => {
    const a4 = sheetSize('a4')!;
    const plan = planSheets({ sheet: a4, rotate: true, kits: 1, pieces: [{ name: 'card front', width: L('4 1/8'), height: L('5 3/8'), qty: 4 }] });
    sound(plan, a4);
    for (const p of plan.placements) {
      expect(toInches(p.x).add(toInches(p.width)).lte(toInches(a4.width))).toBe(true);
      expect(toInches(p.y).add(toInches(p.height)).lte(toInches(a4.height))).toBe(true);
    }
  });

  it('no pieces, no sheets', () => {
    const plan = planSheets({ sheet: twelve, rotate: true, kits: 0, pieces: [{ name: 'x', width: inches(1), height: inches(1), qty: 5 }] });
    expect(plan).toMatchObject({ sheets: 0, placements: [], waste: 0, areaLowerBound: 0, errors: [] });
  });

  it('refuses bad counts', () => {
    expect(() => planSheets({ sheet: twelve, rotate: true, kits: -1, pieces: [] })).toThrow(RangeError);
    expect(() => planSheets({ sheet: twelve, rotate: true, kits: 1, pieces: [{ name: 'x', width: inches(1), height: inches(1), qty: 1.5 }] })).toThrow(RangeError);
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
        expect(plan.placements).toHaveLength(wanted);
        expect(plan.errors).toEqual([]);
        if (!rotate) expect(plan.placements.some((p) => p.rotated)).toBe(false);
        sound(plan, twelve);
        // the lower bound itself: ceil(total area / sheet area)
        const area = ps.reduce((s, p) => s + p.w * p.h * p.qty * kits, 0);
        expect(plan.areaLowerBound).toBe(Math.ceil(area / (192 * 192)));
      }),
      { numRuns: 150 },
    );
  });
});
