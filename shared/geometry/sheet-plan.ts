/**
 * Sheet plan: pieces laid out on stock sheets so a paper trimmer can cut them.
 *
 * Why our own packer: the registry's rectangle packers are maxrects (layouts a
 * trimmer cannot always cut), grow a single bin instead of filling fixed sheets,
 * or have no rotation switch; none keeps exact lengths. This one is a guillotine
 * free-rectangle packer on an exact integer grid (inches times the common
 * denominator of every length), so no float error can let two pieces overlap.
 *
 * Bulk: copies of one piece are laid as blocks (a grid of `across` x `down`
 * copies cut with straight cuts), and the plan fills one sheet at a time and
 * repeats it while every piece on it still has copies to cut. So the work
 * grows with the number of distinct pieces, not with quantity x kits, and the
 * answer is a short list of sheet patterns: "7 sheets like this".
 */
import Fraction from 'fraction.js';
import { formatLength, toInches, type Length } from '../measure/length';
import type { Grain } from '../measure/piece';
import { allowedOrientations, type SheetGrain } from './grain';
import { commonScale, scaled } from './guillotine';

export interface PlanPiece {
  name: string;
  width: Length;
  height: Length;
  /** Pieces of this kind in one kit. */
  qty: number;
  /** Which way its grain must run (any by default): it then lies only the way that runs it with the sheet's. */
  grain?: Grain;
}

export interface PlanInput {
  sheet: { width: Length; height: Length };
  /** May pieces be turned 90 degrees (false for directional prints)? */
  rotate: boolean;
  /** Which side of the sheet its grain runs along; not known by default (grain-bound pieces then lie either way). */
  grain?: SheetGrain;
  /** Number of kits to cut (1 for a single project). */
  kits: number;
  /** Extra kits for mistakes (0 by default). */
  spares?: number;
  pieces: readonly PlanPiece[];
}

export interface PlanOptions {
  /**
   * Milliseconds for trying further piece orders and split rules. The first try always
   * finishes (it is sound on its own); past the budget the best plan so far is kept.
   */
  budgetMs?: number;
  /** The clock, in milliseconds (tests replace it). */
  now?: () => number;
}

/**
 * Copies of one piece laid side by side: `across` x `down` of them, the first with its
 * top-left corner at (x, y), each next one a piece's width (or height) further on.
 */
export interface PlanBlock {
  /** Index of the piece in the input list. */
  piece: number;
  name: string;
  x: Length;
  y: Length;
  /** One piece as laid (width and height swap when rotated). */
  width: Length;
  height: Length;
  rotated: boolean;
  across: number;
  down: number;
}

/** `count` identical sheets, numbered `first` to `first + count - 1` (from 0). */
export interface SheetPattern {
  first: number;
  count: number;
  /** Pieces on one of these sheets. */
  pieces: number;
  blocks: PlanBlock[];
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
  /** The sheets, identical ones grouped, in sheet order. */
  patterns: SheetPattern[];
  /** Pieces placed, over every sheet. */
  pieces: number;
  /** Share of the used sheets' area left over (0..1); 0 when no sheet is used. */
  waste: number;
  /** The same, exactly. */
  wasteExact: Fraction;
  /** No plan can use fewer sheets than ceil(total piece area / sheet area). */
  areaLowerBound: number;
  errors: PlanError[];
  /** False when the time budget stopped the search early (the plan is sound, maybe not the fewest sheets). */
  complete: boolean;
}

/** A distinct piece on the grid, with the copies still to place. */
interface Kind {
  id: number;
  piece: number;
  w: number;
  h: number;
  /** For ordering and scoring only: may be inexact past 2^53, which only changes a preference. */
  area: number;
  /** The ways it may lie: 0 upright, 1 turned a quarter. */
  ways: readonly (0 | 1)[];
}

interface Free {
  x: number;
  y: number;
  w: number;
  h: number;
}

interface RawBlock {
  kind: Kind;
  x: number;
  y: number;
  rotated: boolean;
  across: number;
  down: number;
}

interface RawPattern {
  count: number;
  blocks: RawBlock[];
  pieces: number;
  turned: number;
  largestFree: number;
}

interface Run {
  patterns: RawPattern[];
  sheets: number;
  turned: number;
}

type SplitRule = 'shorter-leftover' | 'longer-leftover' | 'max-area';

const ORDERS: readonly ((a: Kind, b: Kind) => number)[] = [
  (a, b) => b.area - a.area || longest(b) - longest(a),
  (a, b) => longest(b) - longest(a) || b.area - a.area,
  (a, b) => b.h - a.h || b.w - a.w,
  (a, b) => b.w - a.w || b.h - a.h,
  (a, b) => b.w + b.h - (a.w + a.h) || b.area - a.area,
];
const SPLITS: readonly SplitRule[] = ['shorter-leftover', 'longer-leftover', 'max-area'];

