import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { notchMarks, pathData, shapeOutline } from '@shared/geometry';
import { inches, millimetres, parseLength, type Piece } from '@shared/measure';
import { demoPieces } from '../../seed/demo-pieces';
import { probePdf, type DrawnPath } from './pdf-probe';
import { rasterPage, verticalLineX } from './pdf-raster';
import { TEMPLATE_CAUTIONS, templateLayout, templatePdf, templateSvg, type TemplatePart } from './template';
import { hatboxPieces } from './test-fixtures';

// 1 pt = 1/72 in (PDF reference, ISO 32000-1 §8.3.2.3 default user space).
const PT_PER_IN = 72;
// 25 mm in points through mathjs' own unit table (1 in = 25.4 mm, NIST SP 811): 70.866 pt.
const MM25_PT = unit(25, 'mm').toNumber('inch') * PT_PER_IN;
const L = (s: string) => parseLength(s)!;

const near = (a: number, b: number, tol = 0.01) => Math.abs(a - b) <= tol;

function findRect(paths: DrawnPath[], w: number, h: number): DrawnPath | undefined {
  return paths.find((p) => p.rect && near(p.width, w) && near(p.height, h));
}

/** Attribute values of every element with this tag name in an SVG string. */
function elements(svg: string, tag: string): Record<string, string>[] {
  return [...svg.matchAll(new RegExp(`<${tag}\\b([^>]*)/?>`, 'g'))].map((m) =>
    Object.fromEntries([...m[1]!.matchAll(/([\w-]+)="([^"]*)"/g)].map((a) => [a[1]!, a[2]!])),
  );
}

function group(svg: string, id: string): string {
  const m = new RegExp(`<g id="${id}"[^>]*>([\\s\\S]*?)</g>`).exec(svg);
  return m?.[1] ?? '';
}

const piece = (over: Partial<Piece> & Pick<Piece, 'name' | 'width' | 'height'>): Piece => ({
  id: over.name,
  material: 'white cardstock',
  quantity: 1,
  shape: 'rect',
  scoreLines: [],
  ...over,
});

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

  it('every page carries a 1 in square (72 pt), a 25 mm square (70.87 pt), the title and "Page x of y"', async () => {
    for (const paper of ['letter', 'a4'] as const) {
      const pages = await probePdf(await templatePdf(demoPieces(), { paper, title: 'Round gift box' }));
      expect(pages.length).toBeGreaterThan(1);
      pages.forEach((page, i) => {
        const inch = findRect(page.paths, 72, 72);
        expect(inch, `${paper} page ${i + 1}: a 72 x 72 pt square`).toBeDefined();
        expect(inch!.x0).toBeCloseTo(36, 2); // 1/2 in margin = 36 pt
        expect(findRect(page.paths, MM25_PT, MM25_PT), `${paper} page ${i + 1}: a 25 mm square`).toBeDefined();
        expect(page.text).toContain('Cutting template: Round gift box');
        expect(page.text).toContain(`Page ${i + 1} of ${pages.length}`);
        expect(page.text).toContain('25 mm');
      });
      expect(pages[0]!.text).toContain('Print at 100% (actual size); check the squares with a ruler');
    }
  });

  it('draws a 6 in circle with a radius of 3 in = 216 pt, and the other circles at their sizes', async () => {
    const pages = await probePdf(await templatePdf(hatboxPieces(), { paper: 'letter' }));
    const circles = pages.flatMap((p) => p.paths.filter((q) => q.curved));
    expect(circles.filter((c) => near(c.width, 2 * 216) && near(c.height, 2 * 216))).toHaveLength(1);
    expect(circles.some((c) => near(c.width, 6.125 * PT_PER_IN))).toBe(true);
    expect(circles.some((c) => near(c.width, 5.875 * PT_PER_IN))).toBe(true);
  });

  it('Letter and A4 both draw every piece of the demo tutorial: each outline and each label, nothing "cut by measurement"', async () => {
    const pieces = demoPieces();
    for (const paper of ['letter', 'a4'] as const) {
      const layout = templateLayout(pieces, { paper, title: 'Round gift box' });
      expect(layout.omitted).toEqual([]);
      const pages = await probePdf(await templatePdf(pieces, { paper, title: 'Round gift box' }));
      const text = pages.map((p) => p.text).join(' ');
      expect(text).not.toContain('cut by measurement');
      expect(text).not.toContain('Not drawn');
      const paths = pages.flatMap((p) => p.paths);
      for (const [i, p] of pieces.entries()) {
        const parts = layout.parts.filter((x) => x.piece === i);
        expect(parts.length, `${paper}: ${p.name} drawn`).toBeGreaterThan(0);
        // Its label: the name, with "x2" when two are cut.
        const name = p.quantity > 1 ? `${p.name} x${p.quantity}` : p.name;
        const labels = pages.flatMap((pg) => pg.items).filter((it) => it.str.startsWith(name));
        expect(labels.length, `${paper}: ${name} labelled on each part`).toBe(parts.length);
        // Its outline at full size, once per part (a tiled part clips the same outline to its window).
        const w = parts[0]!.width * PT_PER_IN;
        const h = parts[0]!.height * PT_PER_IN;
        const outlines =
          p.shape === 'circle'
            ? paths.filter((q) => q.curved && near(q.width, w) && near(q.height, h))
            : paths.filter((q) => q.rect && near(q.width, w) && near(q.height, h));
        expect(outlines.length, `${paper}: ${p.name} outline`).toBe(parts.length);
      }
      // The wall strip (10 9/16 x 2 1/2 in) is larger than either printable area once the header is on the page: it is tiled.
      const wall = layout.parts.filter((x) => x.name === 'Wall strip');
      expect(wall.length).toBe(2);
      expect(text).toContain('Wall strip x2 · part 1 of 2');
      expect(text).toContain('10 9/16 x 2 1/2 in · 268.3 x 63.5 mm');
    }
  });

  it('a tiled strip joins to its exact length: rasterized at 300 dpi, 10 9/16 in = 3168.75 px within 0.5 px (pdftoppm)', async () => {
    // Worked example: the demo's wall strip, 10 9/16 in long, at 300 px per inch.
    for (const paper of ['letter', 'a4'] as const) {
      const pieces = demoPieces();
      const pdf = await templatePdf(pieces, { paper, title: 'Round gift box' });
      const layout = templateLayout(pieces, { paper, title: 'Round gift box' });
      for (const name of ['Wall strip', 'Lid rim strip']) {
        const parts = layout.parts.filter((p) => p.name === name).sort((a, b) => a.window.x0 - b.window.x0);
        expect(parts.map((p) => p.tile?.cols)).toEqual([2, 2]);
        const [a, b] = parts as [TemplatePart, TemplatePart];
        const dpi = 300;
        const px = (v: number) => v * dpi;
        // The piece's own edges measured inside it, below its tab; the join lines just outside it, where only they are drawn.
        const inside = (p: TemplatePart) => [px(p.origin.y + p.height * 0.6), px(p.origin.y + p.height * 0.9)] as const;
        const outside = (p: TemplatePart) => [px(p.origin.y + p.height + 1 / 32), px(p.origin.y + p.height + 3 / 32)] as const;
        const pageA = rasterPage(pdf, a.page, dpi);
        const pageB = a.page === b.page ? pageA : rasterPage(pdf, b.page, dpi);
        const joinA = a.joins.find((j) => j.side === 'before')!;
        const joinB = b.joins.find((j) => j.side === 'after')!;
        expect(joinB.letter).toBe(joinA.letter);
        const left = verticalLineX(pageA, px(a.origin.x), ...inside(a));
        const trim = verticalLineX(pageA, px(a.origin.x + joinA.at), ...outside(a));
        const lay = verticalLineX(pageB, px(b.origin.x + joinB.at), ...outside(b));
        const right = verticalLineX(pageB, px(b.origin.x + b.width), ...inside(b));
        const joined = trim - left + (right - lay);
        expect(Math.abs(joined - px(a.width)), `${paper} ${name}: ${joined.toFixed(3)} px against ${px(a.width)}`).toBeLessThanOrEqual(0.5);
      }
    }
  });

  it('labels say the material, which of two near-equal circles is larger (+1/16 in) and the grain', async () => {
    const pages = await probePdf(await templatePdf(demoPieces(), { paper: 'letter' }));
    const text = pages.map((p) => p.text).join(' ');
    // The demo's lid circle is 6 7/16 in over a 6 3/8 in base: 1/16 in larger (worked by hand).
    expect(text).toContain('the larger: +1/16 in over Base circle');
    expect(text).toContain('the smaller: 1/16 in under Lid circle');
    expect(text).toContain('kraft cardstock');
    expect(text).toContain('patterned paper');
    // Strips take grain along their length by default (a wall bends cleanly with the grain round it; common practice).
    expect(text).toContain('grain along its length');
  });

  it('carries a legend of line styles on every page and the blade cautions on page 1', async () => {
    const pages = await probePdf(await templatePdf(demoPieces(), { paper: 'a4' }));
    for (const p of pages) {
      for (const t of [
        'cut line (solid)',
        'score line: fold (dashed)',
        'glue tab (shaded)',
        'overlap (hatched)',
        'join line',
        'grain direction',
        'centre: compass point',
      ])
        expect(p.text).toContain(t);
    }
    // Common practice for blades: away from the fingers, a sharp blade, out of children's reach; the maker's judgement.
    expect(pages[0]!.text).toContain('cut away from your fingers');
    expect(pages[0]!.text).toContain('change a dull blade');
    expect(pages[0]!.text).toContain('children');
    expect(pages[0]!.text).toContain('use your own judgement');
    expect(TEMPLATE_CAUTIONS.join(' ')).toMatch(/judgement/);
  });

  it('keeps every drawn path inside the 1/2 in margins', async () => {
    for (const paper of ['letter', 'a4'] as const) {
      const pages = await probePdf(await templatePdf([...hatboxPieces(), ...demoPieces()], { paper }));
      for (const p of pages) {
        // What shows, that is: a tiled part's outline runs on past its window, clipped.
        for (const path of p.paths.filter((q) => q.visible)) {
          expect(path.visible!.x0).toBeGreaterThanOrEqual(36 - 0.5);
          expect(path.visible!.x1).toBeLessThanOrEqual(p.width - 36 + 0.5);
          expect(path.visible!.y0).toBeGreaterThanOrEqual(36 - 0.5);
          expect(path.visible!.y1).toBeLessThanOrEqual(p.height - 36 + 0.5);
        }
      }
    }
  });
});

