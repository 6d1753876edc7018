import Fraction from 'fraction.js';
import { toInches, type Length } from '../measure/length';

/** A rectangle laid on a sheet; x and y measure from the sheet's top-left corner. */
export interface LaidRect {
  x: Length;
  y: Length;
  width: Length;
  height: Length;
}

/**
 * How a paper trimmer cuts a sheet into its pieces: each cut runs from edge
 * to edge of the part being cut. `at` is measured from the sheet's corner.
 */
export type CutTree = { kind: 'piece'; index: number } | { kind: 'waste' } | { kind: 'cut'; axis: 'x' | 'y'; at: Fraction; first: CutTree; second: CutTree };

interface R {
  x0: bigint;
  y0: bigint;
  x1: bigint;
  y1: bigint;
  index: number;
}

function lcm(a: bigint, b: bigint): bigint {
  let x = a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return (a / x) * b;
}

/** Puts exact lengths on one integer grid (inches times the common denominator). */
export function commonScale(values: readonly Fraction[]): bigint {
  let d = 1n;
  for (const v of values) d = lcm(d, v.d);
  return d;
}

export function scaled(v: Fraction, scale: bigint): bigint {
  const n = (v.n * scale) / v.d;
  return v.s < 0n ? -n : n;
}

function toGrid(rects: readonly LaidRect[], sheet: { width: Length; height: Length }) {
  const all: Fraction[] = [toInches(sheet.width), toInches(sheet.height)];
  for (const r of rects) all.push(toInches(r.x), toInches(r.y), toInches(r.width), toInches(r.height));
  const scale = commonScale(all);
  const g = (l: Length) => scaled(toInches(l), scale);
  const rs: R[] = rects.map((r, index) => {
    const x0 = g(r.x);
    const y0 = g(r.y);
    return { x0, y0, x1: x0 + g(r.width), y1: y0 + g(r.height), index };
  });
  return { rs, W: g(sheet.width), H: g(sheet.height), scale };
}

/**
 * A sequence of edge-to-edge cuts that frees every rectangle, or null when
 * none exists (the layout cannot be cut on a trimmer). Any full cut that
 * crosses no piece is safe to make first, so a greedy search is complete.
 */
export function guillotineCuts(rects: readonly LaidRect[], sheet: { width: Length; height: Length }): CutTree | null {
  const { rs, W, H, scale } = toGrid(rects, sheet);
  const solve = (items: R[], x0: bigint, y0: bigint, x1: bigint, y1: bigint): CutTree | null => {
    if (items.length === 0) return { kind: 'waste' };
    if (items.length === 1) {
      const r = items[0]!;
      if (r.x0 === x0 && r.y0 === y0 && r.x1 === x1 && r.y1 === y1) return { kind: 'piece', index: r.index };
    }
    for (const axis of ['x', 'y'] as const) {
      const lo = axis === 'x' ? x0 : y0;
      const hi = axis === 'x' ? x1 : y1;
      const cands = new Set<bigint>();
      for (const r of items) {
        const a = axis === 'x' ? r.x0 : r.y0;
        const b = axis === 'x' ? r.x1 : r.y1;
        if (a > lo && a < hi) cands.add(a);
        if (b > lo && b < hi) cands.add(b);
      }
      for (const c of cands) {
        let crosses = false;
        for (const r of items) {
          const a = axis === 'x' ? r.x0 : r.y0;
          const b = axis === 'x' ? r.x1 : r.y1;
          if (a < c && c < b) {
            crosses = true;
            break;
          }
        }
        if (crosses) continue;
        const before = items.filter((r) => (axis === 'x' ? r.x1 : r.y1) <= c);
        const after = items.filter((r) => (axis === 'x' ? r.x0 : r.y0) >= c);
        const first = axis === 'x' ? solve(before, x0, y0, c, y1) : solve(before, x0, y0, x1, c);
        if (!first) return null;
        const second = axis === 'x' ? solve(after, c, y0, x1, y1) : solve(after, x0, c, x1, y1);
        if (!second) return null;
        return { kind: 'cut', axis, at: new Fraction(c, scale), first, second };
      }
    }
    return null;
  };
  return solve(rs, 0n, 0n, W, H);
}

/** Problems with a layout: pieces off the sheet, overlapping, or not cuttable edge to edge. Empty when sound. */
export function layoutProblems(rects: readonly LaidRect[], sheet: { width: Length; height: Length }): string[] {
  const { rs, W, H } = toGrid(rects, sheet);
  const out: string[] = [];
  for (const r of rs) {
    if (r.x0 < 0n || r.y0 < 0n || r.x1 > W || r.y1 > H) out.push(`rectangle ${r.index} lies outside the sheet`);
    if (r.x1 <= r.x0 || r.y1 <= r.y0) out.push(`rectangle ${r.index} has no area`);
  }
  const byX = [...rs].sort((a, b) => (a.x0 < b.x0 ? -1 : a.x0 > b.x0 ? 1 : 0));
  for (let i = 0; i < byX.length; i++) {
    const a = byX[i]!;
    for (let j = i + 1; j < byX.length && byX[j]!.x0 < a.x1; j++) {
      const b = byX[j]!;
      if (a.y0 < b.y1 && b.y0 < a.y1) out.push(`rectangles ${a.index} and ${b.index} overlap`);
    }
  }
  if (out.length === 0 && guillotineCuts(rects, sheet) === null) out.push('the layout cannot be cut edge to edge');
  return out;
}
