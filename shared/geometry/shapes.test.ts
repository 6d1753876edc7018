import { describe, expect, it } from 'vitest';
import { inches, serializeLength, toInches, type Length } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import type { Piece, PieceShape, ShapeParams } from '../measure/piece';
import { circleScallops, ellipsePerimeter, pathLength, pieceExtent, pillowBlank, rectScallops, shapeOutline, shapeProblems, type PathCmd } from './shapes';

const L = (s: string) => parseLength(s)!;
const piece = (shape: PieceShape, w: string, h: string, params: ShapeParams = {}): Pick<Piece, 'shape' | 'width' | 'height' | 'params'> => ({
  shape,
  width: L(w),
  height: L(h),
  params,
});

/** Points along a path, every arc sampled finely, for extents and distance checks. */
function samples(cmds: readonly PathCmd[]): { x: number; y: number }[] {
  const out: { x: number; y: number }[] = [];
  for (const c of cmds) {
    if (c.op === 'M' || c.op === 'L') out.push({ x: c.x, y: c.y });
    else if (c.op === 'A')
      for (let i = 0; i <= 64; i++) {
        const t = c.start + ((c.end - c.start) * i) / 64;
        out.push({ x: c.cx + c.rx * Math.cos(t), y: c.cy + c.ry * Math.sin(t) });
      }
  }
  return out;
}

function bbox(cmds: readonly PathCmd[]) {
  const pts = samples(cmds);
  const xs = pts.map((p) => p.x);
  const ys = pts.map((p) => p.y);
  return { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) };
}

/** Gauss–Kummer series for an ellipse's perimeter: pi (a + b) sum (binom(1/2, n))^2 h^n, an independent method. */
function gaussKummer(a: number, b: number): number {
  const h = ((a - b) / (a + b)) ** 2;
  let sum = 1;
  let coef = 1; // binom(1/2, n)
  for (let n = 1; n < 60; n++) {
    coef *= (0.5 - (n - 1)) / n;
    sum += coef * coef * h ** n;
  }
  return Math.PI * (a + b) * sum;
}

describe('oval', () => {
  it('perimeter by Ramanujan’s second approximation agrees with the Gauss–Kummer series and with the drawn outline', () => {
    // A 4 x 3 in oval: a = 2, b = 1.5.
    const o = shapeOutline(piece('oval', '4', '3'));
    expect(o.perimeter).toBeCloseTo(gaussKummer(2, 1.5), 9);
    expect(pathLength(o.cut)).toBeCloseTo(o.perimeter, 6);
    // Ramanujan (1914): for a circle (h = 0) it is exactly pi d.
    expect(ellipsePerimeter(3, 3)).toBeCloseTo(Math.PI * 6, 12);
    // A worked value: a = 5, b = 3 gives about 25.527 (Ramanujan II, by hand: h = 1/16).
    expect(ellipsePerimeter(5, 3)).toBeCloseTo(25.527, 3);
    expect(bbox(o.cut)).toEqual({ x0: expect.closeTo(0, 9), y0: expect.closeTo(0, 9), x1: expect.closeTo(4, 9), y1: expect.closeTo(3, 9) });
    expect(o.centre).toEqual({ x: 2, y: 1.5 });
  });
});

describe('rounded rectangle', () => {
  it('perimeter 2(w + h) - (8 - 2 pi) r, checked against the drawn outline (worked by hand)', () => {
    // 4 x 6 in, r = 1/2: 20 - (8 - 2 pi)/2 = 16 + pi/2... = 20 - 4 + pi = 19.1416 in.
    const o = shapeOutline(piece('rounded-rect', '4', '6', { cornerRadius: L('1/2') }));
    expect(o.perimeter).toBeCloseTo(16 + Math.PI, 9);
    expect(pathLength(o.cut)).toBeCloseTo(16 + Math.PI, 9);
  });

  it('refuses a radius of more than half the short side', () => {
    expect(shapeProblems(piece('rounded-rect', '2', '3', { cornerRadius: L('1 1/4') }))[0]!.reason).toBe(
      'The 1 1/4 in corner radius is more than half the 2 in side: at most 1 in',
    );
    expect(shapeProblems(piece('rounded-rect', '2', '3', { cornerRadius: L('1') }))).toEqual([]);
    expect(shapeProblems(piece('rounded-rect', '2', '3'))[0]!.field).toBe('params.cornerRadius');
  });
});

