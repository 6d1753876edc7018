/**
 * The outline of every piece shape, from its exact sizes: what the template draws to cut along,
 * the curved score lines of a pillow box, a tag's hole, the centre a compass goes in, and the
 * bounding box the sheet plan lays out. Sizes come in exact; the outline is in float inches from
 * the piece's top-left corner (for drawing only), with circular and elliptical arcs kept as arcs.
 */
import type Fraction from 'fraction.js';
import { addLengths, compareLengths, formatLength, inches, parseStoredLength, scaleLength, subtractLengths, toInches, type Length } from '../measure/length';
import type { Piece, PieceShape, ShapeParams } from '../measure/piece';

/** A path command in inches, y pointing down. An arc keeps its centre and its angles (radians, y down). */
export type PathCmd =
  | { op: 'M'; x: number; y: number }
  | { op: 'L'; x: number; y: number }
  | { op: 'A'; cx: number; cy: number; rx: number; ry: number; start: number; end: number; x: number; y: number }
  | { op: 'Z' };

type ArcCmd = Extract<PathCmd, { op: 'A' }>;

/** A piece's drawing, relative to the top-left corner of its bounding box. */
export interface ShapeOutline {
  /** Bounding box as cut, in inches. */
  width: number;
  height: number;
  /** The cut line, one closed path. */
  cut: PathCmd[];
  /** Score lines the shape itself brings (a pillow box's folds and curves), each an open path. */
  scores: PathCmd[][];
  /** Holes to punch or cut (a tag's). */
  holes: { cx: number; cy: number; r: number }[];
  /** Where a compass point or circle cutter goes, for round shapes. */
  centre: { x: number; y: number } | null;
  /** Length of the cut edge in inches (for trim or ribbon round it). */
  perimeter: number;
  /** Glue flaps the shape brings, as closed paths to shade. */
  flaps: PathCmd[][];
}

/** A shape's sizes as stored or sent as JSON: lengths in their exact stored form ("1/4 in"). */
export type StoredShapeParams = {
  [K in keyof ShapeParams]?: ShapeParams[K] extends Length | undefined ? string : ShapeParams[K];
};

export const LENGTH_PARAMS = ['cornerRadius', 'scallopSize', 'tagCorner', 'holeDiameter', 'holeFromTop', 'depth', 'glueFlap'] as const;

/** Which of a shape's sizes are lengths (stored exactly as text). */
export function isLengthParam(key: string): key is (typeof LENGTH_PARAMS)[number] {
  return (LENGTH_PARAMS as readonly string[]).includes(key);
}

/** The engine's shape sizes from their stored form; anything unreadable is left out for the checks to miss, never thrown. */
export function readShapeParams(stored: StoredShapeParams | null | undefined): ShapeParams {
  const out: ShapeParams = {};
  for (const k of LENGTH_PARAMS) {
    const v = stored?.[k];
    if (typeof v === 'string') out[k] = parseStoredLength(v);
  }
  if (typeof stored?.scallopCount === 'number') out.scallopCount = stored.scallopCount;
  if (stored?.tagTop === 'clipped' || stored?.tagTop === 'rounded') out.tagTop = stored.tagTop;
  return out;
}

/** A problem with a shape's sizes, in words. */
export interface ShapeProblem {
  field: string;
  severity: 'error' | 'warning';
  reason: string;
}

// Defaults, each a common size a crafter would reach for.
/** A scallop as wide as a 1/2 in border punch (common practice). */
export const DEFAULT_SCALLOP: Length = inches([1, 2]);
/** A #5 shipping tag's clipped corner runs about 3/8 in along each edge (from memory). */
export const DEFAULT_TAG_CORNER: Length = inches([3, 8]);
/** A tag's hole: 1/4 in, its centre 1/2 in below the top (from memory). */
export const DEFAULT_HOLE: Length = inches([1, 4]);
export const DEFAULT_HOLE_FROM_TOP: Length = inches([1, 2]);
/** Glue flaps are commonly 1/2 in (common practice). */
export const DEFAULT_GLUE_FLAP: Length = inches([1, 2]);
/** Keep a hole this far from any edge so it does not tear out (common practice). */
export const HOLE_EDGE_MARGIN: Length = inches([1, 8]);

const num = (l: Length) => toInches(l).valueOf();
const TAU = 2 * Math.PI;

