import { describe, expect, it } from 'vitest';
import { PieceRow } from '@server/models';
import { SHEET_PLAN_LIMITS } from '@shared/schemas/sheet-plan';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';

const app = testApp();

describe('sheet plan API: bounded, grouped, off the event loop', () => {
  it('401, 400 for a bad kit count, 403 for a student on a draft, 404 for another studio, then a plan', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/sheet-plan`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    const maker = await f.clientFor('maker');
    const bad = await maker.get(`${url}?kits=2.5`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([expect.objectContaining({ path: 'kits' })]);
    expect((await (await f.clientFor('student')).get(url)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).get(url)).status).toBe(404);
    expect((await maker.get(url)).body).toEqual({ kits: 1, spares: 0, materials: [] });
  });

  it('groups identical sheets: 1,440 one-inch squares are ten 12 x 12 sheets like one pattern of a 12 x 12 block (by hand: 144 a sheet)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Square', quantity: 144, width: '1', height: '1' });
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=10`);
    expect(res.status).toBe(200);
    const plan = res.body.materials[0];
    expect(plan).toMatchObject({ material: 'unassigned', sheets: 10, pieces: 1440, areaLowerBound: 10, waste: 0, complete: true });
    expect(plan.patterns).toEqual([
      {
        first: 1,
        count: 10,
        pieces: 144,
        blocks: [{ name: 'Square', x: 0, y: 0, width: 1, height: 1, rotated: false, shape: 'rect', outline: null, grain: 'any', across: 12, down: 12 }],
      },
    ]);
    // the answer is a few hundred bytes, not 1,440 placements
    expect(JSON.stringify(res.body).length).toBeLessThan(2_000);
  });

  it('refuses pieces x kits past the limit with 422 naming it (the case that used to stall the server: quantity 999, many kits)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    for (const name of ['Chip', 'Dot']) await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name, quantity: 999, width: '1/4', height: '3/8' });
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=500&spares=100`);
    expect(res.status).toBe(422);
    expect(res.body.error).toContain('at most 100,000 pieces (pieces x kits)');
    expect(res.body.error).toContain('1,998 a kit x 600 kits and spares is 1,198,800');
    expect(res.body.limit).toEqual(SHEET_PLAN_LIMITS);
    expect(res.body.requested).toEqual({ pieces: 2, copies: 1_198_800 });
    // within the limit the same cut list plans at once
    const ok = await maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=50`);
    expect(ok.status).toBe(200);
    expect(ok.body.materials[0].pieces).toBe(1998 * 50);
  });

  it('the health check answers while a large plan is worked out in the planning thread', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    // 1,000 distinct pieces (the limit) x 100 kits: seconds of planning, in the thread
    const rows = Array.from({ length: SHEET_PLAN_LIMITS.pieces }, (_, i) => ({
      tutorialId: f.tutorial.id,
      position: i,
      name: `Piece ${i + 1}`,
      material: 'kraft',
      quantity: 1,
      width: `${17 + ((i * 37) % 150)}/16 in`,
      height: `${9 + ((i * 53) % 170)}/16 in`,
    }));
    await PieceRow.bulkCreate(rows);
    let planDone = false;
    const plan = maker.get(`/api/tutorials/${f.tutorial.id}/sheet-plan?kits=100`).then((r) => {
      planDone = true;
      return r;
    });
    await new Promise((r) => setTimeout(r, 300));
    const health = await maker.get('/api/health');
    expect(health.status).toBe(200);
    expect(planDone).toBe(false);
    const res = await plan;
    expect(res.status).toBe(200);
    expect(res.body.materials[0].pieces).toBe(100_000);
    expect(res.body.materials[0].sheets).toBeGreaterThanOrEqual(res.body.materials[0].areaLowerBound);
  });

  it('lays shapes by their bounding box (a pillow box by its blank) and grain-bound strips with the sheet’s grain', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}`;
    await maker.post(`${url}/materials`, { name: 'kraft', sheetWidth: '12', sheetHeight: '12', grain: 'height' });
    // 3 x 5 x 1 in box: blank 6 1/2 x 6 in (worked by hand in shared/geometry/shapes.test.ts).
    await maker.post(`${url}/pieces`, { name: 'Pillow box', material: 'kraft', shape: 'pillow-box', width: '3', height: '5', params: { depth: '1' } });
    await maker.post(`${url}/pieces`, { name: 'Wall strip', material: 'kraft', quantity: 2, width: '10 9/16', height: '2 1/2' });
    const plan = (await maker.get(`${url}/sheet-plan`)).body.materials[0];
    expect(plan.grain).toBe('height');
    const blocks = plan.patterns.flatMap((p: { blocks: { name: string }[] }) => p.blocks);
    const box = blocks.find((b: { name: string }) => b.name === 'Pillow box');
    expect([box.width, box.height].sort()).toEqual([6, 6.5]);
    expect(box.outline).toMatch(/^M0 /);
    // The strips need their grain along their 10 9/16 in length and the sheet's grain runs down: they are laid turned.
    const strips = blocks.filter((b: { name: string }) => b.name === 'Wall strip');
    expect(strips.every((b: { rotated: boolean; grain: string }) => b.rotated && b.grain === 'length')).toBe(true);
  });
});
