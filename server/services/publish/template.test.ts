import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { inches, millimetres, type Piece } from '@shared/measure';
import { probePdf, type DrawnPath } from './pdf-probe';
import { templateLayout, templatePdf, templateSvg } from './template';
import { hatboxPieces } from './test-fixtures';

// 1 pt = 1/72 in (PDF reference, ISO 32000-1 §8.3.2.3 default user space).
const PT_PER_IN = 72;
// 25 mm in points through mathjs' own unit table (1 in = 25.4 mm, NIST SP 811): 70.866 pt.
const MM25_PT = unit(25, 'mm').toNumber('inch') * PT_PER_IN;

const near = (a: number, b: number, tol = 0.01) => Math.abs(a - b) <= tol;

function findRect(paths: DrawnPath[], w: number, h: number): DrawnPath | undefined {
  return paths.find((p) => p.rect && near(p.width, w) && near(p.height, h));
}

/** Attribute values of every element with this tag name in an SVG string. */
function elements(svg: string, tag: string): Record<string, string>[] {
  return [...svg.matchAll(new RegExp(`<${tag}\\b([^>]*)/?>`, 'g'))].map((m) => Object.fromEntries([...m[1]!.matchAll(/([\w-]+)="([^"]*)"/g)].map((a) => [a[1]!, a[2]!])));
}

function group(svg: string, id: string): string {
  const m = new RegExp(`<g id="${id}"[^>]*>([\\s\\S]*?)</g>`).exec(svg);
  return m?.[1] ?? '';
}

describe('templatePdf', () => {
  it('makes Letter pages of 612 x 792 pt (ANSI/ASME Y14.1 8.5 x 11 in; PDF reference 1 pt = 1/72 in)', async () => {
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'letter' }));
    expect(pages.length).toBeGreaterThan(1);
    for (const p of pages) expect([p.width, p.height]).toEqual([612, 792]);
  });

  it('makes A4 pages of 595.28 x 841.89 pt (ISO 216 210 x 297 mm; PDF reference)', async () => {
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'a4' }));
    for (const p of pages) {
      expect(p.width).toBeCloseTo(595.28, 2);
      expect(p.height).toBeCloseTo(841.89, 2);
    }
  });

  it('draws the 1 in test square as 72 pt and the 25 mm square as 70.87 pt, at the 1/2 in margin', async () => {
    for (const paper of ['letter', 'a4'] as const) {
      const [first] = await probePdf(await templatePdf(hatboxPieces(), { paper }));
      const inch = findRect(first!.paths, 72, 72);
      expect(inch, `${paper}: a 72 x 72 pt square`).toBeDefined();
      expect(inch!.x0).toBeCloseTo(36, 2); // 1/2 in margin = 36 pt
      const mm = findRect(first!.paths, MM25_PT, MM25_PT);
      expect(mm, `${paper}: a 25 mm square`).toBeDefined();
      // Their labels and the printing instruction are on page 1.
      expect(first!.text).toContain('1 in');
      expect(first!.text).toContain('25 mm');
      expect(first!.text).toContain('Print at 100% (actual size); check the squares with a ruler');
    }
  });

  it('draws a 6 in circle with a radius of 3 in = 216 pt', async () => {
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'letter' }));
    const circles = pages.flatMap((p) => p.paths.filter((q) => q.curved));
    const six = circles.filter((c) => near(c.width, 2 * 216) && near(c.height, 2 * 216));
    expect(six).toHaveLength(1);
    // The other circles of the cut list at their own sizes: 6 1/8 in and 5 7/8 in diameters.
    expect(circles.some((c) => near(c.width, 6.125 * PT_PER_IN))).toBe(true);
    expect(circles.some((c) => near(c.width, 5.875 * PT_PER_IN))).toBe(true);
  });

  it('labels every drawn piece with its name and size and keeps every page inside the 1/2 in margins', async () => {
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'a4' }));
    const text = pages.map((p) => p.text).join(' ');
    // The wall strip fits A4 turned; its label is the piece's size as cut.
    expect(text).toContain('Wall strip x2');
    expect(text).toContain('10 9/16 x 2 1/2 in · 268.3 x 63.5 mm');
    expect(text).toContain('Base circle');
    expect(text).toContain('6 in diameter');
    // 45 x 80 mm: the crafter's millimetres first, then the nearest 1/16 in marks.
    expect(text).toContain('45 x 80 mm · ~ 1 3/4 x 3 1/8 in');
    for (const p of pages) {
      for (const path of p.paths) {
        expect(path.x0).toBeGreaterThanOrEqual(36 - 0.5);
        expect(path.x1).toBeLessThanOrEqual(p.width - 36 + 0.5);
        expect(path.y0).toBeGreaterThanOrEqual(36 - 0.5);
        expect(path.y1).toBeLessThanOrEqual(p.height - 36 + 0.5);
      }
    }
  });

  it('lists a piece larger than the page on page 1 instead of dropping it', async () => {
    // The 10 9/16 in strip does not fit Letter's 7 1/2 x 10 in printable area, even turned.
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'letter' }));
    expect(pages[0]!.text).toContain('Wall strip x2 10 9/16 x 2 1/2 in · 268.3 x 63.5 mm');
    expect(pages[0]!.text).toContain('larger than the page: cut by measurement');
    const big: Piece = { id: 'b', name: 'Scrapbook base', material: 'cardstock', quantity: 1, shape: 'rect', width: inches(12), height: inches(12), scoreLines: [] };
    const one = await probePdf(await templatePdf([big], { paper: 'a4' }));
    expect(one).toHaveLength(1);
    expect(one[0]!.text).toContain('Scrapbook base 12 x 12 in · 304.8 x 304.8 mm');
  });
});