function longest(k: Kind): number {
  return k.w > k.h ? k.w : k.h;
}

/** floor(a / b) for whole numbers below 2^52, corrected where the float quotient rounds up. */
function fitCount(a: number, b: number): number {
  let q = Math.floor(a / b);
  if (q * b > a) q--;
  else if ((q + 1) * b <= a) q++;
  return q;
}

/**
 * The block shape for `n` copies in a free rectangle that holds `cols` x `rows` of them:
 * all of them when they fit, else whole rows or whole columns, whichever holds more.
 */
function blockShape(n: number, cols: number, rows: number, wide: boolean): [number, number] {
  if (n >= cols * rows) return [cols, rows];
  const rowAcross = Math.min(n, cols);
  const rowDown = Math.floor(n / rowAcross);
  const colDown = Math.min(n, rows);
  const colAcross = Math.floor(n / colDown);
  const byRows = rowAcross * rowDown;
  const byCols = colAcross * colDown;
  if (byRows !== byCols) return byRows > byCols ? [rowAcross, rowDown] : [colAcross, colDown];
  return wide ? [rowAcross, rowDown] : [colAcross, colDown];
}

/**
 * Fills one sheet (guillotine, best area fit): each block cuts its free rectangle in two
 * with one edge-to-edge cut, so the sheet can be cut on a trimmer. `left` is not changed.
 */
function fillSheet(kinds: readonly Kind[], left: readonly number[], W: number, H: number, split: SplitRule, upright: boolean) {
  const free: Free[] = [{ x: 0, y: 0, w: W, h: H }];
  const blocks: RawBlock[] = [];
  const used = new Map<Kind, number>();
  for (const k of kinds) {
    let rem = left[k.id]!;
    while (rem > 0) {
      let best: { f: number; rotated: boolean; across: number; down: number; score: number; tie: number } | null = null;
      for (let f = 0; f < free.length; f++) {
        const fr = free[f]!;
        for (const o of k.ways) {
          const w = o === 0 ? k.w : k.h;
          const h = o === 0 ? k.h : k.w;
          if (w > fr.w || h > fr.h) continue;
          const [across, down] = blockShape(rem, fitCount(fr.w, w), fitCount(fr.h, h), fr.w >= fr.h);
          // the area this free rectangle keeps unused once the block is in
          const score = fr.w * fr.h - across * down * k.area;
          const dw = fr.w - across * w;
          const dh = fr.h - down * h;
          const tie = dw < dh ? dw : dh;
          // with `upright`, a turn must earn its place by a tighter fit, not just break a tie
          const sameFree = best !== null && best.f === f;
          if (!best || score < best.score || (score === best.score && !(upright && sameFree) && tie < best.tie))
            best = { f, rotated: o === 1, across, down, score, tie };
        }
      }
      if (!best) break;
      const fr = free[best.f]!;
      const bw = best.across * (best.rotated ? k.h : k.w);
      const bh = best.down * (best.rotated ? k.w : k.h);
      blocks.push({ kind: k, x: fr.x, y: fr.y, rotated: best.rotated, across: best.across, down: best.down });
      const n = best.across * best.down;
      used.set(k, (used.get(k) ?? 0) + n);
      rem -= n;
      const dw = fr.w - bw;
      const dh = fr.h - bh;
      let horizontal: boolean;
      if (split === 'shorter-leftover') horizontal = dw <= dh;
      else if (split === 'longer-leftover') horizontal = dw > dh;
      else horizontal = fr.w * dh >= fr.h * dw; // keep the larger leftover whole
      const right: Free = { x: fr.x + bw, y: fr.y, w: dw, h: horizontal ? bh : fr.h };
      const below: Free = { x: fr.x, y: fr.y + bh, w: horizontal ? fr.w : bw, h: dh };
      free.splice(best.f, 1);
      if (right.w > 0 && right.h > 0) free.push(right);
      if (below.w > 0 && below.h > 0) free.push(below);
    }
  }
  let largestFree = 0;
  for (const f of free) if (f.w * f.h > largestFree) largestFree = f.w * f.h;
  return { blocks, used, largestFree };
}

