/**
 * Sheet plan: pieces laid out on stock sheets so a paper trimmer can cut them.
 *
 * Why our own packer: the registry's rectangle packers are maxrects (layouts a
 * trimmer cannot always cut), grow a single bin instead of filling fixed sheets,
 * or have no rotation switch; none keeps exact lengths. This one is a guillotine
 * free-rectangle packer on an exact integer grid (inches times the common
 * denominator of every length), so no float error can let two pieces overlap.
 */
import Fraction from 'fraction.js';
import { formatLength, toInches, type Length } from '../measure/length';
import { commonScale, scaled } from './guillotine';

export interface PlanPiece {
  name: string;
  width: Length;
  height: Length;
  /** Pieces of this kind in one kit. */
  qty: number;
}

export interface PlanInput {
  sheet: { width: Length; height: Length };
  /** May pieces be turned 90 degrees (false for directional prints)? */
  rotate: boolean;
  /** Number of kits to cut (1 for a single project). */
  kits: number;
  /** Extra kits for mistakes (0 by default). */
  spares?: number;
  pieces: readonly PlanPiece[];
}

/** One piece on a sheet. x and y measure from the sheet's top-left corner, in inches. */
export interface Placement {
  /** Sheet number, from 0. */
  sheet: number;
  name: string;
  /** Index of the piece in the input list. */
  piece: number;
  x: Length;
  y: Length;
  /** Size as laid (width and height swap when rotated). */
  width: Length;
  height: Length;
  rotated: boolean;
}

/** A piece the plan could not place, with why. */
export interface PlanError {
  piece: number;
  name: string;
  /** How many copies were left out. */
  count: number;
  reason: string;
}

export interface SheetPlan {
  sheets: number;
  placements: Placement[];
  /** Share of the used sheets' area left over (0..1); 0 when no sheet is used. */
  waste: number;
  /** The same, exactly. */
  wasteExact: Fraction;
  /** No plan can use fewer sheets than ceil(total piece area / sheet area). */
  areaLowerBound: number;
  errors: PlanError[];
}

interface Item {
  piece: number;
  w: bigint;
  h: bigint;
  area: bigint;
}

interface Free {
  x: bigint;
  y: bigint;
  w: bigint;
  h: bigint;
}

interface Placed {
  item: Item;
  bin: number;
  x: bigint;
  y: bigint;
  rotated: boolean;
}

type SplitRule = 'shorter-leftover' | 'longer-leftover' | 'max-area';

const ORDERS: readonly ((a: Item, b: Item) => number)[] = [
  (a, b) => cmp(b.area, a.area) || cmp(max(b), max(a)),
  (a, b) => cmp(max(b), max(a)) || cmp(b.area, a.area),
  (a, b) => cmp(b.h, a.h) || cmp(b.w, a.w),
  (a, b) => cmp(b.w, a.w) || cmp(b.h, a.h),
  (a, b) => cmp(b.w + b.h, a.w + a.h) || cmp(b.area, a.area),
];
const SPLITS: readonly SplitRule[] = ['shorter-leftover', 'longer-leftover', 'max-area'];

function cmp(a: bigint, b: bigint): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function max(i: Item): bigint {
  return i.w > i.h ? i.w : i.h;
}

/**
 * Guillotine packing (free rectangles, best area fit): each placement cuts
 * its free rectangle in two with one edge-to-edge cut, so every sheet can
 * be cut on a paper trimmer.
 */
function pack(items: readonly Item[], W: bigint, H: bigint, rotate: boolean, split: SplitRule, upright: boolean): { placed: Placed[]; bins: Free[][] } {
  const bins: Free[][] = [];
  const placed: Placed[] = [];
  for (const item of items) {
    let best: { bin: number; f: number; rotated: boolean; score: bigint; tie: bigint } | null = null;
    for (let b = 0; b < bins.length; b++) {
      const free = bins[b]!;
      for (let f = 0; f < free.length; f++) {
        const fr = free[f]!;
        for (let o = 0; o < (rotate && item.w !== item.h ? 2 : 1); o++) {
          const w = o === 0 ? item.w : item.h;
          const h = o === 0 ? item.h : item.w;
          if (w > fr.w || h > fr.h) continue;
          const score = fr.w * fr.h - item.area;
          const dw = fr.w - w;
          const dh = fr.h - h;
          const tie = dw < dh ? dw : dh;
          // with `upright`, a turn must earn its place by a tighter fit, not just break a tie
          const sameFree = best !== null && best.bin === b && best.f === f;
          if (!best || score < best.score || (score === best.score && !(upright && sameFree) && tie < best.tie)) best = { bin: b, f, rotated: o === 1, score, tie };
        }
      }
    }
    if (!best) {
      const fitsUpright = item.w <= W && item.h <= H;
      bins.push([{ x: 0n, y: 0n, w: W, h: H }]);
      best = { bin: bins.length - 1, f: 0, rotated: !fitsUpright, score: 0n, tie: 0n };
    }
    const free = bins[best.bin]!;
    const fr = free[best.f]!;
    const w = best.rotated ? item.h : item.w;
    const h = best.rotated ? item.w : item.h;
    placed.push({ item, bin: best.bin, x: fr.x, y: fr.y, rotated: best.rotated });
    const dw = fr.w - w;
    const dh = fr.h - h;
    let horizontal: boolean;
    if (split === 'shorter-leftover') horizontal = dw <= dh;
    else if (split === 'longer-leftover') horizontal = dw > dh;
    else horizontal = fr.w * dh >= fr.h * dw; // keep the larger leftover whole
    const right: Free = { x: fr.x + w, y: fr.y, w: dw, h: horizontal ? h : fr.h };
    const below: Free = { x: fr.x, y: fr.y + h, w: horizontal ? fr.w : w, h: dh };
    free.splice(best.f, 1);
    if (right.w > 0n && right.h > 0n) free.push(right);
    if (below.w > 0n && below.h > 0n) free.push(below);
  }
  return { placed, bins };
}

