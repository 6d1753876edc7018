/**
 * Reads our PDFs back for the tests with pdfjs-dist (Mozilla's PDF reader, independent of the
 * pdfkit that wrote them): page sizes, text, the paths drawn (in points, page coordinates)
 * and the images painted.
 */
import * as pdfjs from 'pdfjs-dist/legacy/build/pdf.mjs';

/** A path as drawn on the page: its bounding box in PDF points, origin bottom-left. */
export interface DrawnPath {
  /** pdfjs path operators (OPS.moveTo, OPS.curveTo, OPS.rectangle ...). */
  ops: number[];
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  width: number;
  height: number;
  /** True for a single rectangle operator (`re`). */
  rect: boolean;
  /** True when the path has Bézier curves (how circles are drawn). */
  curved: boolean;
  /** The part of the bounding box inside the clip in force (a tiled part's window), or null when nothing shows. */
  visible: { x0: number; y0: number; x1: number; y1: number } | null;
}

export interface ProbedPage {
  /** [x0, y0, x1, y1] of the page, in points. */
  view: number[];
  width: number;
  height: number;
  text: string;
  /** Text items in reading order, with their baseline position (points, origin bottom-left). */
  items: { str: string; x: number; y: number }[];
  paths: DrawnPath[];
  /** Number of images painted on the page. */
  images: number;
  /** Vertical positions (bottom, top) of the images painted, in points from the bottom. */
  imageBoxes: { y0: number; y1: number }[];
}

type Matrix = [number, number, number, number, number, number];

const multiply = (m: Matrix, n: Matrix): Matrix => [
  m[0] * n[0] + m[2] * n[1],
  m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3],
  m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4],
  m[1] * n[4] + m[3] * n[5] + m[5],
];

const apply = (m: Matrix, x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

/** Every page of a PDF, read back. */
export async function probePdf(data: Buffer): Promise<ProbedPage[]> {
  const doc = await pdfjs.getDocument({ data: new Uint8Array(data), isEvalSupported: false, disableFontFace: true, verbosity: 0 }).promise;
  const { OPS } = pdfjs;
  const pages: ProbedPage[] = [];
  for (let p = 1; p <= doc.numPages; p++) {
    const page = await doc.getPage(p);
    const content = await page.getTextContent();
    const items = content.items
      .filter((i): i is Extract<(typeof content.items)[number], { str: string }> => 'str' in i)
      .map((i) => ({ str: i.str, x: i.transform[4] as number, y: i.transform[5] as number }));
    const ops = await page.getOperatorList();
    const paths: DrawnPath[] = [];
    const imageBoxes: { y0: number; y1: number }[] = [];
    let ctm: Matrix = [1, 0, 0, 1, 0, 0];
    type Clip = { x0: number; y0: number; x1: number; y1: number } | null;
    // No clip: the whole plane.
    let clip: Clip = { x0: -Infinity, y0: -Infinity, x1: Infinity, y1: Infinity };
    const stack: { ctm: Matrix; clip: Clip }[] = [];
    const meet = (a: Clip, b: Clip): Clip => {
      if (!a || !b) return null;
      const r = { x0: Math.max(a.x0, b.x0), y0: Math.max(a.y0, b.y0), x1: Math.min(a.x1, b.x1), y1: Math.min(a.y1, b.y1) };
      return r.x0 <= r.x1 && r.y0 <= r.y1 ? r : null;
    };
    for (let i = 0; i < ops.fnArray.length; i++) {
      const fn = ops.fnArray[i];
      const args = ops.argsArray[i] as unknown[];
      if (fn === OPS.save) stack.push({ ctm, clip });
      else if (fn === OPS.restore) ({ ctm, clip } = stack.pop() ?? { ctm: [1, 0, 0, 1, 0, 0], clip });
      else if (fn === OPS.transform) ctm = multiply(ctm, args as Matrix);
      else if (fn === OPS.paintImageXObject || fn === OPS.paintInlineImageXObject) {
        // An image fills the unit square of the current matrix.
        const ys = [apply(ctm, 0, 0)[1], apply(ctm, 1, 1)[1]];
        imageBoxes.push({ y0: Math.min(...ys), y1: Math.max(...ys) });
      } else if (fn === OPS.constructPath) {
        const [pathOps, coords] = args as [number[], number[]];
        const pts: [number, number][] = [];
        let k = 0;
        for (const op of pathOps) {
          if (op === OPS.rectangle) {
            const [x, y, w, h] = coords.slice(k, k + 4) as [number, number, number, number];
            pts.push(apply(ctm, x, y), apply(ctm, x + w, y), apply(ctm, x, y + h), apply(ctm, x + w, y + h));
            k += 4;
          } else if (op === OPS.moveTo || op === OPS.lineTo) {
            pts.push(apply(ctm, coords[k]!, coords[k + 1]!));
            k += 2;
          } else if (op === OPS.curveTo) {
            for (let j = 0; j < 3; j++) pts.push(apply(ctm, coords[k + 2 * j]!, coords[k + 2 * j + 1]!));
            k += 6;
          } else if (op === OPS.curveTo2 || op === OPS.curveTo3) {
            for (let j = 0; j < 2; j++) pts.push(apply(ctm, coords[k + 2 * j]!, coords[k + 2 * j + 1]!));
            k += 4;
          }
        }
        if (!pts.length) continue;
        const xs = pts.map((q) => q[0]);
        const ys = pts.map((q) => q[1]);
        const x0 = Math.min(...xs);
        const y0 = Math.min(...ys);
        const x1 = Math.max(...xs);
        const y1 = Math.max(...ys);
        // A path followed by a clip operator sets the clip (its bounding box: our clips are rectangles); it draws nothing.
        const next = ops.fnArray[i + 1];
        if (next === OPS.clip || next === OPS.eoClip) {
          clip = meet(clip, { x0, y0, x1, y1 });
          continue;
        }
        paths.push({
          ops: pathOps,
          x0,
          y0,
          x1,
          y1,
          width: x1 - x0,
          height: y1 - y0,
          rect: pathOps.length === 1 && pathOps[0] === OPS.rectangle,
          curved: pathOps.some((op) => op === OPS.curveTo || op === OPS.curveTo2 || op === OPS.curveTo3),
          visible: meet(clip, { x0, y0, x1, y1 }),
        });
      }
    }
    const [vx0, vy0, vx1, vy1] = page.view as [number, number, number, number];
    pages.push({
      view: page.view,
      width: vx1 - vx0,
      height: vy1 - vy0,
      text: items
        .map((i) => i.str)
        .join(' ')
        .replace(/\s+/g, ' '),
      items,
      paths,
      images: imageBoxes.length,
      imageBoxes,
    });
  }
  await doc.destroy();
  return pages;
}