describe('scalloped rectangle', () => {
  it('5 x 7 in with 1/2 in scallops: 10 along the top, 14 down each side, 44 in all, touching exactly (worked by hand)', () => {
    // Centres run 1/4 in in from the edge: (5 - 1/2) / (1/2) = 9 gaps across, (7 - 1/2) / (1/2) = 13 down.
    const s = rectScallops(L('5'), L('7'), { scallopSize: L('1/2') });
    expect([s.across, s.down, s.count]).toEqual([9, 13, 44]);
    expect(s.spacingAcross.toFraction()).toBe('1/2');
    // Touching scallops: their count times their width is the perimeter of the line through their centres, 2(4 1/2 + 6 1/2) = 22 in.
    expect(s.count * 0.5).toBe(22);
    const o = shapeOutline(piece('scalloped-rect', '5', '7', { scallopSize: L('1/2') }));
    expect(bbox(o.cut).x1).toBeCloseTo(5, 9);
    expect(bbox(o.cut).y1).toBeCloseTo(7, 9);
    // Each of the 40 side scallops is a half circle (pi r = pi/4), each of the 4 corner ones three quarters (3 pi/8): 10 pi + 1.5 pi.
    expect(o.perimeter).toBeCloseTo(11.5 * Math.PI, 9);
  });

  it('a size that does not divide the side keeps the size and closes the spacing up (never a straight gap)', () => {
    // 4 1/4 x 5 1/2 with 1/2 in: (4 1/4 - 1/2) / (1/2) = 7.5 -> 8 gaps of 15/32 in; (5 1/2 - 1/2) / (1/2) = 10 gaps of 1/2 in.
    const s = rectScallops(L('4 1/4'), L('5 1/2'), { scallopSize: L('1/2') });
    expect([s.across, s.down]).toEqual([8, 10]);
    expect(s.spacingAcross.toFraction()).toBe('15/32');
    expect(s.spacingDown.toFraction()).toBe('1/2');
    // The count covers the centre line's perimeter 2(3 3/4 + 5) = 17 1/2 in at no more than one scallop width apart.
    expect(s.count).toBeGreaterThanOrEqual(17.5 / 0.5);
  });

  it('a count along the top sizes the scallops to touch across the width', () => {
    // 6 across a 3 in width: each 1/2 in.
    const s = rectScallops(L('3'), L('4'), { scallopCount: 6 });
    expect(s.radius.toFraction()).toBe('1/4');
    expect(shapeProblems(piece('scalloped-rect', '3', '4', { scallopSize: L('4') }))[0]!.reason).toMatch(/too large for the width/);
  });
});

describe('scalloped circle', () => {
  it('4 in circle with 1/2 in scallops: 22, the centre circle’s perimeter over the scallop width (worked by hand)', () => {
    // Centres on a 3 1/2 in circle: pi x 3.5 / 0.5 = 21.99, and the chord 2 x 1.75 x sin(pi/22) = 0.4985 <= 0.5 while sin(pi/21) gives 0.5221.
    expect(circleScallops(L('4'), { scallopSize: L('1/2') }).count).toBe(22);
    const o = shapeOutline(piece('scalloped-circle', '4', '4', { scallopSize: L('1/2') }));
    // Every scallop's tip touches the 4 in circle; every point of the outline lies within the 4 in circle and outside the centres' circle.
    const radii = samples(o.cut).map((p) => Math.hypot(p.x - 2, p.y - 2));
    expect(Math.max(...radii)).toBeCloseTo(2, 6);
    expect(Math.min(...radii)).toBeGreaterThan(1.75);
    expect(o.centre).toEqual({ x: 2, y: 2 });
  });

  it('a count sizes the scallops to touch: 12 round a 4 in circle gives r = 2 sin(15°) / (1 + sin(15°)) = 0.4112 in', () => {
    const s = circleScallops(L('4'), { scallopCount: 12 });
    expect(s.radius).toBeCloseTo((2 * Math.sin(Math.PI / 12)) / (1 + Math.sin(Math.PI / 12)), 12);
    expect(s.radius).toBeCloseTo(0.4112, 4);
    expect(shapeProblems(piece('scalloped-circle', '3', '3', { scallopSize: L('1 1/2') }))[0]!.reason).toMatch(/too large for the circle/);
  });
});