function largestFree(bins: Free[][]): bigint {
  const last = bins[bins.length - 1];
  if (!last) return 0n;
  let m = 0n;
  for (const f of last) if (f.w * f.h > m) m = f.w * f.h;
  return m;
}

/** Fewer sheets first; then fewer turned pieces (easier to follow); then the larger leftover block on the last sheet. */
function better(a: { placed: Placed[]; bins: Free[][] }, b: { placed: Placed[]; bins: Free[][] }): boolean {
  if (a.bins.length !== b.bins.length) return a.bins.length < b.bins.length;
  const turned = (r: { placed: Placed[] }) => r.placed.reduce((n, p) => n + (p.rotated ? 1 : 0), 0);
  const ta = turned(a);
  const tb = turned(b);
  if (ta !== tb) return ta < tb;
  return largestFree(a.bins) > largestFree(b.bins);
}

function checkCount(label: string, n: number): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${label} must be a whole number of 0 or more (got ${n})`);
}

/**
 * Lays every piece (qty x (kits + spares)) out on stock sheets so each
 * sheet can be cut on a paper trimmer, trying several piece orders and
 * split rules and keeping the plan with the fewest sheets. A piece larger
 * than the sheet is reported in `errors`, never silently dropped.
 */
export function planSheets(input: PlanInput): SheetPlan {
  checkCount('kits', input.kits);
  checkCount('spares', input.spares ?? 0);
  const copies = input.kits + (input.spares ?? 0);
  const all: Fraction[] = [toInches(input.sheet.width), toInches(input.sheet.height)];
  for (const p of input.pieces) {
    checkCount(`the quantity of "${p.name}"`, p.qty);
    all.push(toInches(p.width), toInches(p.height));
  }
  const scale = commonScale(all);
  const W = scaled(toInches(input.sheet.width), scale);
  const H = scaled(toInches(input.sheet.height), scale);
  if (W <= 0n || H <= 0n) throw new RangeError('the sheet must have a width and height above zero');
  const sheetText = `${formatLength(input.sheet.width)} x ${formatLength(input.sheet.height)}`;

  const items: Item[] = [];
  const errors: PlanError[] = [];
  input.pieces.forEach((p, index) => {
    const count = p.qty * copies;
    if (count === 0) return;
    const w = scaled(toInches(p.width), scale);
    const h = scaled(toInches(p.height), scale);
    const size = `${formatLength(p.width)} x ${formatLength(p.height)}`;
    if (w <= 0n || h <= 0n) {
      errors.push({ piece: index, name: p.name, count, reason: `"${p.name}" (${size}) has no area` });
      return;
    }
    const fits = (w <= W && h <= H) || (input.rotate && h <= W && w <= H);
    if (!fits) {
      const turn = input.rotate ? ', even turned' : ' (turning is off)';
      errors.push({ piece: index, name: p.name, count, reason: `"${p.name}" (${size}) is larger than the ${sheetText} sheet${turn}` });
      return;
    }
    for (let k = 0; k < count; k++) items.push({ piece: index, w, h, area: w * h });
  });

  let best: { placed: Placed[]; bins: Free[][] } | null = null;
  for (const order of ORDERS) {
    const sorted = [...items].sort((a, b) => order(a, b) || a.piece - b.piece);
    for (const split of SPLITS) {
      for (const upright of [false, true]) {
        if (upright && !input.rotate) continue;
        const run = pack(sorted, W, H, input.rotate, split, upright);
        if (!best || better(run, best)) best = run;
      }
    }
  }
  const placedRuns = best?.placed ?? [];
  const sheets = best?.bins.length ?? 0;
  const toLen = (v: bigint): Length => ({ value: new Fraction(v, scale), unit: 'in' });
  const placements: Placement[] = placedRuns
    .map((pl) => {
      const src = input.pieces[pl.item.piece]!;
      return {
        sheet: pl.bin,
        name: src.name,
        piece: pl.item.piece,
        x: toLen(pl.x),
        y: toLen(pl.y),
        width: pl.rotated ? src.height : src.width,
        height: pl.rotated ? src.width : src.height,
        rotated: pl.rotated,
        key: [pl.bin, pl.y, pl.x] as const,
      };
    })
    .sort((a, b) => a.key[0] - b.key[0] || cmp(a.key[1], b.key[1]) || cmp(a.key[2], b.key[2]))
    .map(({ key: _key, ...rest }) => rest);

  const used = items.reduce((s, it) => s + it.area, 0n);
  const sheetArea = W * H;
  const wasteExact = sheets === 0 ? new Fraction(0) : new Fraction(BigInt(sheets) * sheetArea - used, BigInt(sheets) * sheetArea);
  const areaLowerBound = Number((used + sheetArea - 1n) / sheetArea);
  return { sheets, placements, waste: wasteExact.valueOf(), wasteExact, areaLowerBound, errors };
}
