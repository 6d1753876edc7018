import { describe, expect, it } from 'vitest';
import { checkCutList, checkPiece, matMargins } from './checks';
import { inches, millimetres, serializeLength, type Length } from './length';
import { parseLength } from './parse-length';
import type { Piece } from './piece';

const L = (s: string): Length => parseLength(s)!;
let n = 0;
function piece(p: Partial<Piece> & { width: Length; height: Length }): Piece {
  n++;
  return { id: `p${n}`, name: `Piece ${n}`, material: 'white cardstock', quantity: 1, shape: 'rect', scoreLines: [], ...p };
}
const codes = (cs: { code: string }[]) => cs.map((c) => c.code);

describe('checkPiece: sizes on the ruler', () => {
  it('a clean A2 card base has no findings (common practice: 8 1/2 x 5 1/2 scored at 4 1/4)', () => {
    const base = piece({ width: L('8 1/2'), height: L('5 1/2'), scoreLines: [{ axis: 'width', at: L('4 1/4') }] });
    expect(checkPiece(base, { precision: 16, pieces: [base] })).toEqual([]);
  });

  it('flags a third of an inch with the nearest mark and the error in both units', () => {
    const p = piece({ width: L('4 1/3'), height: L('6') });
    const cs = checkPiece(p, { precision: 16, pieces: [p] });
    expect(codes(cs)).toEqual(['off-ruler']);
    expect(cs[0]!.severity).toBe('warning');
    expect(cs[0]!.field).toBe('width');
    expect(cs[0]!.reason).toBe('Width 4 1/3 in is between the 1/16 in marks: nearest 4 5/16 in, 1/48 in (0.53 mm) over');
    expect(serializeLength(cs[0]!.mark!.mark)).toBe('69/16 in');
  });

  it('names the second side Length, as the cut list column does', () => {
    const p = piece({ width: L('4'), height: L('6 1/3') });
    const cs = checkPiece(p, { precision: 16, pieces: [p] });
    expect(cs.map((c) => [c.field, c.reason.split(' ')[0]])).toEqual([['height', 'Length']]);
    const zero = piece({ width: L('4'), height: L('0') });
    expect(checkPiece(zero, { pieces: [zero] })[0]!.reason).toMatch(/needs a width and length above zero/);
    const oval = piece({ shape: 'circle', width: L('3'), height: L('3 1/4') });
    expect(checkPiece(oval, { pieces: [oval] })[0]!.reason).toMatch(/width and length must both be the diameter/);
    for (const c of [...cs, ...checkPiece(zero, { pieces: [zero] }), ...checkPiece(oval, { pieces: [oval] })]) expect(c.reason).not.toMatch(/height/i);
  });

  it('3/32 is fine at 32nds and off at 16ths', () => {
    const p = piece({ width: L('4 3/32'), height: L('6') });
    expect(checkPiece(p, { precision: 32, pieces: [p] })).toEqual([]);
    expect(codes(checkPiece(p, { precision: 16, pieces: [p] }))).toEqual(['off-ruler']);
  });

  it('refuses a zero size, a bad quantity and an oval circle', () => {
    const p = piece({ width: L('0'), height: L('3'), quantity: 0 });
    expect(codes(checkPiece(p, { pieces: [p] })).sort()).toEqual(['bad-quantity', 'bad-size']);
    const c = piece({ shape: 'circle', width: L('3'), height: L('3 1/4') });
    expect(codes(checkPiece(c, { pieces: [c] }))).toEqual(['circle-not-round']);
  });
});