function isPositive(l: Length | undefined): l is Length {
  return l !== undefined && l.value.s > 0n && l.value.n > 0n;
}

/**
 * An ellipse's perimeter by Ramanujan's second approximation (1914):
 * pi (a + b) (1 + 3h / (10 + sqrt(4 - 3h))), h = ((a - b) / (a + b))^2, with a and b the semi-axes.
 * Its error is below 1e-9 of the perimeter for ovals a crafter cuts.
 */
export function ellipsePerimeter(a: number, b: number): number {
  if (a + b === 0) return 0;
  const h = ((a - b) / (a + b)) ** 2;
  return Math.PI * (a + b) * (1 + (3 * h) / (10 + Math.sqrt(4 - 3 * h)));
}

/** An arc around (cx, cy) from angle `start` to `end` (end > start runs clockwise on the page). */
function arc(cx: number, cy: number, rx: number, ry: number, start: number, end: number): ArcCmd {
  return { op: 'A', cx, cy, rx, ry, start, end, x: cx + rx * Math.cos(end), y: cy + ry * Math.sin(end) };
}

/** The clockwise arc (on the page) of a circle from point p to point q. */
function clockwiseArc(cx: number, cy: number, r: number, p: { x: number; y: number }, q: { x: number; y: number }): ArcCmd {
  const a = Math.atan2(p.y - cy, p.x - cx);
  let b = Math.atan2(q.y - cy, q.x - cx);
  while (b <= a + 1e-12) b += TAU;
  const cmd = arc(cx, cy, r, r, a, b);
  // End exactly on the point given, so consecutive arcs join without a float seam.
  return { ...cmd, x: q.x, y: q.y };
}

/** The arc of a circle from p to q that passes through `via`. */
function arcThrough(cx: number, cy: number, r: number, p: { x: number; y: number }, q: { x: number; y: number }, via: { x: number; y: number }): ArcCmd {
  const norm = (t: number, from: number) => {
    let x = t;
    while (x < from) x += TAU;
    while (x >= from + TAU) x -= TAU;
    return x;
  };
  const a = Math.atan2(p.y - cy, p.x - cx);
  const b = norm(Math.atan2(q.y - cy, q.x - cx), a);
  const v = norm(Math.atan2(via.y - cy, via.x - cx), a);
  const cmd = v <= b ? arc(cx, cy, r, r, a, b) : arc(cx, cy, r, r, a, b - TAU);
  return { ...cmd, x: q.x, y: q.y };
}

function rectPath(w: number, h: number): PathCmd[] {
  return [{ op: 'M', x: 0, y: 0 }, { op: 'L', x: w, y: 0 }, { op: 'L', x: w, y: h }, { op: 'L', x: 0, y: h }, { op: 'Z' }];
}

function ellipsePath(w: number, h: number): PathCmd[] {
  const rx = w / 2;
  const ry = h / 2;
  // Two half-arcs from the left point, over the top, round the bottom.
  return [{ op: 'M', x: 0, y: ry }, arc(rx, ry, rx, ry, Math.PI, TAU), arc(rx, ry, rx, ry, 0, Math.PI), { op: 'Z' }];
}

/**
 * At most this many scallops all round: a 10 m square with 1/2 in scallops has about 3,150, so
 * any real piece fits; a tiny scallop size on a large piece would otherwise build millions.
 */
export const MAX_SCALLOPS = 4000;
const tooManyScallops = (n: number) =>
  `that makes ${Number.isFinite(n) ? n.toLocaleString('en-US') : 'too many'} scallops (at most ${MAX_SCALLOPS.toLocaleString('en-US')}); choose larger scallops`;

/** How the scallops of a scalloped rectangle sit: one radius, even spacing along each side. */
export interface RectScallops {
  /** Scallop radius, exact. */
  radius: Fraction;
  /** Gaps between scallop centres along the top (and bottom) and along the sides. */
  across: number;
  down: number;
  spacingAcross: Fraction;
  spacingDown: Fraction;
  /** Scallops all round. */
  count: number;
}

/**
 * Scallops for a rectangle: with a size, that size is kept and each side gets the fewest scallops
 * whose centres are no further apart than one scallop (so the edge stays scalloped, never straight);
 * with a count along the top, the scallops are sized to touch exactly across the width.
 */
