import { describe, expect, it } from 'vitest';
import { Tutorial } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';

const app = testApp();

/**
 * A cut list whose circles cannot share a 12 x 12 in sheet (worked by hand: a 6 3/8 in circle's
 * 6 3/8 in square leaves 5 5/8 in, less than another circle), so three circles need three sheets.
 */
async function threeCircles(maker: Awaited<ReturnType<Awaited<ReturnType<typeof makeStudio>>['clientFor']>>, tutorialId: string) {
  await maker.post(`/api/tutorials/${tutorialId}/materials`, { name: 'kraft cardstock', sheetWidth: '12', sheetHeight: '12' });
  for (const name of ['Base circle', 'Lid circle', 'Lining circle'])
    expect((await maker.post(`/api/tutorials/${tutorialId}/pieces`, { name, material: 'kraft cardstock', shape: 'circle', width: '6 3/8' })).status).toBe(201);
}

describe('supplies checked against the sheet plan', () => {
  it('401 signed out, 400 for a bad id, 403 for a student', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/supply-checks`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    expect((await (await f.clientFor('maker')).get('/api/tutorials/not-an-id/supply-checks')).status).toBe(400);
    expect((await (await f.clientFor('student')).get(url)).status).toBe(403);
  });

  it('warns when a supply lists fewer sheets than the plan, fixes it with the plan’s figure in one change, and holds an acceptance on purpose', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await threeCircles(maker, f.tutorial.id);
    const s = await maker.post(`/api/tutorials/${f.tutorial.id}/supplies`, {
      category: 'cardstock',
      name: 'Kraft cardstock, 12 x 12 in',
      quantity: '2 sheets',
    });
    const url = `/api/tutorials/${f.tutorial.id}/supply-checks`;
    const first = await maker.get(url);
    expect(first.status).toBe(200);
    expect(first.body.checks).toEqual([
      {
        supplyId: s.body.id,
        supplyName: 'Kraft cardstock, 12 x 12 in',
        material: 'kraft cardstock',
        sheetLabel: '12 x 12 in',
        stated: 2,
        needed: 3,
        status: 'short',
        message: 'Kraft cardstock, 12 x 12 in: the supplies say 2 sheets, but the sheet plan needs 3 sheets of 12 x 12 in kraft cardstock',
        fix: { quantity: '3 sheets' },
      },
    ]);
    expect(first.body.unresolved).toEqual([first.body.checks[0].message]);

    // The one-click fix is a change of the quantity to the offered text.
    expect((await maker.patch(`/api/supplies/${s.body.id}`, { quantity: first.body.checks[0].fix.quantity })).status).toBe(200);
    const fixed = await maker.get(url);
    expect(fixed.body.checks[0]).toMatchObject({ status: 'ok', stated: 3, fix: null });
    expect(fixed.body.unresolved).toEqual([]);

    // Accepted on purpose: quiet while the plan needs 3, back when the count changes.
    await maker.patch(`/api/supplies/${s.body.id}`, { quantity: '2 sheets' });
    const accepted = await maker.patch(`/api/supplies/${s.body.id}`, { acceptedSheetNeed: 3 });
    expect(accepted.body.acceptedSheetNeed).toBe(3);
    expect((await maker.get(url)).body).toMatchObject({ checks: [{ status: 'accepted' }], unresolved: [] });
    await maker.patch(`/api/supplies/${s.body.id}`, { quantity: '1 sheet' });
    expect((await maker.get(url)).body).toMatchObject({ checks: [{ status: 'short', stated: 1 }] });
    expect((await maker.patch(`/api/supplies/${s.body.id}`, { acceptedSheetNeed: 0 })).status).toBe(400);
  });

  it('publishing with an open warning answers 409 naming it; with confirmWarnings it publishes', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await threeCircles(maker, f.tutorial.id);
    await maker.post(`/api/tutorials/${f.tutorial.id}/supplies`, { category: 'cardstock', name: 'Kraft cardstock', quantity: 'two sheets' });
    await Tutorial.update({ state: 'approved' }, { where: { id: f.tutorial.id } });
    const coordinator = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/state`;
    // The maker may not publish at all: 403 comes before the warnings.
    expect((await maker.post(url, { action: 'publish' })).status).toBe(403);
    const refused = await coordinator.post(url, { action: 'publish' });
    expect(refused.status).toBe(409);
    expect(refused.body.code).toBe('unconfirmed-warnings');
    expect(refused.body.warnings).toEqual(['Kraft cardstock: the supplies say 2 sheets, but the sheet plan needs 3 sheets of 12 x 12 in kraft cardstock']);
    expect(refused.body.error).toContain('the sheet plan needs 3 sheets');
    expect((await Tutorial.findByPk(f.tutorial.id))!.state).toBe('approved');
    const published = await coordinator.post(url, { action: 'publish', confirmWarnings: true });
    expect(published.status).toBe(200);
    expect(published.body.state).toBe('published');
  });
});