describe('checkPiece: score lines', () => {
  it('a score line past the edge is an error with a readable reason', () => {
    const p = piece({ width: L('4'), height: L('5'), scoreLines: [{ axis: 'height', at: L('5 1/4') }] });
    const cs = checkPiece(p, { precision: 16, pieces: [p] });
    expect(cs).toHaveLength(1);
    expect(cs[0]).toMatchObject({
      code: 'score-outside',
      severity: 'error',
      // The cut list's column reads "Length", so the warning says length, not height.
      reason: 'Score line at 5 1/4 in is outside the 5 in length',
      field: 'scoreLines.0',
    });
  });

  it('score lines closer than 1/8 in to each other or to an edge are flagged (common practice)', () => {
    const p = piece({
      width: L('6'),
      height: L('4'),
      scoreLines: [
        { axis: 'width', at: L('2') },
        { axis: 'width', at: L('2 1/16') },
        { axis: 'width', at: L('5 15/16') },
        { axis: 'height', at: L('2') },
      ],
    });
    const cs = checkPiece(p, { precision: 16, pieces: [p] });
    expect(codes(cs).sort()).toEqual(['score-near-edge', 'score-too-close']);
    expect(cs.find((c) => c.code === 'score-too-close')!.reason).toBe(
      'Score lines at 2 in and 2 1/16 in on the width are only 1/16 in apart; keep at least 1/8 in',
    );
    expect(cs.find((c) => c.code === 'score-near-edge')!.reason).toContain('only 1/16 in from the edge of the 6 in width');
  });

  it('tab score lines may sit close (a 1/16 in tab fold is allowed)', () => {
    const p = piece({
      width: L('6'),
      height: L('4'),
      scoreLines: [
        { axis: 'width', at: L('1/16'), tab: true },
        { axis: 'width', at: L('1/8') },
      ],
    });
    expect(checkPiece(p, { precision: 16, pieces: [p] })).toEqual([]);
  });

  it('exactly 1/8 in apart is enough; the same line twice is not', () => {
    const ok = piece({
      width: L('6'),
      height: L('4'),
      scoreLines: [
        { axis: 'width', at: L('2') },
        { axis: 'width', at: L('2 1/8') },
      ],
    });
    expect(checkPiece(ok, { pieces: [ok] })).toEqual([]);
    const twice = piece({
      width: L('6'),
      height: L('4'),
      scoreLines: [
        { axis: 'width', at: L('2') },
        { axis: 'width', at: L('2') },
      ],
    });
    expect(checkPiece(twice, { pieces: [twice] })[0]!.reason).toBe('Score line at 2 in on the width is listed twice');
  });
});

describe('checkPiece: mats', () => {
  const front = piece({ name: 'Card front', width: L('4 1/4'), height: L('5 1/2') });

  it('a mat 1/4 in smaller each way leaves 1/8 in each side: no finding (common practice)', () => {
    const mat = piece({ name: 'Patterned mat', width: L('4'), height: L('5 1/4'), matOn: front.id });
    expect(checkPiece(mat, { pieces: [front, mat] })).toEqual([]);
    const m = matMargins(mat, front)!;
    expect([m.left, m.right, m.top, m.bottom].map(serializeLength)).toEqual(['1/8 in', '1/8 in', '1/8 in', '1/8 in']);
  });

  it('uneven margins are reported with each side', () => {
    const mat = piece({ name: 'Patterned mat', width: L('4'), height: L('5'), matOn: front.id });
    const cs = checkPiece(mat, { pieces: [front, mat] });
    expect(codes(cs)).toEqual(['mat-uneven']);
    expect(cs[0]!.reason).toBe('"Patterned mat" on "Card front" leaves uneven margins: 1/8 in at left and right, 1/4 in at top and bottom');
    expect(serializeLength(cs[0]!.margins!.top)).toBe('1/4 in');
  });

  it('margins under the chosen margin are flagged', () => {
    const mat = piece({ name: 'Thin mat', width: L('4 1/8'), height: L('5 3/8'), matOn: front.id });
    const cs = checkPiece(mat, { pieces: [front, mat] });
    expect(codes(cs)).toEqual(['mat-margin-small']);
    expect(cs[0]!.reason).toBe('"Thin mat" on "Card front" leaves less than the 1/8 in margin (1/16 in each side)');
    const wide = checkPiece(piece({ width: L('3 3/4'), height: L('5'), matOn: front.id }), { pieces: [front], matMargin: L('1/2') });
    expect(codes(wide)).toEqual(['mat-margin-small']);
  });

  it('a mat larger than its base, or on a missing base, is an error', () => {
    const big = piece({ name: 'Big mat', width: L('4 1/2'), height: L('5'), matOn: front.id });
    expect(checkPiece(big, { pieces: [front, big] })[0]).toMatchObject({ code: 'mat-too-large', severity: 'error' });
    const lost = piece({ width: L('2'), height: L('2'), matOn: 'nope' });
    expect(codes(checkPiece(lost, { pieces: [lost] }))).toEqual(['mat-base-missing']);
  });

  it('circles: a 3 3/4 in circle on a 4 in circle leaves 1/8 in all round; a square must fit by its corners', () => {
    const lid = piece({ shape: 'circle', width: L('4'), height: L('4') });
    const topper = piece({ shape: 'circle', width: L('3 3/4'), height: L('3 3/4'), matOn: lid.id });
    expect(checkPiece(topper, { pieces: [lid, topper] })).toEqual([]);
    // a 2.75 in square has a 3.889 in diagonal: it fits a 4 in circle, but its corners come within 1/8 in of the edge
    const sq = piece({ width: L('2 3/4'), height: L('2 3/4'), matOn: lid.id });
    expect(codes(checkPiece(sq, { pieces: [lid, sq] }))).toEqual(['mat-margin-small']);
    const bigSq = piece({ width: L('3'), height: L('3'), matOn: lid.id });
    expect(codes(checkPiece(bigSq, { pieces: [lid, bigSq] }))).toEqual(['mat-too-large']);
    const smallSq = piece({ width: L('2 1/2'), height: L('2 1/2'), matOn: lid.id });
    expect(checkPiece(smallSq, { pieces: [lid, smallSq] })).toEqual([]);
  });
});