/** Fills sheet after sheet, repeating each while every piece on it has copies left. */
function runVariant(kinds: readonly Kind[], counts: readonly number[], W: number, H: number, split: SplitRule, upright: boolean): Run {
  const left = [...counts];
  let remaining = left.reduce((s, n) => s + n, 0);
  const patterns: RawPattern[] = [];
  let sheets = 0;
  let turned = 0;
  while (remaining > 0) {
    const { blocks, used, largestFree } = fillSheet(kinds, left, W, H, split, upright);
    // every kind fits an empty sheet (checked before), so a sheet always takes something
    if (blocks.length === 0) throw new Error('sheet plan: a piece that fits the sheet was not placed');
    let count = Infinity;
    let pieces = 0;
    for (const [k, n] of used) {
      count = Math.min(count, Math.floor(left[k.id]! / n));
      pieces += n;
    }
    for (const [k, n] of used) left[k.id]! -= n * count;
    remaining -= pieces * count;
    const turnedHere = blocks.reduce((s, b) => s + (b.rotated ? b.across * b.down : 0), 0);
    patterns.push({ count, blocks, pieces, turned: turnedHere, largestFree });
    sheets += count;
    turned += turnedHere * count;
  }
  return { patterns, sheets, turned };
}

/** Fewer sheets first; then fewer turned pieces (easier to follow); then the larger leftover block on the last sheet. */
function better(a: Run, b: Run): boolean {
  if (a.sheets !== b.sheets) return a.sheets < b.sheets;
  if (a.turned !== b.turned) return a.turned < b.turned;
  return (a.patterns.at(-1)?.largestFree ?? 0) > (b.patterns.at(-1)?.largestFree ?? 0);
}

function checkCount(label: string, n: number): void {
  if (!Number.isSafeInteger(n) || n < 0) throw new RangeError(`${label} must be a whole number of 0 or more (got ${n})`);
}

// Coordinates stay below 2^51 so sums and block sizes are exact in floating point.
const GRID_LIMIT = 2n ** 51n;

/**
 * Lays every piece (qty x (kits + spares)) out on stock sheets so each sheet can be cut on
 * a paper trimmer, trying several piece orders and split rules (within the time budget) and
 * keeping the plan with the fewest sheets. A piece larger than the sheet is reported in
 * `errors`, never silently dropped.
 */