describe('templateSvg', () => {
  it('gives the root width and height in inches for Letter with a viewBox in inches', () => {
    const pages = templateSvg(hatboxPieces(), { paper: 'letter' });
    for (const svg of pages) {
      const [root] = elements(svg, 'svg');
      expect(root).toMatchObject({ width: '8.5in', height: '11in', viewBox: '0 0 8.5 11' });
    }
  });

  it('gives the root width and height in millimetres for A4 with a viewBox in millimetres (ISO 216)', () => {
    for (const svg of templateSvg(hatboxPieces(), { paper: 'a4' })) {
      expect(elements(svg, 'svg')[0]).toMatchObject({ width: '210mm', height: '297mm', viewBox: '0 0 210 297' });
    }
  });

  it('draws a 6 in circle with r = 3 (inches) on Letter and r = 76.2 (mm) on A4', () => {
    const letter = templateSvg(hatboxPieces(), { paper: 'letter' }).flatMap((s) => elements(group(s, 'cut-lines'), 'circle'));
    expect(letter.map((c) => c.r)).toContain('3');
    const a4 = templateSvg(hatboxPieces(), { paper: 'a4' }).flatMap((s) => elements(group(s, 'cut-lines'), 'circle'));
    // 3 in x 25.4 mm/in = 76.2 mm (NIST SP 811).
    expect(a4.map((c) => c.r)).toContain('76.2');
  });

  it('draws the 1 in and 25 mm test squares at size', () => {
    const [letter] = templateSvg([], { paper: 'letter' });
    const squares = elements(group(letter!, 'test-squares'), 'rect');
    expect(squares[0]).toMatchObject({ width: '1', height: '1' });
    expect(Number(squares[1]!.width)).toBeCloseTo(25 / 25.4, 4);
    const [a4] = templateSvg([], { paper: 'a4' });
    const mm = elements(group(a4!, 'test-squares'), 'rect');
    expect(mm[0]).toMatchObject({ width: '25.4', height: '25.4' });
    expect(mm[1]).toMatchObject({ width: '25', height: '25' });
  });

  it('dashes score lines and marks a circle-wall tab with a band and notches every 1/2 in', () => {
    const pages = templateSvg(hatboxPieces(), { paper: 'a4' });
    const strip = pages.find((s) => s.includes('Wall strip x2'))!;
    expect(group(strip, 'score-lines')).toBeTruthy();
    expect(strip).toMatch(/<g id="score-lines"[^>]*stroke-dasharray="[\d. ]+"/);
    // The strip is drawn turned (2 1/2 x 10 9/16 in = 63.5 x 268.2875 mm); its fold runs its whole length.
    const cut = elements(group(strip, 'cut-lines'), 'rect');
    expect(cut.some((r) => r.width === '63.5' && near(Number(r.height), 268.2875, 0.001))).toBe(true);
    const fold = elements(group(strip, 'score-lines'), 'line');
    expect(fold.some((l) => Math.abs(Number(l.y2) - Number(l.y1) - 268.2875) < 0.01)).toBe(true);
    // The tab is the 1/2 in (12.7 mm) side of the fold at 2 in on a 2 1/2 in strip.
    const tab = elements(group(strip, 'tabs'), 'rect');
    expect(tab.map((r) => r.width)).toEqual(['12.7']);
    // 10 9/16 in / (1/2 in) = 21.125, so 21 notches fit strictly inside the edge (worked example).
    expect(elements(group(strip, 'notches'), 'line')).toHaveLength(21);
  });

  it('draws each piece once with "x2" by default and every copy with copies: "quantity"', () => {
    const count = (svgs: string[]) => svgs.reduce((n, s) => n + elements(group(s, 'cut-lines'), 'rect').filter((r) => r.width === '63.5').length, 0);
    expect(count(templateSvg(hatboxPieces(), { paper: 'a4' }))).toBe(1);
    expect(count(templateSvg(hatboxPieces(), { paper: 'a4', copies: 'quantity' }))).toBe(2);
  });
});