export function rectScallops(width: Length, height: Length, params: ShapeParams): RectScallops {
  const W = toInches(width);
  const H = toInches(height);
  const ceil = (f: Fraction) => Number(f.ceil().n) * (f.s < 0n ? -1 : 1);
  let radius: Fraction;
  let across: number;
  if (params.scallopCount !== undefined) {
    const n = params.scallopCount;
    if (!Number.isInteger(n) || n < 2) throw new RangeError('a scalloped rectangle needs at least 2 scallops along the top');
    radius = W.div(2 * n);
    across = n - 1;
  } else {
    const size = toInches(params.scallopSize ?? DEFAULT_SCALLOP);
    if (size.s < 0n || size.n === 0n) throw new RangeError('the scallop size must be above zero');
    radius = size.div(2);
    if (W.sub(size).compare(0) <= 0) throw new RangeError(`the scallops (${formatLength(params.scallopSize ?? DEFAULT_SCALLOP)}) are too large for the width`);
    across = Math.max(1, ceil(W.sub(size).div(size)));
  }
  const d = radius.mul(2);
  if (H.sub(d).compare(0) <= 0) throw new RangeError('the scallops are too large for the height');
  const down = Math.max(1, ceil(H.sub(d).div(d)));
  if (2 * (across + down) > MAX_SCALLOPS) throw new RangeError(tooManyScallops(2 * (across + down)));
  return {
    radius,
    across,
    down,
    spacingAcross: W.sub(d).div(across),
    spacingDown: H.sub(d).div(down),
    count: 2 * (across + down),
  };
}

/** How the scallops of a scalloped circle sit. */
export interface CircleScallops {
  /** Scallop radius (float: a count fixes it through a sine). */
  radius: number;
  count: number;
}

/**
 * Scallops round a circle of diameter D, their centres on a circle of radius R - r: with a size,
 * the fewest whose centres are no further apart than one scallop (chord 2(R - r) sin(pi/n) <= 2r);
 * with a count, the radius that makes them touch exactly, r = R sin(pi/n) / (1 + sin(pi/n)).
 */
export function circleScallops(diameter: Length, params: ShapeParams): CircleScallops {
  const R = num(diameter) / 2;
  if (params.scallopCount !== undefined) {
    const n = params.scallopCount;
    if (!Number.isInteger(n) || n < 3) throw new RangeError('a scalloped circle needs at least 3 scallops');
    const s = Math.sin(Math.PI / n);
    return { radius: (R * s) / (1 + s), count: n };
  }
  const r = num(params.scallopSize ?? DEFAULT_SCALLOP) / 2;
  if (!(r > 0)) throw new RangeError('the scallop size must be above zero');
  if (r > R / 3)
    throw new RangeError(
      `the scallops (${formatLength(params.scallopSize ?? DEFAULT_SCALLOP)}) are too large for the circle: keep them to a third of its diameter`,
    );
  // The smallest n with sin(pi/n) <= r / (R - r); the guard keeps an exact fit from rounding up.
  const count = Math.max(3, Math.ceil(Math.PI / Math.asin(r / (R - r)) - 1e-9));
  if (!(count <= MAX_SCALLOPS)) throw new RangeError(tooManyScallops(count));
  return { radius: r, count };
}

/** The outer envelope of equal circles in a closed clockwise chain, each overlapping the next. */
function scallopChain(centres: { x: number; y: number }[], r: number, outward: (i: number) => { x: number; y: number }): PathCmd[] {
  const n = centres.length;
  const meet: { x: number; y: number }[] = [];
  for (let i = 0; i < n; i++) {
    const p = centres[i]!;
    const q = centres[(i + 1) % n]!;
    const c = Math.hypot(q.x - p.x, q.y - p.y);
    const depth = Math.sqrt(Math.max(0, r * r - (c * c) / 4));
    const o = outward(i);
    meet.push({ x: (p.x + q.x) / 2 + o.x * depth, y: (p.y + q.y) / 2 + o.y * depth });
  }
  const cmds: PathCmd[] = [{ op: 'M', ...meet[n - 1]! }];
  for (let i = 0; i < n; i++) cmds.push(clockwiseArc(centres[i]!.x, centres[i]!.y, r, meet[(i + n - 1) % n]!, meet[i]!));
  cmds.push({ op: 'Z' });
  return cmds;
}