export function planSheets(input: PlanInput, options: PlanOptions = {}): SheetPlan {
  const now = options.now ?? (() => Date.now());
  const started = now();
  checkCount('kits', input.kits);
  checkCount('spares', input.spares ?? 0);
  const copies = input.kits + (input.spares ?? 0);
  const sheetW = toInches(input.sheet.width);
  const sheetH = toInches(input.sheet.height);
  const all: Fraction[] = [sheetW, sheetH];
  for (const p of input.pieces) {
    checkCount(`the quantity of "${p.name}"`, p.qty);
    all.push(toInches(p.width), toInches(p.height));
  }
  if (sheetW.compare(0) <= 0 || sheetH.compare(0) <= 0) throw new RangeError('the sheet must have a width and height above zero');
  // The exact grid (every length a whole number of steps) while it stays below the limit; else a
  // fine binary grid with pieces rounded up and the sheet down, which can only leave a sliver spare.
  let scale = commonScale(all);
  let exact = true;
  let largest = sheetW.compare(sheetH) >= 0 ? sheetW : sheetH;
  for (const v of all) if (v.abs().compare(largest) > 0) largest = v.abs();
  if (scaled(largest, scale) >= GRID_LIMIT) {
    exact = false;
    scale = 1n;
    while (scaled(largest, scale * 2n) < GRID_LIMIT) scale *= 2n;
  }
  const grid = (v: Fraction, up: boolean): number => {
    const g = v.mul(scale);
    const r = up ? g.ceil() : g.floor();
    return Number(r.n * r.s);
  };
  const W = grid(sheetW, false);
  const H = grid(sheetH, false);
  const sheetText = `${formatLength(input.sheet.width)} x ${formatLength(input.sheet.height)}`;

  const kinds: Kind[] = [];
  const counts: number[] = [];
  const errors: PlanError[] = [];
  let usedArea = new Fraction(0);
  input.pieces.forEach((p, index) => {
    const count = p.qty * copies;
    if (count === 0) return;
    const wx = toInches(p.width);
    const hx = toInches(p.height);
    const size = `${formatLength(p.width)} x ${formatLength(p.height)}`;
    if (wx.compare(0) <= 0 || hx.compare(0) <= 0) {
      errors.push({ piece: index, name: p.name, count, reason: `"${p.name}" (${size}) has no area` });
      return;
    }
    const fitsUpright = wx.compare(sheetW) <= 0 && hx.compare(sheetH) <= 0;
    const fitsTurned = input.rotate && hx.compare(sheetW) <= 0 && wx.compare(sheetH) <= 0;
    if (!fitsUpright && !fitsTurned) {
      const turn = input.rotate ? ', even turned' : ' (turning is off)';
      errors.push({ piece: index, name: p.name, count, reason: `"${p.name}" (${size}) is larger than the ${sheetText} sheet${turn}` });
      return;
    }
    // A grain-bound piece lies only the way that runs its grain with the sheet's.
    const grain = allowedOrientations({ width: p.width, height: p.height, grain: p.grain, name: p.name }, { rotate: input.rotate, grain: input.grain });
    const upright = fitsUpright && grain.upright;
    const turned = fitsTurned && grain.turned;
    if (!upright && !turned) {
      const reason = grain.reason ?? `"${p.name}" (${size}) fits the ${sheetText} sheet only across its grain; it needs its grain along its ${p.grain}`;
      errors.push({ piece: index, name: p.name, count, reason });
      return;
    }
    let w = grid(wx, true);
    let h = grid(hx, true);
    if (!exact) {
      // rounding up may push a piece that fits exactly past the rounded-down sheet edge
      if (upright) [w, h] = [Math.min(w, W), Math.min(h, H)];
      else [w, h] = [Math.min(w, H), Math.min(h, W)];
    }
    // A square turns only when its grain asks for it: turned, it lies the same.
    const ways: (0 | 1)[] = upright && turned ? (w === h ? [0] : [0, 1]) : upright ? [0] : [1];
    kinds.push({ id: kinds.length, piece: index, w, h, area: w * h, ways });
    counts.push(count);
    usedArea = usedArea.add(wx.mul(hx).mul(count));
  });

  let best: Run | null = null;
  let complete = true;
  search: for (const order of ORDERS) {
    const sorted = [...kinds].sort((a, b) => order(a, b) || a.piece - b.piece);
    for (const split of SPLITS) {
      for (const upright of [false, true]) {
        if (upright && !input.rotate) continue;
        if (best && options.budgetMs !== undefined && now() - started > options.budgetMs) {
          complete = false;
          break search;
        }
        const run = runVariant(sorted, counts, W, H, split, upright);
        if (!best || better(run, best)) best = run;
      }
    }
  }

  const toLen = (v: number): Length => ({ value: new Fraction(BigInt(v), scale), unit: 'in' });
  const patterns: SheetPattern[] = [];
  let first = 0;
  for (const raw of best?.patterns ?? []) {
    const blocks = raw.blocks
      .map((b): PlanBlock => {
        const src = input.pieces[b.kind.piece]!;
        return {
          piece: b.kind.piece,
          name: src.name,
          x: toLen(b.x),
          y: toLen(b.y),
          width: b.rotated ? src.height : src.width,
          height: b.rotated ? src.width : src.height,
          rotated: b.rotated,
          across: b.across,
          down: b.down,
        };
      })
      .sort((a, b) => toInches(a.y).compare(toInches(b.y)) || toInches(a.x).compare(toInches(b.x)));
    patterns.push({ first, count: raw.count, pieces: raw.pieces, blocks });
    first += raw.count;
  }
  const sheets = best?.sheets ?? 0;
  const sheetArea = sheetW.mul(sheetH);
  const wasteExact = sheets === 0 ? new Fraction(0) : new Fraction(1).sub(usedArea.div(sheetArea.mul(sheets)));
  const areaLowerBound = Number(usedArea.div(sheetArea).ceil().n);
  const pieces = patterns.reduce((s, p) => s + p.count * p.pieces, 0);
  return { sheets, patterns, pieces, waste: wasteExact.valueOf(), wasteExact, areaLowerBound, errors, complete };
}

/**
 * Every piece on every sheet, one entry a copy, sorted by sheet, then top to bottom and left
 * to right. For drawing templates and checking plans; `limit` guards against expanding a
 * large plan by mistake.
 */
export function placementsOf(plan: Pick<SheetPlan, 'patterns' | 'pieces'>, limit = 100_000): Placement[] {
  if (plan.pieces > limit) throw new RangeError(`the plan has ${plan.pieces} pieces, more than ${limit} to list one by one`);
  const out: Placement[] = [];
  for (const pattern of plan.patterns) {
    const cells: Omit<Placement, 'sheet'>[] = [];
    for (const b of pattern.blocks) {
      const x0 = toInches(b.x);
      const y0 = toInches(b.y);
      const w = toInches(b.width);
      const h = toInches(b.height);
      for (let j = 0; j < b.down; j++) {
        for (let i = 0; i < b.across; i++) {
          cells.push({
            name: b.name,
            piece: b.piece,
            x: { value: x0.add(w.mul(i)), unit: 'in' },
            y: { value: y0.add(h.mul(j)), unit: 'in' },
            width: b.width,
            height: b.height,
            rotated: b.rotated,
          });
        }
      }
    }
    cells.sort((a, b) => a.y.value.compare(b.y.value) || a.x.value.compare(b.x.value));
    for (let s = 0; s < pattern.count; s++) for (const c of cells) out.push({ sheet: pattern.first + s, ...c });
  }
  return out;
}