describe('templateLayout', () => {
  it('never overlaps two pieces on a page, label bands included', () => {
    const many: Piece[] = Array.from({ length: 14 }, (_, i) => ({
      id: `t${i}`,
      name: `Tag ${i + 1}`,
      material: 'cardstock',
      quantity: 1 + (i % 3),
      shape: i % 4 === 0 ? 'circle' : 'rect',
      width: i % 2 ? inches([5 + i, 4]) : millimetres(30 + 7 * i),
      height: inches([3 + i, 2]),
      scoreLines: i % 3 === 0 ? [{ axis: 'width', at: inches([1, 2]), tab: true }] : [],
    }));
    for (const copies of ['one', 'quantity'] as const) {
      const layout = templateLayout(many, { paper: 'letter', copies });
      expect(layout.omitted).toEqual([]);
      const drawn = layout.pages.reduce((n, p) => n + p.shapes.filter((s) => s.layer === 'cut').length, 0);
      expect(drawn).toBe(copies === 'one' ? many.length : many.reduce((n, p) => n + p.quantity, 0));
      for (const page of layout.pages) {
        const boxes = page.shapes
          .filter((s) => s.layer === 'cut')
          .map((s) => (s.kind === 'circle' ? [s.cx - s.r, s.cy - s.r, s.cx + s.r, s.cy + s.r] : s.kind === 'rect' ? [s.x, s.y, s.x + s.w, s.y + s.h] : [0, 0, 0, 0]));
        for (let a = 0; a < boxes.length; a++) {
          for (let b = a + 1; b < boxes.length; b++) {
            const [ax0, ay0, ax1, ay1] = boxes[a]!;
            const [bx0, by0, bx1, by1] = boxes[b]!;
            const apart = ax1 <= bx0 + 1e-9 || bx1 <= ax0 + 1e-9 || ay1 <= by0 + 1e-9 || by1 <= ay0 + 1e-9;
            expect(apart, `page ${page.number}: pieces ${a} and ${b} overlap`).toBe(true);
          }
        }
      }
    }
  });
});