function scallopedRectPath(width: Length, height: Length, params: ShapeParams): PathCmd[] {
  const s = rectScallops(width, height, params);
  const r = s.radius.valueOf();
  const W = num(width);
  const H = num(height);
  const sa = s.spacingAcross.valueOf();
  const sd = s.spacingDown.valueOf();
  const centres: { x: number; y: number }[] = [];
  // Clockwise from the top-left corner; corners are shared by their two sides.
  for (let k = 0; k < s.across; k++) centres.push({ x: r + k * sa, y: r });
  for (let k = 0; k < s.down; k++) centres.push({ x: W - r, y: r + k * sd });
  for (let k = 0; k < s.across; k++) centres.push({ x: W - r - k * sa, y: H - r });
  for (let k = 0; k < s.down; k++) centres.push({ x: r, y: H - r - k * sd });
  // The outward side of the gap between centre i and i + 1: left of the travel direction, turned out.
  return scallopChain(centres, r, (i) => {
    const p = centres[i]!;
    const q = centres[(i + 1) % centres.length]!;
    const len = Math.hypot(q.x - p.x, q.y - p.y);
    return { x: (q.y - p.y) / len, y: -(q.x - p.x) / len };
  });
}

function scallopedCirclePath(diameter: Length, params: ShapeParams): PathCmd[] {
  const { radius: r, count: n } = circleScallops(diameter, params);
  const R = num(diameter) / 2;
  const centres: { x: number; y: number }[] = [];
  for (let k = 0; k < n; k++) {
    const t = -Math.PI / 2 + (TAU * k) / n;
    centres.push({ x: R + (R - r) * Math.cos(t), y: R + (R - r) * Math.sin(t) });
  }
  return scallopChain(centres, r, (i) => {
    const t = -Math.PI / 2 + (TAU * (i + 0.5)) / n;
    return { x: Math.cos(t), y: Math.sin(t) };
  });
}

function roundedRectPath(w: number, h: number, r: number): PathCmd[] {
  const q = Math.PI / 2;
  return [
    { op: 'M', x: r, y: 0 },
    { op: 'L', x: w - r, y: 0 },
    arc(w - r, r, r, r, -q, 0),
    { op: 'L', x: w, y: h - r },
    arc(w - r, h - r, r, r, 0, q),
    { op: 'L', x: r, y: h },
    arc(r, h - r, r, r, q, 2 * q),
    { op: 'L', x: 0, y: r },
    arc(r, r, r, r, 2 * q, 3 * q),
    { op: 'Z' },
  ];
}

function tagPath(w: number, h: number, params: ShapeParams): PathCmd[] {
  const c = num(params.tagCorner ?? DEFAULT_TAG_CORNER);
  const q = Math.PI / 2;
  if ((params.tagTop ?? 'clipped') === 'rounded')
    return [
      { op: 'M', x: c, y: 0 },
      { op: 'L', x: w - c, y: 0 },
      arc(w - c, c, c, c, -q, 0),
      { op: 'L', x: w, y: h },
      { op: 'L', x: 0, y: h },
      { op: 'L', x: 0, y: c },
      arc(c, c, c, c, 2 * q, 3 * q),
      { op: 'Z' },
    ];
  return [
    { op: 'M', x: c, y: 0 },
    { op: 'L', x: w - c, y: 0 },
    { op: 'L', x: w, y: c },
    { op: 'L', x: w, y: h },
    { op: 'L', x: 0, y: h },
    { op: 'L', x: 0, y: c },
    { op: 'Z' },
  ];
}

/** A pillow box's blank, worked out exactly. */
export interface PillowBlank {
  /** Flat blank: two panels and the glue flap across, the box's length plus a flap at each end down. */
  blankWidth: Length;
  blankHeight: Length;
  /** Each end flap bulges this far past the panel's end, and each curved score this far into the panel: half the depth. */
  sagitta: Length;
  /** Radius of the end curves: ((W/2)^2 + s^2) / (2s), exact. */
  radius: Fraction;
  glueFlap: Length;
}

/**
 * The flat blank of a pillow box W wide, L long and D deep: two W x L panels side by side and a
 * glue flap, each panel closed at both ends by a lens-shaped flap between a curved score and a
 * mirrored curved cut. The curves are circular arcs across the panel's width whose depth
 * (sagitta) is D/2: the end of each panel bows out by the same arc when the box is formed, so the
 * two panels stand D apart at the middle.
 */