describe('templateSvg', () => {
  it('gives the root width and height in inches for Letter with a viewBox in inches', () => {
    for (const svg of templateSvg(hatboxPieces(), { paper: 'letter' })) {
      expect(elements(svg, 'svg')[0]).toMatchObject({ width: '8.5in', height: '11in', viewBox: '0 0 8.5 11' });
    }
  });

  it('gives the root width and height in millimetres for A4 with a viewBox in millimetres (ISO 216)', () => {
    for (const svg of templateSvg(hatboxPieces(), { paper: 'a4' })) {
      expect(elements(svg, 'svg')[0]).toMatchObject({ width: '210mm', height: '297mm', viewBox: '0 0 210 297' });
    }
  });

  it('draws a 6 in circle with r = 3 (inches) on Letter and r = 76.2 (mm) on A4, with a centre mark', () => {
    const letter = templateSvg(hatboxPieces(), { paper: 'letter' });
    const circles = letter.flatMap((s) => elements(group(s, 'cut-lines'), 'circle'));
    const six = circles.find((c) => c.r === '3')!;
    expect(six).toBeDefined();
    // The centre mark: two 1/4 in lines crossing at the circle's centre (for a compass point).
    const marks = letter.flatMap((s) => elements(group(s, 'marks'), 'line'));
    const cross = marks.filter(
      (l) => near((Number(l.x1) + Number(l.x2)) / 2, Number(six.cx), 1e-3) && near((Number(l.y1) + Number(l.y2)) / 2, Number(six.cy), 1e-3),
    );
    expect(cross).toHaveLength(2);
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

  it('dashes score lines, shades a circle-wall tab and notches it evenly (notchMarks: 7 in at 1/2 in = 14 notches, 1/4 in from the ends)', () => {
    const strip = piece({ name: 'Short wall', width: inches(7), height: inches([3, 2]), scoreLines: [{ axis: 'height', at: inches([1, 2]), tab: true }] });
    const base = piece({ name: 'Disc', shape: 'circle', width: inches(2), height: inches(2) });
    const [svg] = templateSvg([strip, base], { paper: 'letter' });
    expect(svg).toMatch(/<g id="score-lines"[^>]*stroke-dasharray="[\d. ]+"/);
    const cut = elements(group(svg!, 'cut-lines'), 'rect').find((r) => r.width === '7')!;
    const tab = elements(group(svg!, 'tabs'), 'rect');
    expect(tab.map((r) => [r.width, r.height])).toEqual([['7', '0.5']]);
    const notches = elements(group(svg!, 'notches'), 'line').map((l) => Number(l.x1) - Number(cut.x));
    // Worked by hand: 7 / (1/2) = 14 notches spanning 6 1/2 in, so (7 - 6 1/2) / 2 = 1/4 in at each end.
    expect(notchMarks({ length: inches(7) }).count).toBe(14);
    expect(notches).toHaveLength(14);
    expect(notches[0]).toBeCloseTo(0.25, 6);
    expect(notches[13]).toBeCloseTo(6.75, 6);
  });

  it('hatches the overlap of a tiled part, clips each part to its window and marks the join with letters', () => {
    const pages = templateSvg(demoPieces(), { paper: 'letter' });
    const all = pages.join('\n');
    expect(elements(all, 'clipPath').length).toBeGreaterThan(0);
    const hatching = pages.flatMap((s) => elements(group(s, 'overlap-zones'), 'line'));
    expect(hatching.length).toBeGreaterThan(4);
    // Each join line is red (rosehip) and has its letter on both parts.
    expect(all).toMatch(/<g id="join-lines"[^>]*stroke="#A53F55"/);
    const labels = pages.flatMap((s) => [...group(s, 'labels').matchAll(/>([^<]+)<\/text>/g)].map((m) => m[1]));
    expect(labels.filter((t) => t === 'A').length).toBe(4);
    expect(labels.some((t) => t!.includes('join A to A'))).toBe(true);
  });

  it('draws each shape by its exact outline from shared/geometry (oval, rounded and scalloped rectangle, scalloped circle, tag, pillow box)', () => {
    const shapes: Piece[] = [
      piece({ name: 'Oval frame', shape: 'oval', width: inches(3), height: inches(4) }),
      piece({ name: 'Soft card', shape: 'rounded-rect', width: inches(3), height: inches(2), params: { cornerRadius: inches([1, 4]) } }),
      piece({ name: 'Scallop mat', shape: 'scalloped-rect', width: inches(3), height: inches(2) }),
      piece({ name: 'Scallop disc', shape: 'scalloped-circle', width: inches(3), height: inches(3) }),
      piece({ name: 'Gift tag', shape: 'tag', width: inches(2), height: inches([7, 2]) }),
      piece({ name: 'Favour box', shape: 'pillow-box', width: inches(2), height: inches(3), params: { depth: inches([3, 4]) } }),
    ];
    const layout = templateLayout(shapes, { paper: 'letter' });
    expect(layout.omitted).toEqual([]);
    const pages = templateSvg(shapes, { paper: 'letter' });
    const svg = pages.join('\n');
    const inGroup = (id: string, tag: string) => pages.flatMap((s) => elements(group(s, id), tag));
    const paths = inGroup('cut-lines', 'path').map((p) => p.d);
    for (const [i, p] of shapes.entries()) {
      if (
        p.shape === 'oval' ||
        p.shape === 'rounded-rect' ||
        p.shape === 'scalloped-rect' ||
        p.shape === 'scalloped-circle' ||
        p.shape === 'tag' ||
        p.shape === 'pillow-box'
      ) {
        const part = layout.parts.find((x) => x.piece === i)!;
        // The outline from shared/geometry moved to where the piece lies: same commands, same radii.
        // Signature: the commands in order with each arc's radii (positions move with the layout).
        const signature = (d: string) => [...d.matchAll(/([MLAZ])([\d.]+ [\d.]+)?/g)].map((m) => (m[1] === 'A' ? `A${m[2]}` : m[1])).join(',');
        const own = signature(pathData(shapeOutline(p).cut, 1, 4));
        const drawn = paths.find((d) => signature(d!) === own);
        expect(drawn, `${p.name} drawn as its outline`).toBeDefined();
        expect(part.width).toBeCloseTo(shapeOutline(p).width, 9);
      }
    }
    // The tag's 1/4 in hole (r = 1/8 in) and the pillow box's curved scores (four arcs) and glue flap (shaded).
    expect(inGroup('cut-lines', 'circle').some((c) => c.r === '0.125')).toBe(true);
    expect(inGroup('score-lines', 'path').filter((p) => p.d!.includes('A'))).toHaveLength(4);
    expect(inGroup('tabs', 'path').length).toBe(1);
    expect(svg).toContain('oval 3 x 4 in');
  });

  it('draws each piece once with "x2" by default and every copy with copies: "quantity"', () => {
    const count = (svgs: string[]) => svgs.reduce((n, s) => n + elements(group(s, 'cut-lines'), 'circle').filter((c) => c.r === '3').length, 0);
    const two = hatboxPieces().map((p) => (p.id === 'base' ? { ...p, quantity: 2 } : p));
    expect(count(templateSvg(two, { paper: 'a4' }))).toBe(0);
    expect(count(templateSvg(two, { paper: 'letter' }))).toBe(1);
    expect(count(templateSvg(two, { paper: 'letter', copies: 'quantity' }))).toBe(2);
  });
});

describe('templateLayout', () => {
  it('tiles a piece larger than the page into parts whose windows overlap by 1/2 in and cover it exactly', () => {
    const layout = templateLayout(demoPieces(), { paper: 'letter' });
    const wall = layout.parts.filter((p) => p.name === 'Wall strip').sort((a, b) => a.window.x0 - b.window.x0);
    // 10 9/16 in in two parts of 5 17/32 in overlapping by 1/2 in (shared/geometry tileLength; worked by hand).
    expect(wall.map((p) => [p.window.x0, p.window.x1])).toEqual([
      [0, 5.53125],
      [5.03125, 10.5625],
    ]);
    expect(wall[0]!.joins).toEqual([{ letter: 'A', dir: 'v', at: 5.53125, side: 'before' }]);
    expect(wall[1]!.joins).toEqual([{ letter: 'A', dir: 'v', at: 5.53125, side: 'after' }]);
  });

  it('a 12 x 12 in piece on Letter is tiled both ways, each inner join lettered once', () => {
    const big = piece({ name: 'Scrapbook base', width: inches(12), height: inches(12) });
    const layout = templateLayout([big], { paper: 'letter' });
    expect(layout.omitted).toEqual([]);
    const parts = layout.parts;
    expect(parts).toHaveLength(4);
    expect(parts.every((p) => p.tile?.cols === 2 && p.tile.rows === 2)).toBe(true);
    const letters = parts.flatMap((p) => p.joins.map((j) => j.letter));
    // Four joins (two down, two across), each seen from both of its parts.
    expect(new Set(letters).size).toBe(4);
    expect(letters).toHaveLength(8);
  });

  it('lists a piece whose sizes cannot make its shape, with the reason', () => {
    const bad = piece({ name: 'Too round', shape: 'rounded-rect', width: inches(2), height: inches(1), params: { cornerRadius: inches(0) } });
    const box = piece({ name: 'Flat box', shape: 'pillow-box', width: inches(2), height: inches(3), params: { depth: inches(3) } });
    const layout = templateLayout([bad, box], { paper: 'letter' });
    expect(layout.omitted.map((o) => o.piece)).toEqual(['Flat box']);
    expect(layout.omitted[0]!.text).toMatch(/depth .* must be less than the width/);
  });

  it('never overlaps two boxes on a page, label bands included', () => {
    const many: Piece[] = Array.from({ length: 14 }, (_, i) => ({
      id: `t${i}`,
      name: `Tag ${i + 1}`,
      material: 'cardstock',
      quantity: 1 + (i % 3),
      shape: i % 4 === 0 ? 'circle' : i % 5 === 0 ? 'oval' : 'rect',
      width: i % 2 ? inches([5 + i, 4]) : millimetres(30 + 7 * i),
      height: inches([3 + i, 2]),
      grain: i % 3 === 1 ? 'length' : 'any',
      scoreLines: i % 3 === 0 ? [{ axis: 'width', at: inches([1, 2]), tab: true }] : [],
    }));
    many.push(piece({ name: 'Long band', width: L('20'), height: L('1 1/2') }));
    for (const copies of ['one', 'quantity'] as const) {
      const layout = templateLayout(many, { paper: 'letter', copies });
      expect(layout.omitted).toEqual([]);
      for (const page of layout.pages) {
        const boxes = layout.parts
          .filter((p) => p.page === page.number)
          .map((p) => [p.origin.x + p.window.x0, p.origin.y + p.window.y0, p.origin.x + p.window.x1, p.origin.y + p.window.y1]);
        for (let a = 0; a < boxes.length; a++) {
          for (let b = a + 1; b < boxes.length; b++) {
            const [ax0, ay0, ax1, ay1] = boxes[a]!;
            const [bx0, by0, bx1, by1] = boxes[b]!;
            const apart = ax1 <= bx0 + 1e-9 || bx1 <= ax0 + 1e-9 || ay1 <= by0 + 1e-9 || by1 <= ay0 + 1e-9;
            expect(apart, `page ${page.number}: parts ${a} and ${b} overlap`).toBe(true);
          }
        }
      }
    }
  });
});
