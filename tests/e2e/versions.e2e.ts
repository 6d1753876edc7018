import { describe, expect, it } from 'vitest';
import { checkPage, describeViolations, watchConsole } from './a11y';
import { signIn, useBrowser, call } from './browser';

const browser = useBrowser();
const PASSWORD = 'cardwright-demo';

const doc = (text: string) => ({
  type: 'doc',
  content: [
    {
      type: 'step',
      content: [
        { type: 'stepTitle', content: [{ type: 'text', text: 'Wrap the lid' }] },
        { type: 'paragraph', content: [{ type: 'text', text }] },
      ],
    },
  ],
});

// Scenario of our own: a published bookmark gets an update (new wording, a wider tassel strip),
// which the maker compares and sends, and the coordinator approves and publishes.
describe('a published tutorial and its update in the browser (DESIGN.md T4)', () => {
  it('the workspace says it is live; an edit shows "update pending" and what changed; the update goes out only once published', async () => {
    const makerCtx = await browser.context();
    const coordCtx = await browser.context();
    const maker = await makerCtx.newPage();
    const coord = await coordCtx.newPage();
    const noise = [watchConsole(maker), watchConsole(coord)];
    await signIn(maker, 'maker@example.com', PASSWORD);
    await signIn(coord, 'coordinator@example.com', PASSWORD);

    const me = await call<{ studios: { id: string; name: string; slug: string }[] }>(maker, 'GET', '/api/auth/me');
    const studio = me.body.studios.find((s) => s.name === 'Juniper Lane Paper Co.')!;
    const made = await call<{ id: string; slug: string }>(maker, 'POST', '/api/tutorials', { studioId: studio.id, title: 'Tasselled bookmark' });
    const id = made.body.id;
    expect((await call(maker, 'PUT', `/api/tutorials/${id}/article`, { version: 0, doc: doc('Glue the kraft band around the card.') })).status).toBe(200);
    const piece = await call<{ id: string }>(maker, 'POST', `/api/tutorials/${id}/pieces`, { name: 'Tassel strip', width: '2 in', height: '6 in' });
    expect(piece.status).toBe(201);
    expect((await call(maker, 'POST', `/api/tutorials/${id}/state`, { action: 'submit' })).status).toBe(200);
    for (const action of ['approve', 'publish']) expect((await call(coord, 'POST', `/api/tutorials/${id}/state`, { action })).status).toBe(200);

    // Live, no update: the workspace says edits become an update.
    await maker.goto(`/tutorials/${id}/cut-list`);
    await expect.poll(() => maker.getByText('This tutorial is live.').isVisible()).toBe(true);

    // The maker's edits after publishing: new wording and a wider strip.
    const { version } = (await call<{ version: number }>(maker, 'GET', `/api/tutorials/${id}/article`)).body;
    expect((await call(maker, 'PUT', `/api/tutorials/${id}/article`, { version, doc: doc('Glue the linen band around the card.') })).status).toBe(200);
    expect((await call(maker, 'PATCH', `/api/pieces/${piece.body.id}`, { width: '2 1/4 in' })).status).toBe(200);

    await maker.setViewportSize({ width: 1280, height: 860 });
    await coord.setViewportSize({ width: 1280, height: 860 });
    await maker.goto(`/tutorials/${id}/write-up`);
    await expect.poll(() => maker.getByText('Update pending (draft).').isVisible()).toBe(true);
    await maker.getByRole('link', { name: 'See what changed' }).click();
    await maker.waitForURL(/\/publish#what-changed$/);
    const changed = maker.getByRole('region', { name: 'What changed' });
    await expect.poll(() => changed.getByText('Struck-through words were taken out').isVisible()).toBe(true);
    expect(await changed.locator('del').allInnerTexts()).toContain('kraft');
    expect(await changed.locator('ins').allInnerTexts()).toEqual(expect.arrayContaining(['linen', expect.stringContaining('2 1/4 x 6 in')]));
    // Not started from a brief: no brief shows.
    expect(await maker.getByRole('region', { name: 'The brief' }).count()).toBe(0);
    const checks = [await checkPage(maker, 'versions-what-changed')];
    await maker.setViewportSize({ width: 390, height: 844 });
    checks.push(await checkPage(maker, 'versions-what-changed'));
    await maker.setViewportSize({ width: 1280, height: 860 });

    // Readers still get the published wording.
    const page = async () => (await coord.request.get(`/t/${studio.slug}/${made.body.slug}`)).text();
    expect(await page()).toContain('kraft band');

    // The maker sends the update; the coordinator approves and publishes it.
    const status = maker.getByRole('region', { name: 'Status' });
    await status.getByRole('button', { name: 'Send the update for review' }).click();
    await status.getByLabel('A short note for the coordinator').fill('Linen band instead of kraft; the strip is a quarter inch wider.');
    await status.getByRole('button', { name: 'Send for review', exact: true }).click();
    await expect.poll(() => status.getByText('Done: the update is now in review.').isVisible()).toBe(true);

    await coord.goto(`/tutorials/${id}/publish`);
    const coordStatus = coord.getByRole('region', { name: 'Status' });
    await expect.poll(() => coordStatus.getByText('The update is in review.').isVisible()).toBe(true);
    checks.push(await checkPage(coord, 'versions-update-in-review'));
    await coordStatus.getByRole('button', { name: 'Approve the update' }).click();
    await coordStatus.getByRole('button', { name: 'Approve', exact: true }).click();
    await expect.poll(() => coordStatus.getByRole('button', { name: 'Publish the update' }).isVisible()).toBe(true);
    expect(await page()).toContain('kraft band');
    await coordStatus.getByRole('button', { name: 'Publish the update' }).click();
    await expect.poll(() => coordStatus.getByText('Done: the tutorial is now published.').isVisible()).toBe(true);
    expect(await page()).toContain('linen band');
    await expect.poll(() => coord.getByText('This tutorial is live.').isVisible()).toBe(true);
    // The history tells the update's moves from the first review's.
    const history = coord.getByRole('region', { name: 'History' });
    await expect.poll(() => history.getByText(/published the update/).isVisible()).toBe(true);
    await expect.poll(() => history.getByText(/approved the update/).isVisible()).toBe(true);
    await expect.poll(() => history.getByText(/sent the update for review/).isVisible()).toBe(true);

    expect(
      [
        ...checks.flatMap((c) => (c.violations.length ? [describeViolations(c.name, c.violations)] : [])),
        ...checks.filter((c) => c.overflowPx > 0).map((c) => `${c.name}: ${c.overflowPx} px wider than the window`),
        ...noise.flatMap((n) => n.take()),
      ].join('\n'),
    ).toBe('');
  }, 180_000);
});