export function pillowBlank(width: Length, length: Length, params: ShapeParams): PillowBlank {
  const depth = params.depth;
  if (!isPositive(depth)) throw new RangeError('a pillow box needs a depth above zero');
  const glueFlap = params.glueFlap ?? DEFAULT_GLUE_FLAP;
  if (compareLengths(depth, width) >= 0)
    throw new RangeError(
      `the depth (${formatLength(depth)}) must be less than the width (${formatLength(width)}): the end curves cannot bow further than a half circle`,
    );
  if (compareLengths(depth, length) >= 0)
    throw new RangeError(`the depth (${formatLength(depth)}) must be less than the length (${formatLength(length)}), or the end curves meet in the middle`);
  if (!isPositive(glueFlap)) throw new RangeError('the glue flap must be above zero');
  const s = scaleLength(depth, [1, 2]);
  const half = toInches(width).div(2);
  const sg = toInches(s);
  const radius = half.pow(2).add(sg.pow(2)).div(sg.mul(2));
  return {
    blankWidth: addLengths(scaleLength(width, 2), glueFlap),
    blankHeight: addLengths(length, depth),
    sagitta: s,
    radius,
    glueFlap,
  };
}

function pillowOutline(width: Length, length: Length, params: ShapeParams): Pick<ShapeOutline, 'cut' | 'scores' | 'flaps' | 'width' | 'height'> {
  const b = pillowBlank(width, length, params);
  const W = num(width);
  const L = num(length);
  const s = num(b.sagitta);
  const g = num(b.glueFlap);
  const R = b.radius.valueOf();
  const taper = Math.min(g, L / 4);
  const cut: PathCmd[] = [{ op: 'M', x: 0, y: s }];
  // Top edge, left to right: each panel's end flap bulges up to the blank's top edge.
  for (const x0 of [0, W]) cut.push(arcThrough(x0 + W / 2, R, R, { x: x0, y: s }, { x: x0 + W, y: s }, { x: x0 + W / 2, y: 0 }));
  cut.push({ op: 'L', x: 2 * W + g, y: s + taper }, { op: 'L', x: 2 * W + g, y: s + L - taper }, { op: 'L', x: 2 * W, y: s + L });
  // Bottom edge, right to left.
  for (const x0 of [W, 0]) cut.push(arcThrough(x0 + W / 2, L + 2 * s - R, R, { x: x0 + W, y: s + L }, { x: x0, y: s + L }, { x: x0 + W / 2, y: L + 2 * s }));
  cut.push({ op: 'Z' });
  const scores: PathCmd[][] = [
    [
      { op: 'M', x: W, y: s },
      { op: 'L', x: W, y: s + L },
    ],
    [
      { op: 'M', x: 2 * W, y: s },
      { op: 'L', x: 2 * W, y: s + L },
    ],
  ];
  for (const x0 of [0, W]) {
    // The curved scores mirror the cut curves across the panel's end, bowing into the panel.
    scores.push([{ op: 'M', x: x0, y: s }, arcThrough(x0 + W / 2, 2 * s - R, R, { x: x0, y: s }, { x: x0 + W, y: s }, { x: x0 + W / 2, y: 2 * s })]);
    scores.push([{ op: 'M', x: x0, y: s + L }, arcThrough(x0 + W / 2, L + R, R, { x: x0, y: s + L }, { x: x0 + W, y: s + L }, { x: x0 + W / 2, y: L })]);
  }
  const flap: PathCmd[] = [
    { op: 'M', x: 2 * W, y: s },
    { op: 'L', x: 2 * W + g, y: s + taper },
    { op: 'L', x: 2 * W + g, y: s + L - taper },
    { op: 'L', x: 2 * W, y: s + L },
    { op: 'Z' },
  ];
  return { cut, scores, flaps: [flap], width: num(b.blankWidth), height: num(b.blankHeight) };
}

/** The bounding box of the piece as cut flat: its width and height, or a pillow box's blank. */
export function pieceExtent(p: Pick<Piece, 'shape' | 'width' | 'height' | 'params'>): { width: Length; height: Length } {
  if (p.shape === 'circle' || p.shape === 'scalloped-circle') return { width: p.width, height: p.width };
  if (p.shape === 'pillow-box' && isPositive(p.params?.depth)) {
    try {
      const b = pillowBlank(p.width, p.height, p.params ?? {});
      return { width: b.blankWidth, height: b.blankHeight };
    } catch {
      // A box whose sizes do not work is reported by the checks; lay out its panels meanwhile.
    }
  }
  return { width: p.width, height: p.height };
}

