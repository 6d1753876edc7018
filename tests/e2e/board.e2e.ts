import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { checkPage, describeViolations } from './a11y';
import { shot, signIn, useBrowser } from './browser';

const browser = useBrowser();
const PASSWORD = 'cardwright-demo';

/** The card of a tutorial in a column of the board. */
const cardIn = (page: Page, state: string, title: string) => page.locator(`[data-column="${state}"] [aria-label="${title}"]`);

// Scenario of our own: the demo studio's coordinator asks Mina for a window card, Mina starts it, the board follows it to a scheduled publish.
describe('briefs and the studio board in the browser', () => {
  it('a coordinator hands out a brief, the maker starts it, the board shows each move (drag and button), the coordinator schedules it', async () => {
    const title = `Window card with vellum ${Date.now().toString(36)}`;
    const coordCtx = await browser.context();
    const makerCtx = await browser.context();
    const coord = await coordCtx.newPage();
    const maker = await makerCtx.newPage();
    await signIn(coord, 'coordinator@example.com', PASSWORD);
    const studioId = /\/studios\/([^/]+)/.exec(coord.url())![1]!;

    // The brief: a missing maker is named in words, nothing typed is lost.
    await coord.goto(`/studios/${studioId}/briefs`);
    const form = coord.getByRole('form', { name: 'New brief' });
    await form.getByLabel('What to make').fill(title);
    const due = new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);
    await form.getByLabel('Due').fill(due);
    await form.getByLabel('Products or papers to feature').fill('Frosted vellum sheets\nSpring Florals 6x6 pad');
    await form.getByRole('button', { name: 'Send the brief' }).click();
    await expect.poll(() => form.getByText('Pick the maker').isVisible()).toBe(true);
    expect(await form.getByLabel('What to make').inputValue()).toBe(title);
    await form.getByLabel('Maker').selectOption({ label: 'Mina Okafor' });
    await form.getByRole('button', { name: 'Send the brief' }).click();
    await expect.poll(() => form.getByText(`Sent “${title}” to Mina Okafor`).isVisible()).toBe(true);

    // The maker sees it and starts the tutorial from it.
    await signIn(maker, 'maker@example.com', PASSWORD);
    await maker.goto(`/studios/${studioId}/briefs`);
    const mine = maker.locator('li', { has: maker.getByRole('heading', { name: title }) });
    await expect.poll(() => mine.getByText('Frosted vellum sheets · Spring Florals 6x6 pad').isVisible()).toBe(true);
    await mine.getByRole('button', { name: 'Start the tutorial' }).click();
    await maker.waitForURL(/\/tutorials\//);
    const tutorialId = /\/tutorials\/([^/]+)/.exec(maker.url())![1]!;

    // The board: the card is a draft, due this week in words; the maker sends it for review with the Move button.
    await maker.goto(`/studios/${studioId}/board`);
    await expect.poll(() => cardIn(maker, 'draft', title).getByText('Due this week: in 3 days').isVisible()).toBe(true);
    await cardIn(maker, 'draft', title).getByRole('button', { name: /^Move/ }).click();
    const moves = cardIn(maker, 'draft', title).getByRole('list', { name: `Moves for ${title}` });
    expect(await moves.getByRole('button').allTextContents()).toEqual(['Send for review → in review']);
    await moves.getByRole('button', { name: 'Send for review → in review' }).click();
    await expect.poll(() => cardIn(maker, 'in_review', title).isVisible()).toBe(true);
    await shot(maker, 'board-maker-in-review');

    // The coordinator drags it to approved with the mouse.
    await coord.goto(`/studios/${studioId}/board`);
    const card = cardIn(coord, 'in_review', title);
    await expect.poll(() => card.isVisible()).toBe(true);
    const from = (await card.boundingBox())!;
    const to = (await coord.locator('[data-column="approved"]').boundingBox())!;
    await coord.mouse.move(from.x + 20, from.y + 10);
    await coord.mouse.down();
    await coord.mouse.move(from.x + 40, from.y + 20, { steps: 5 });
    await coord.mouse.move(to.x + to.width / 2, to.y + 40, { steps: 15 });
    await coord.mouse.up();
    await expect.poll(() => cardIn(coord, 'approved', title).isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => cardIn(coord, 'approved', title).getByText('moved to approved by Cass Whitlow').isVisible()).toBe(true);

    // The coordinator schedules it in the Publish section, with the time zone shown.
    await coord.goto(`/tutorials/${tutorialId}/publish`);
    // The brief it was started from sits beside the review, for both of them to check against.
    const brief = coord.getByRole('region', { name: 'The brief' });
    await expect.poll(() => brief.getByText(title, { exact: true }).isVisible()).toBe(true);
    expect(await brief.getByText('Frosted vellum sheets · Spring Florals 6x6 pad').isVisible()).toBe(true);
    expect(await brief.getByText(/For Mina Okafor · due .* · from Cass Whitlow/).isVisible()).toBe(true);
    for (const width of [1280, 390]) {
      await coord.setViewportSize({ width, height: 860 });
      const c = await checkPage(coord, 'publish-with-brief');
      expect(c.violations, describeViolations(c.name, c.violations)).toEqual([]);
      expect(c.overflowPx).toBeLessThanOrEqual(0);
    }
    await coord.setViewportSize({ width: 1360, height: 860 });
    const panel = coord.getByRole('region', { name: 'Publish later' });
    await expect.poll(() => panel.getByText(/^Time zone: /).isVisible()).toBe(true);
    const at = new Date(Date.now() + 2 * 86_400_000);
    const p = (n: number) => String(n).padStart(2, '0');
    await panel.getByLabel('Publish at').fill(`${at.getFullYear()}-${p(at.getMonth() + 1)}-${p(at.getDate())}T09:30`);
    await panel.getByRole('button', { name: 'Schedule' }).click();
    await expect.poll(() => panel.getByText(/Scheduled to publish on/).isVisible()).toBe(true);

    // The board shows the publish time on the card and in the calendar.
    await coord.goto(`/studios/${studioId}/board`);
    await expect
      .poll(() =>
        cardIn(coord, 'approved', title)
          .getByText(/Publishes .*09:30/)
          .isVisible(),
      )
      .toBe(true);
    const check = await checkPage(coord, 'board');
    expect(check.violations, describeViolations(check.name, check.violations)).toEqual([]);
    await coord.setViewportSize({ width: 390, height: 844 });
    const narrow = await checkPage(coord, 'board');
    expect(narrow.violations, describeViolations(narrow.name, narrow.violations)).toEqual([]);
    expect(narrow.overflowPx).toBeLessThanOrEqual(0);
    await coord.goto(`/studios/${studioId}/briefs`);
    const briefs = await checkPage(coord, 'briefs');
    expect(briefs.violations, describeViolations(briefs.name, briefs.violations)).toEqual([]);
    expect(briefs.overflowPx).toBeLessThanOrEqual(0);
    await coordCtx.close();
    await makerCtx.close();
  }, 240_000);
});