describe('checkPiece: stock sheet', () => {
  const sheet = { width: inches(12), height: inches(12), rotate: true };

  it('a piece larger than the sheet is an error', () => {
    const wall = piece({ name: 'Box wall', width: L('20 1/8'), height: L('2') });
    const cs = checkPiece(wall, { pieces: [wall], stock: sheet });
    expect(cs[0]).toMatchObject({
      code: 'larger-than-stock',
      severity: 'error',
      reason: '"Box wall" (20 1/8 x 2 in) is larger than the 12 x 12 in stock sheet, even turned',
    });
  });

  it('fits turned only when turning is allowed', () => {
    const a4 = { width: millimetres(210), height: millimetres(297) };
    const strip = piece({ width: L('11'), height: L('2') }); // 279.4 mm x 50.8 mm
    expect(checkPiece(strip, { pieces: [strip], stock: { ...a4, rotate: true } })).toEqual([]);
    expect(codes(checkPiece(strip, { pieces: [strip], stock: { ...a4, rotate: false } }))).toEqual(['larger-than-stock']);
  });
});

describe('checkCutList', () => {
  it('checks every piece, each against its own material’s sheet', () => {
    const base = piece({ name: 'Base', material: 'kraft', width: L('13'), height: L('2') });
    const mat = piece({ name: 'Mat', material: 'pattern', width: L('12 3/4'), height: L('1 3/4'), matOn: base.id });
    const cs = checkCutList([base, mat], {
      precision: 16,
      stockFor: (material) =>
        material === 'kraft' ? { width: inches(12), height: inches(12), rotate: true } : { width: inches(14), height: inches(14), rotate: true },
    });
    expect(cs.map((c) => [c.pieceId, c.code])).toEqual([[base.id, 'larger-than-stock']]);
  });
});

describe('checkPiece: shapes beyond rectangles and circles', () => {
  const base = { id: 's', name: 'Tag', material: 'kraft', quantity: 1, scoreLines: [] };
  it('checks each shape’s own sizes and puts them on the ruler', () => {
    const tag: Piece = {
      ...base,
      shape: 'tag',
      width: inches(2),
      height: inches(4),
      params: { tagCorner: inches([1, 3]), holeDiameter: inches([1, 4]), holeFromTop: inches([3, 16]) },
    };
    const found = checkPiece(tag, { pieces: [tag] });
    expect(found.map((c) => `${c.code} ${c.field}`)).toEqual(['off-ruler params.tagCorner', 'shape-size params.holeFromTop']);
    const round: Piece = { ...base, shape: 'rounded-rect', width: inches(2), height: inches(3), params: { cornerRadius: inches(2) } };
    expect(checkPiece(round, { pieces: [round] }).map((c) => c.code)).toEqual(['shape-size']);
    const scallop: Piece = { ...base, shape: 'scalloped-circle', width: inches(4), height: inches(3) };
    expect(checkPiece(scallop, { pieces: [scallop] }).map((c) => c.code)).toEqual(['circle-not-round']);
  });

  it('a pillow box is checked against its stock by its flat blank, not the finished box', () => {
    // 5 x 8 x 2 in box: blank 2 x 5 + 1/2 = 10 1/2 across, 8 + 2 = 10 down; it fits a 12 x 12 in sheet but not Letter.
    const box: Piece = { ...base, name: 'Box', shape: 'pillow-box', width: inches(5), height: inches(8), params: { depth: inches(2) } };
    expect(checkPiece(box, { pieces: [box], stock: { width: inches(12), height: inches(12), rotate: true } })).toEqual([]);
    expect(checkPiece(box, { pieces: [box], stock: { width: inches([17, 2]), height: inches(11), rotate: true } })[0]!.reason).toBe(
      '"Box" (5 x 8 in; its blank 10 1/2 x 10 in) is larger than the 8 1/2 x 11 in stock sheet, even turned',
    );
  });
});