/** Length of a path: straight runs plus arcs (an elliptical arc by numeric integration). */
export function pathLength(cmds: readonly PathCmd[]): number {
  let total = 0;
  let x = 0;
  let y = 0;
  let sx = 0;
  let sy = 0;
  for (const c of cmds) {
    if (c.op === 'M') {
      x = sx = c.x;
      y = sy = c.y;
    } else if (c.op === 'L') {
      total += Math.hypot(c.x - x, c.y - y);
      x = c.x;
      y = c.y;
    } else if (c.op === 'A') {
      const span = Math.abs(c.end - c.start);
      if (Math.abs(c.rx - c.ry) < 1e-12) total += c.rx * span;
      else {
        // Simpson's rule on |d/dt (rx cos t, ry sin t)|, fine enough for any oval a crafter cuts.
        const n = 2000;
        const f = (t: number) => Math.hypot(c.rx * Math.sin(t), c.ry * Math.cos(t));
        const hstep = (c.end - c.start) / n;
        let sum = f(c.start) + f(c.end);
        for (let i = 1; i < n; i++) sum += f(c.start + i * hstep) * (i % 2 ? 4 : 2);
        total += Math.abs((hstep / 3) * sum);
      }
      x = c.x;
      y = c.y;
    } else {
      total += Math.hypot(sx - x, sy - y);
      x = sx;
      y = sy;
    }
  }
  return total;
}

/**
 * The outline of a piece: its cut line, the score lines and holes the shape brings, and its centre
 * when it is round. Throws RangeError when the sizes cannot make the shape (the checks say why).
 */
export function shapeOutline(p: Pick<Piece, 'shape' | 'width' | 'height' | 'params'>): ShapeOutline {
  const params = p.params ?? {};
  const w = num(p.width);
  const h = p.shape === 'circle' || p.shape === 'scalloped-circle' ? w : num(p.height);
  const base = {
    width: w,
    height: h,
    scores: [] as PathCmd[][],
    holes: [] as ShapeOutline['holes'],
    centre: null as ShapeOutline['centre'],
    flaps: [] as PathCmd[][],
  };
  let cut: PathCmd[];
  let perimeter: number;
  switch (p.shape) {
    case 'rect':
      cut = rectPath(w, h);
      perimeter = 2 * (w + h);
      break;
    case 'circle':
      cut = ellipsePath(w, w);
      perimeter = Math.PI * w;
      return { ...base, cut, perimeter, centre: { x: w / 2, y: w / 2 } };
    case 'oval':
      cut = ellipsePath(w, h);
      perimeter = ellipsePerimeter(w / 2, h / 2);
      return { ...base, cut, perimeter, centre: { x: w / 2, y: h / 2 } };
    case 'rounded-rect': {
      const r = num(params.cornerRadius ?? inches(0));
      cut = r > 0 ? roundedRectPath(w, h, r) : rectPath(w, h);
      perimeter = 2 * (w + h) - (8 - 2 * Math.PI) * r;
      break;
    }
    case 'scalloped-rect':
      cut = scallopedRectPath(p.width, p.height, params);
      perimeter = pathLength(cut);
      break;
    case 'scalloped-circle':
      cut = scallopedCirclePath(p.width, params);
      perimeter = pathLength(cut);
      return { ...base, cut, perimeter, centre: { x: w / 2, y: w / 2 } };
    case 'tag': {
      cut = tagPath(w, h, params);
      perimeter = pathLength(cut);
      const d = num(params.holeDiameter ?? DEFAULT_HOLE);
      const holes = d > 0 ? [{ cx: w / 2, cy: num(params.holeFromTop ?? DEFAULT_HOLE_FROM_TOP), r: d / 2 }] : [];
      return { ...base, cut, perimeter, holes };
    }
    case 'pillow-box': {
      const o = pillowOutline(p.width, p.height, params);
      return { ...base, ...o, perimeter: pathLength(o.cut) };
    }
  }
  return { ...base, cut, perimeter };
}

