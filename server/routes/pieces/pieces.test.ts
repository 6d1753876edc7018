import { describe, expect, it } from 'vitest';
import { Cue, PieceRow, Recording } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';

const app = testApp();

describe('pieces API', () => {
  it('401 signed out, 400 for an unreadable length, 403 for a student', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/pieces`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    const maker = await f.clientFor('maker');
    const bad = await maker.post(url, { name: 'Base', width: 'a bit', height: '5' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([expect.objectContaining({ path: 'width' })]);
    expect((await maker.post(url, { name: 'Base', width: '4' })).body.issues[0].path).toBe('height');
    expect((await (await f.clientFor('student')).post(url, { name: 'Base', width: '4', height: '5' })).status).toBe(403);
  });

  it('reads spoken lengths and keeps them exact through the database (10 9/16 in = 268.2875 mm; 1 in = 25.4 mm, NIST SP 811)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const res = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, {
      name: 'Wall strip',
      material: 'kraft cardstock',
      quantity: 2,
      width: 'ten and nine sixteenths',
      height: '2 1/2',
    });
    expect(res.status).toBe(201);
    expect(res.body.width).toMatchObject({ value: '169/16 in', inches: 10.5625, mm: 268.2875, display: '10 9/16 in', mmDisplay: '268.3 mm' });
    expect(res.body.height.display).toBe('2 1/2 in');
    const row = await PieceRow.findByPk(res.body.id);
    expect(row!.width).toBe('169/16 in');
    const metric = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Tag', width: '13 mm', height: '40 mm' });
    expect(metric.body.width.value).toBe('13 mm');
    // 13 mm is not on a 1/16 in ruler: the check names the nearest mark (1/2 in = 12.7 mm).
    expect(metric.body.checks.find((c: { code: string }) => c.code === 'off-ruler')?.reason).toMatch(/1\/2 in/);
  });

  it('a circle takes its diameter for both sides; score lines outside the piece are flagged in words', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const circle = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Base circle', shape: 'circle', width: 'six and three eighths' });
    expect(circle.status).toBe(201);
    expect(circle.body.height.display).toBe('6 3/8 in');
    const scored = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, {
      name: 'Rim',
      width: '10 3/4',
      height: '1',
      scoreLines: [
        { axis: 'height', at: 'a quarter inch' },
        { axis: 'height', at: '1 1/4' },
      ],
    });
    expect(scored.body.scoreLines[0].at.display).toBe('1/4 in');
    const outside = scored.body.checks.find((c: { code: string }) => c.code === 'score-outside');
    expect(outside.reason).toMatch(/outside/i);
  });

  it('a mat reports its margins; an uneven or tight one is flagged (1/8 in a side, common practice)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const base = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Label panel', width: '3', height: '2' });
    const good = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Mat', width: '2 3/4', height: '1 3/4', matOnId: base.body.id });
    expect(good.body.checks.filter((c: { code: string }) => c.code.startsWith('mat-'))).toEqual([]);
    const tight = await maker.patch(`/api/pieces/${good.body.id}`, { width: '2 15/16' });
    expect(tight.body.checks.map((c: { code: string }) => c.code)).toContain('mat-margin-small');
    expect((await maker.patch(`/api/pieces/${good.body.id}`, { matOnId: good.body.id })).status).toBe(400);
  });

  it('updates, lists in order and deletes; another studio gets 404', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const a = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'A', width: '1', height: '1' });
    await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'B', width: '2', height: '2' });
    const list = await (await f.clientFor('coordinator')).get(`/api/tutorials/${f.tutorial.id}/pieces`);
    expect(list.body.pieces.map((p: { name: string }) => p.name)).toEqual(['A', 'B']);
    expect((await (await f.clientFor('outsider')).patch(`/api/pieces/${a.body.id}`, { name: 'Mine' })).status).toBe(404);
    expect((await maker.delete(`/api/pieces/${a.body.id}`)).status).toBe(204);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces).toHaveLength(1);
  });
});

describe('shapes and grain', () => {
  it('400 for a shape size that does not read or a shape without its size, then each shape with its own sizes', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/pieces`;
    const bad = await maker.post(url, { name: 'Panel', shape: 'rounded-rect', width: '4', height: '5', params: { cornerRadius: 'round-ish' } });
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe('params.cornerRadius');
    expect((await maker.post(url, { name: 'Panel', shape: 'rounded-rect', width: '4', height: '5' })).body.issues[0].path).toBe('params.cornerRadius');
    expect((await maker.post(url, { name: 'Box', shape: 'pillow-box', width: '3', height: '5' })).body.issues[0].path).toBe('params.depth');
    expect((await maker.post(url, { name: 'X', shape: 'hexagon', width: '3', height: '5' })).status).toBe(400);

    const rounded = await maker.post(url, { name: 'Panel', shape: 'rounded-rect', width: '4', height: '5', params: { cornerRadius: 'a quarter inch' } });
    expect(rounded.status).toBe(201);
    expect(rounded.body.params.cornerRadius.display).toBe('1/4 in');
    expect(rounded.body.shapeSummary).toBe('1/4 in corners');
    expect(rounded.body.outline).toMatch(/^M0\.25 0 L3\.75 0 A0\.25 0\.25 0 0 1 4 0\.25/);
    // A tag gets the usual corners and hole; a scalloped circle its 1/2 in scallops (22 round 4 in: worked by hand).
    const tag = await maker.post(url, { name: 'Gift tag', shape: 'tag', width: '2 3/8', height: '4 3/4' });
    expect(tag.body.shapeSummary).toBe('clipped corners 3/8 in; 1/4 in hole, 1/2 in from the top');
    const scallop = await maker.post(url, { name: 'Topper', shape: 'scalloped-circle', width: '4' });
    expect(scallop.body.height.display).toBe('4 in');
    expect(scallop.body.shapeSummary).toBe('22 scallops of 1/2 in');
    // A count replaces the size, and the size follows from it.
    const counted = await maker.patch(`/api/pieces/${scallop.body.id}`, { params: { scallopCount: 12 } });
    expect(counted.body.params.scallopSize).toBeUndefined();
    expect(counted.body.shapeSummary).toBe('12 scallops of 0.822 in');
    // A pillow box is cut from its blank: 2 x 3 + 1/2 by 5 + 1 (worked by hand).
    const box = await maker.post(url, { name: 'Pillow box', shape: 'pillow-box', width: '3', height: '5', params: { depth: '1' } });
    expect([box.body.extent.width.display, box.body.extent.height.display]).toEqual(['6 1/2 in', '6 in']);
    // A radius too large for the piece is a check in words, not a refusal.
    const big = await maker.patch(`/api/pieces/${rounded.body.id}`, { params: { cornerRadius: '3' } });
    expect(big.body.checks.map((c: { code: string; field: string }) => `${c.code} ${c.field}`)).toEqual(['shape-size params.cornerRadius']);
    const row = await PieceRow.findByPk(rounded.body.id);
    expect(row!.params).toEqual({ cornerRadius: '3 in' });
  });

  it('wrap strips and walls default to grain along their length (common practice); the maker may change it; the stock sheet has a grain too', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/pieces`;
    const wall = await maker.post(url, { name: 'Wall strip', material: 'kraft', width: '10 9/16', height: '2 1/2' });
    expect(wall.body.grain).toBe('length');
    expect((await maker.post(url, { name: 'Label panel', width: '3', height: '2' })).body.grain).toBe('any');
    expect((await maker.post(url, { name: 'Card base', width: '8 1/2', height: '5 1/2', grain: 'width' })).body.grain).toBe('width');
    const m = await maker.post(`/api/tutorials/${f.tutorial.id}/materials`, {
      name: 'kraft',
      sheetWidth: '8 1/2',
      sheetHeight: '11',
      rotate: false,
      grain: 'width',
    });
    expect(m.body.grain).toBe('width');
    expect((await maker.post(`/api/tutorials/${f.tutorial.id}/materials`, { name: 'x', sheetWidth: '8', sheetHeight: '8', grain: 'diagonal' })).status).toBe(
      400,
    );
    // Grain across the 8 1/2 in width: the 10 9/16 in strip would have to lie across it, which it does not fit.
    const checked = await maker.get(url);
    expect(checked.body.pieces[0].checks.map((c: { code: string }) => c.code)).toEqual(['larger-than-stock']);
    await maker.patch(`/api/materials/${m.body.id}`, { grain: 'height', rotate: true });
    expect((await maker.get(url)).body.pieces[0].checks).toEqual([]);
    // On a 12 x 12 in sheet with turning off, the strip fits as it lies but only across the grain.
    await maker.patch(`/api/materials/${m.body.id}`, { rotate: false, sheetWidth: '12', sheetHeight: '12' });
    expect((await maker.get(url)).body.pieces[0].checks.map((c: { code: string }) => c.code)).toEqual(['grain-against-stock']);
  });
});

describe('mentions and sheet plan', () => {
  it('lists the transcript’s measurements with times, and remembers dismissals', async () => {
    const f = await makeStudio(app);
    const rec = await Recording.create({
      tutorialId: f.tutorial.id,
      originalName: 'x.mp4',
      mime: 'video/mp4',
      sizeBytes: 1,
      sourceKey: 'recordings/x/source.mp4',
    });
    await Cue.bulkCreate([
      { recordingId: rec.id, position: 0, startMs: 0, endMs: 4000, text: 'Grab two pieces of cardstock', identifier: null },
      { recordingId: rec.id, position: 1, startMs: 4000, endMs: 9000, text: 'cut the panel four and a quarter by five and a half', identifier: null },
      { recordingId: rec.id, position: 2, startMs: 9000, endMs: 12000, text: 'and score it at two and an eighth', identifier: null },
    ]);
    const maker = await f.clientFor('maker');
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`);
    expect(res.body.mentions.map((m: { kind: string; startMs: number }) => [m.kind, m.startMs])).toEqual([
      ['size', 4000],
      ['score', 9000],
    ]);
    expect(res.body.mentions[0].values.map((v: { display: string }) => v.display)).toEqual(['4 1/4 in', '5 1/2 in']);
    await maker.post(`/api/tutorials/${f.tutorial.id}/mentions/dismiss`, { key: res.body.mentions[1].key });
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body.mentions[1].dismissed).toBe(true);
  });

  it('sends ranges, repeated score lines and counts with their own fields (issue 11; values worked by hand)', async () => {
    const f = await makeStudio(app);
    const rec = await Recording.create({
      tutorialId: f.tutorial.id,
      originalName: 'x.mp4',
      mime: 'video/mp4',
      sizeBytes: 1,
      sourceKey: 'recordings/y/source.mp4',
    });
    await Cue.bulkCreate([
      { recordingId: rec.id, position: 0, startMs: 0, endMs: 3000, text: 'cut three 4 by 6 mats,', identifier: null },
      { recordingId: rec.id, position: 1, startMs: 3000, endMs: 6000, text: 'leave somewhere from a quarter to three eighths', identifier: null },
      { recordingId: rec.id, position: 2, startMs: 6000, endMs: 9000, text: 'then score every quarter inch down the flap', identifier: null },
    ]);
    const res = await (await f.clientFor('maker')).get(`/api/tutorials/${f.tutorial.id}/mentions`);
    expect(
      res.body.mentions.map((m: { kind: string; count: number | null; every: { display: string } | null; approx: boolean; values: { display: string }[] }) => [
        m.kind,
        m.values.map((v) => v.display),
        m.count,
        m.every?.display ?? null,
        m.approx,
      ]),
    ).toEqual([
      ['size', ['4 in', '6 in'], 3, null, false],
      ['range', ['1/4 in', '3/8 in'], null, null, true],
      ['score', ['1/4 in'], null, '1/4 in', false],
    ]);
  });

  it('plans sheets per material: four A2 panels (4 1/4 x 5 1/2, common practice) fit one 12 x 12 sheet', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await maker.post(`/api/tutorials/${f.tutorial.id}/materials`, { name: 'white cardstock', sheetWidth: '12', sheetHeight: '12', rotate: true });
    await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Panel', material: 'white cardstock', quantity: 4, width: '4 1/4', height: '5 1/2' });
    const one = await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan`);
    expect(one.body.materials[0]).toMatchObject({ material: 'white cardstock', sheets: 1, areaLowerBound: 1, pieces: 4 });
    expect(one.body.materials[0].patterns).toEqual([expect.objectContaining({ first: 1, count: 1, pieces: 4 })]);
    const ten = await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=10&spares=1`);
    expect(ten.body.materials[0].pieces).toBe(44);
    // 44 panels, four to a sheet: eleven sheets alike
    expect(ten.body.materials[0].patterns).toEqual([expect.objectContaining({ first: 1, count: 11, pieces: 4 })]);
    expect(ten.body.materials[0].sheets).toBeGreaterThanOrEqual(ten.body.materials[0].areaLowerBound);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=0`)).status).toBe(400);
  });
});