describe('tag', () => {
  it('a #5 shipping tag, 2 3/8 x 4 3/4 in with 3/8 in clipped corners: perimeter 2w + 2h - 4c + 2 sqrt2 c (worked by hand)', () => {
    const o = shapeOutline(piece('tag', '2 3/8', '4 3/4', { tagTop: 'clipped', tagCorner: L('3/8'), holeDiameter: L('1/4'), holeFromTop: L('1/2') }));
    const [w, h, c] = [2.375, 4.75, 0.375];
    expect(o.perimeter).toBeCloseTo(2 * w + 2 * h - 4 * c + 2 * Math.SQRT2 * c, 12);
    expect(o.holes).toEqual([{ cx: w / 2, cy: 0.5, r: 0.125 }]);
    expect(shapeProblems(piece('tag', '2 3/8', '4 3/4', { tagCorner: L('3/8'), holeDiameter: L('1/4'), holeFromTop: L('1/2') }))).toEqual([]);
  });

  it('rounded top corners: two quarter circles replace the clips', () => {
    const o = shapeOutline(piece('tag', '2', '4', { tagTop: 'rounded', tagCorner: L('1/2') }));
    expect(o.perimeter).toBeCloseTo(2 * 2 + 2 * 4 - 4 * 0.5 + Math.PI * 0.5, 12);
  });

  it('says when the hole is too near an edge or does not fit', () => {
    expect(shapeProblems(piece('tag', '2', '4', { holeDiameter: L('1/4'), holeFromTop: L('3/16') }))[0]!.reason).toMatch(/only 1\/16 in from the edge/);
    expect(shapeProblems(piece('tag', '1', '4', { holeDiameter: L('1 1/4'), holeFromTop: L('1') }))[0]!.severity).toBe('error');
    expect(shapeProblems(piece('tag', '2', '4', { tagCorner: L('1 1/4') }))[0]!.field).toBe('params.tagCorner');
  });
});

describe('pillow box', () => {
  it('3 x 5 x 1 in: blank 6 1/2 x 6 in, end curves of radius 2 1/2 in and depth 1/2 in (worked by hand)', () => {
    // Blank: 2 x 3 + 1/2 glue flap = 6 1/2 across; 5 + 2 x 1/2 = 6 down. Radius ((3/2)^2 + (1/2)^2) / (2 x 1/2) = 2 1/2.
    const b = pillowBlank(L('3'), L('5'), { depth: L('1') });
    expect([serializeLength(b.blankWidth), serializeLength(b.blankHeight), b.radius.toFraction()]).toEqual(['13/2 in', '6 in', '5/2']);
    const p = piece('pillow-box', '3', '5', { depth: L('1') });
    expect(pieceExtent(p)).toEqual({ width: b.blankWidth, height: b.blankHeight });
    const o = shapeOutline(p);
    expect(bbox(o.cut)).toEqual({ x0: expect.closeTo(0, 9), y0: expect.closeTo(0, 9), x1: expect.closeTo(6.5, 9), y1: expect.closeTo(6, 9) });
    // Two straight folds and four curved scores; each curve runs corner to corner and bows 1/2 in into its panel.
    expect(o.scores).toHaveLength(6);
    const top = o.scores[2]!;
    const bb = bbox(top);
    expect([bb.x0, bb.x1, bb.y0, bb.y1].map((v) => Number(v.toFixed(9)))).toEqual([0, 3, 0.5, 1]);
    // Arc length of each curve: 2R asin(W / 2R) = 5 asin(0.6) = 3.2175 in.
    expect(pathLength(top)).toBeCloseTo(5 * Math.asin(0.6), 9);
    expect(pathLength(top)).toBeCloseTo(3.2175, 4);
  });

  it('refuses a depth that is not less than the width', () => {
    expect(shapeProblems(piece('pillow-box', '3', '5', { depth: L('3') }))[0]!.reason).toMatch(/must be less than the width/);
    expect(shapeProblems(piece('pillow-box', '3', '5'))[0]!.reason).toMatch(/needs a depth/);
  });
});

describe('pieceExtent', () => {
  it('is the width and height for flat shapes and the diameter both ways for round ones', () => {
    const e = pieceExtent(piece('scalloped-circle', '4', '1'));
    expect([e.width, e.height].map((l: Length) => toInches(l).toFraction())).toEqual(['4', '4']);
    expect(pieceExtent(piece('oval', '4', '3'))).toEqual({ width: L('4'), height: L('3') });
    expect(toInches(pieceExtent({ shape: 'rect', width: inches(2), height: inches(3) }).height).toFraction()).toBe('3');
  });
});
