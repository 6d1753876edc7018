/**
 * The drawing vocabulary of the cutting template: shapes in inches from a page's (or a box's)
 * top-left corner, each on a layer that decides how it is drawn (cut lines solid, score lines
 * dashed, tabs shaded, overlap zones hatched, join lines red), so the PDF and the SVG agree.
 */
import type { PathCmd } from '@shared/geometry';

/** What a shape is for; decides its stroke, fill and SVG group. */
export type TemplateLayer = 'cut' | 'score' | 'tab' | 'overlap' | 'notch' | 'mark' | 'join' | 'square' | 'label' | 'legend';

/** A rectangle a shape is clipped to (a tiled piece's part), in inches. */
export interface ClipRect {
  x: number;
  y: number;
  w: number;
  h: number;
}

interface ShapeBase {
  layer: TemplateLayer;
  /** Drawn as if on this layer (a legend's sample of a cut line is a 'legend' shape that looks 'cut'). */
  look?: TemplateLayer;
  clip?: ClipRect;
}

/** A shape on a template page. Coordinates in inches from the page's top-left corner, y down. */
export type TemplateShape =
  | (ShapeBase & { kind: 'rect'; x: number; y: number; w: number; h: number; style?: 'dashed' | 'shaded' })
  | (ShapeBase & { kind: 'circle'; cx: number; cy: number; r: number })
  | (ShapeBase & { kind: 'line'; x1: number; y1: number; x2: number; y2: number; style?: 'dashed' })
  | (ShapeBase & { kind: 'path'; d: PathCmd[]; style?: 'dashed' | 'shaded' | 'filled' })
  | (ShapeBase & { kind: 'text'; x: number; y: number; text: string; sizePt: number; bold?: boolean; anchor: 'start' | 'middle' | 'end'; tone?: 'caution' });

/** An axis-aligned rectangle by its corners, in inches. */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export const boxW = (b: Box) => b.x1 - b.x0;
export const boxH = (b: Box) => b.y1 - b.y0;

/** The overlap of two boxes, or null when they do not overlap. */
export function intersect(a: Box, b: Box): Box | null {
  const r = { x0: Math.max(a.x0, b.x0), y0: Math.max(a.y0, b.y0), x1: Math.min(a.x1, b.x1), y1: Math.min(a.y1, b.y1) };
  return r.x1 - r.x0 > 1e-9 && r.y1 - r.y0 > 1e-9 ? r : null;
}

function movePath(d: PathCmd[], f: (x: number, y: number) => [number, number], turn: boolean): PathCmd[] {
  return d.map((c) => {
    if (c.op === 'Z') return c;
    const [x, y] = f(c.x, c.y);
    if (c.op !== 'A') return { ...c, x, y };
    const [cx, cy] = f(c.cx, c.cy);
    // A quarter turn clockwise (y down) adds pi/2 to every angle and swaps the radii.
    return turn ? { ...c, x, y, cx, cy, rx: c.ry, ry: c.rx, start: c.start + Math.PI / 2, end: c.end + Math.PI / 2 } : { ...c, x, y, cx, cy };
  });
}

/** The shape moved by (dx, dy), its clip too. */
export function translate(s: TemplateShape, dx: number, dy: number): TemplateShape {
  const clip = s.clip ? { ...s.clip, x: s.clip.x + dx, y: s.clip.y + dy } : undefined;
  const withClip = <T extends TemplateShape>(t: T): T => (clip ? { ...t, clip } : t);
  switch (s.kind) {
    case 'rect':
      return withClip({ ...s, x: s.x + dx, y: s.y + dy });
    case 'circle':
      return withClip({ ...s, cx: s.cx + dx, cy: s.cy + dy });
    case 'line':
      return withClip({ ...s, x1: s.x1 + dx, y1: s.y1 + dy, x2: s.x2 + dx, y2: s.y2 + dy });
    case 'path':
      return withClip({ ...s, d: movePath(s.d, (x, y) => [x + dx, y + dy], false) });
    case 'text':
      return withClip({ ...s, x: s.x + dx, y: s.y + dy });
  }
}

/**
 * The shape turned a quarter clockwise inside a frame `height` tall: (x, y) -> (height - y, x).
 * Text is never turned (labels are placed after turning); clips are not expected here.
 */
export function turnQuarter(s: TemplateShape, height: number): TemplateShape {
  const f = (x: number, y: number): [number, number] => [height - y, x];
  switch (s.kind) {
    case 'rect':
      return { ...s, x: height - (s.y + s.h), y: s.x, w: s.h, h: s.w };
    case 'circle': {
      const [cx, cy] = f(s.cx, s.cy);
      return { ...s, cx, cy };
    }
    case 'line': {
      const [x1, y1] = f(s.x1, s.y1);
      const [x2, y2] = f(s.x2, s.y2);
      return { ...s, x1, y1, x2, y2 };
    }
    case 'path':
      return { ...s, d: movePath(s.d, f, true) };
    case 'text':
      return s;
  }
}

/** A box turned a quarter clockwise inside a frame `height` tall. */
export function turnBox(b: Box, height: number): Box {
  return { x0: height - b.y1, y0: b.x0, x1: height - b.y0, y1: b.x1 };
}

/** Hatching at 45 degrees, `step` apart, clipped exactly to the box: the lines themselves, no clip needed. */
export function hatch(b: Box, step: number, layer: TemplateLayer = 'overlap'): TemplateShape[] {
  const out: TemplateShape[] = [];
  // Lines x - y = c for c across the box's range, each cut to the box.
  const cMin = b.x0 - b.y1;
  const cMax = b.x1 - b.y0;
  for (let c = Math.ceil(cMin / step) * step; c <= cMax + 1e-9; c += step) {
    const ya = Math.max(b.y0, b.x0 - c);
    const yb = Math.min(b.y1, b.x1 - c);
    if (yb - ya < 1e-6) continue;
    out.push({ kind: 'line', layer, x1: ya + c, y1: ya, x2: yb + c, y2: yb });
  }
  return out;
}

/** A filled triangle pointing at (tx, ty) from the side `dir` names, `size` long and wide. */
export function arrowHead(tx: number, ty: number, dir: 'left' | 'right' | 'up' | 'down', size: number, layer: TemplateLayer): TemplateShape {
  const h = size / 2;
  // `dir` is where the triangle points; its base lies behind the tip.
  const pts: [number, number][] =
    dir === 'right'
      ? [
          [tx - size, ty - h],
          [tx, ty],
          [tx - size, ty + h],
        ]
      : dir === 'left'
        ? [
            [tx + size, ty - h],
            [tx, ty],
            [tx + size, ty + h],
          ]
        : dir === 'down'
          ? [
              [tx - h, ty - size],
              [tx, ty],
              [tx + h, ty - size],
            ]
          : [
              [tx - h, ty + size],
              [tx, ty],
              [tx + h, ty + size],
            ];
  return {
    kind: 'path',
    layer,
    style: 'filled',
    d: [{ op: 'M', x: pts[0]![0], y: pts[0]![1] }, { op: 'L', x: pts[1]![0], y: pts[1]![1] }, { op: 'L', x: pts[2]![0], y: pts[2]![1] }, { op: 'Z' }],
  };
}