/** The problems with a shape's own sizes (its corner radius fits, its scallops fit, its hole clears the edges). */
export function shapeProblems(p: Pick<Piece, 'shape' | 'width' | 'height' | 'params'>): ShapeProblem[] {
  const params = p.params ?? {};
  const out: ShapeProblem[] = [];
  const short = compareLengths(p.width, p.height) <= 0 ? p.width : p.height;
  const guard = (field: string, run: () => unknown) => {
    try {
      run();
    } catch (e) {
      if (!(e instanceof RangeError)) throw e;
      out.push({ field, severity: 'error', reason: e.message.replace(/^./, (c) => c.toUpperCase()) });
    }
  };
  switch (p.shape) {
    case 'rounded-rect': {
      const r = params.cornerRadius;
      if (!isPositive(r)) out.push({ field: 'params.cornerRadius', severity: 'error', reason: 'A rounded rectangle needs a corner radius above zero' });
      else if (compareLengths(scaleLength(r, 2), short) > 0)
        out.push({
          field: 'params.cornerRadius',
          severity: 'error',
          reason: `The ${formatLength(r)} corner radius is more than half the ${formatLength(short)} side: at most ${formatLength(scaleLength(short, [1, 2]))}`,
        });
      break;
    }
    case 'scalloped-rect':
      guard(params.scallopCount !== undefined ? 'params.scallopCount' : 'params.scallopSize', () => rectScallops(p.width, p.height, params));
      break;
    case 'scalloped-circle':
      guard(params.scallopCount !== undefined ? 'params.scallopCount' : 'params.scallopSize', () => circleScallops(p.width, params));
      break;
    case 'tag': {
      const c = params.tagCorner ?? DEFAULT_TAG_CORNER;
      const halfW = scaleLength(p.width, [1, 2]);
      if (toInches(c).s < 0n) out.push({ field: 'params.tagCorner', severity: 'error', reason: 'The corner cannot be negative' });
      else if (compareLengths(c, halfW) > 0 || compareLengths(c, p.height) >= 0)
        out.push({
          field: 'params.tagCorner',
          severity: 'error',
          reason: `The ${formatLength(c)} corners do not fit the ${formatLength(p.width)} wide tag: at most ${formatLength(halfW)}`,
        });
      const d = params.holeDiameter ?? DEFAULT_HOLE;
      if (!isPositive(d)) break;
      const from = params.holeFromTop ?? DEFAULT_HOLE_FROM_TOP;
      const r = scaleLength(d, [1, 2]);
      const margin = HOLE_EDGE_MARGIN;
      const top = subtractLengths(from, r);
      const side = subtractLengths(halfW, r);
      const bottom = subtractLengths(subtractLengths(p.height, from), r);
      const least = [top, side, bottom].reduce((a, b) => (compareLengths(a, b) <= 0 ? a : b));
      if (toInches(least).s < 0n || toInches(least).n === 0n)
        out.push({
          field: 'params.holeFromTop',
          severity: 'error',
          reason: `The ${formatLength(d)} hole ${formatLength(from)} from the top does not fit inside the tag`,
        });
      else if (compareLengths(least, margin) < 0)
        out.push({
          field: 'params.holeFromTop',
          severity: 'warning',
          reason: `The hole's edge is only ${formatLength(least)} from the edge of the tag; keep at least ${formatLength(margin)} so it does not tear out`,
        });
      else if ((params.tagTop ?? 'clipped') === 'clipped') {
        // Distance from the hole's centre (W/2, f) to the clip line x + y = c, against the hole's radius plus the margin.
        const dist = toInches(halfW).add(toInches(from)).sub(toInches(c)).valueOf() / Math.SQRT2;
        if (dist < num(r) + num(margin))
          out.push({
            field: 'params.holeFromTop',
            severity: 'warning',
            reason: `The hole comes within ${formatLength(margin)} of the clipped corners; move it down`,
          });
      }
      break;
    }
    case 'pillow-box':
      guard('params.depth', () => pillowBlank(p.width, p.height, params));
      break;
    default:
      break;
  }
  return out;
}

/** The shape's length params, for ruler checks: [field, label, length]. */
export function shapeLengths(p: Pick<Piece, 'shape' | 'params'>): [string, string, Length][] {
  const params = p.params ?? {};
  const out: [string, string, Length][] = [];
  const add = (field: keyof ShapeParams, label: string) => {
    const v = params[field];
    if (v && typeof v === 'object') out.push([`params.${field}`, label, v]);
  };
  if (p.shape === 'rounded-rect') add('cornerRadius', 'Corner radius');
  if ((p.shape === 'scalloped-rect' || p.shape === 'scalloped-circle') && params.scallopCount === undefined) add('scallopSize', 'Scallop size');
  if (p.shape === 'tag') {
    add('tagCorner', 'Corner');
    add('holeDiameter', 'Hole');
    add('holeFromTop', 'Hole from the top');
  }
  if (p.shape === 'pillow-box') {
    add('depth', 'Depth');
    add('glueFlap', 'Glue flap');
  }
  return out;
}

/** Which shape names read best in sentences. */
export const SHAPE_LABELS: Record<PieceShape, string> = {
  rect: 'rectangle',
  circle: 'circle',
  oval: 'oval',
  'rounded-rect': 'rounded rectangle',
  'scalloped-rect': 'scalloped rectangle',
  'scalloped-circle': 'scalloped circle',
  tag: 'tag',
  'pillow-box': 'pillow box',
};

/** SVG path data for a path, each coordinate times `scale` (to points or millimetres) and rounded to `decimals`. */
export function pathData(cmds: readonly PathCmd[], scale = 1, decimals = 4): string {
  const n = (v: number) => {
    const s = (v * scale).toFixed(decimals).replace(/\.?0+$/, '');
    return s === '-0' ? '0' : s;
  };
  return cmds
    .map((c) => {
      if (c.op === 'Z') return 'Z';
      if (c.op !== 'A') return `${c.op}${n(c.x)} ${n(c.y)}`;
      const span = c.end - c.start;
      // A full turn cannot be one SVG arc: callers split circles into halves, as shapeOutline does.
      return `A${n(c.rx)} ${n(c.ry)} 0 ${Math.abs(span) > Math.PI ? 1 : 0} ${span > 0 ? 1 : 0} ${n(c.x)} ${n(c.y)}`;
    })
    .join(' ');
}

/** A trim length for display: rounded up to the 1/16 in mark (trim is cut long, common practice). */
function trimText(perimeter: number): string {
  return formatLength(inches([Math.ceil(perimeter * 16 - 1e-9), 16]));
}

/**
 * A shape's own sizes in words, for labels, tables and handouts: "1/4 in corners",
 * "44 scallops of 1/2 in (10 across, 14 down)", "1 in deep; blank 6 1/2 x 6 in". Empty for a plain
 * rectangle or circle. Sizes that cannot make the shape give the checks' job to the checks.
 */
export function shapeSummary(p: Pick<Piece, 'shape' | 'width' | 'height' | 'params'>): string {
  const params = p.params ?? {};
  try {
    switch (p.shape) {
      case 'rect':
      case 'circle':
        return '';
      case 'oval':
        return `trim round it ${trimText(ellipsePerimeter(num(p.width) / 2, num(p.height) / 2))}`;
      case 'rounded-rect':
        return params.cornerRadius ? `${formatLength(params.cornerRadius)} corners` : '';
      case 'scalloped-rect': {
        const s = rectScallops(p.width, p.height, params);
        const size = params.scallopCount !== undefined ? formatLength(inches(s.radius.mul(2))) : formatLength(params.scallopSize ?? DEFAULT_SCALLOP);
        return `${s.count} scallops of ${size} (${s.across + 1} across, ${s.down + 1} down)`;
      }
      case 'scalloped-circle': {
        const s = circleScallops(p.width, params);
        const size = params.scallopCount !== undefined ? `${(s.radius * 2).toFixed(3)} in` : formatLength(params.scallopSize ?? DEFAULT_SCALLOP);
        return `${s.count} scallops of ${size}`;
      }
      case 'tag': {
        const corner = `${params.tagTop === 'rounded' ? 'rounded' : 'clipped'} corners ${formatLength(params.tagCorner ?? DEFAULT_TAG_CORNER)}`;
        const d = params.holeDiameter ?? DEFAULT_HOLE;
        if (!isPositive(d)) return `${corner}; no hole`;
        return `${corner}; ${formatLength(d)} hole, ${formatLength(params.holeFromTop ?? DEFAULT_HOLE_FROM_TOP)} from the top`;
      }
      case 'pillow-box': {
        const b = pillowBlank(p.width, p.height, params);
        const w = formatLength(b.blankWidth).replace(/ in$/, '');
        return `${formatLength(params.depth!)} deep; blank ${w} x ${formatLength(b.blankHeight)} with a ${formatLength(b.glueFlap)} glue flap`;
      }
    }
  } catch (e) {
    if (e instanceof RangeError) return '';
    throw e;
  }
}
