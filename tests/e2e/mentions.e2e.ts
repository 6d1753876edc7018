import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { APIRequestContext, Page } from 'playwright-core';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import { shot, useBrowser } from './browser';

const browser = useBrowser();

// A tea-light lantern, said as crafters say it (our own words): a title line before the first
// timed line, a count before a size, a range, repeated score lines and a self-correction.
const TRANSCRIPT = `# Lantern session transcript

0:00 Cut three 4 by 6 mats for the panels,
0:01 and the flap can be somewhere from a quarter to three eighths.
0:02 Then score every quarter inch down the flap.
0:03 The band is 10 inches, no wait, 11.
`;

/** State-changing API calls carry the session's CSRF token, as the client does (OWASP CSRF Prevention). */
async function csrfHeaders(request: APIRequestContext) {
  const { token } = (await (await request.get('/api/auth/csrf')).json()) as { token: string };
  return { 'x-csrf-token': token };
}

/** axe-core's WCAG A/AA rules over one part of the page: the violations' ids. */
async function axeViolations(page: Page, selector: string): Promise<string[]> {
  const source = await readFile(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
  // evaluated through the DevTools protocol, which the page's Content Security Policy does not govern
  await page.evaluate(source);
  return page.evaluate(async (sel) => {
    const axe = (
      window as unknown as {
        axe: { run: (c: unknown, o: unknown) => Promise<{ violations: { id: string; nodes: { target: string[]; failureSummary?: string }[] }[] }> };
      }
    ).axe;
    const r = await axe.run({ include: [sel] }, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'] } });
    return r.violations.flatMap((v) => v.nodes.map((n) => `${v.id}: ${n.target.join(' ')} ${n.failureSummary ?? ''}`));
  }, selector);
}

describe('mentions read from real speech (issue 11)', () => {
  it('shows a count, a range and repeated score lines; a count sets the quantity and a step fills a piece’s side', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const email = `lantern-${Date.now()}@e2e.example`;
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Ines Marlow');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('tea light lantern panels');
    await page.getByLabel('Studio name').fill('Marlow Paper Studio');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Tea-light lantern');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1]!;

    const headers = await csrfHeaders(page.request);
    const clip = await colourSteps(await tempDir());
    const up = await page.request.post(`/api/tutorials/${tutorialId}/recordings`, {
      headers,
      multipart: { file: { name: 'lantern.mp4', mimeType: 'video/mp4', buffer: await readFile(clip) } },
    });
    expect(up.status()).toBe(201);
    const recordingId = ((await up.json()) as { id: string }).id;
    const t = await page.request.post(`/api/recordings/${recordingId}/transcript`, {
      headers,
      multipart: { file: { name: 'lantern.txt', mimeType: 'text/plain', buffer: Buffer.from(TRANSCRIPT) } },
    });
    expect(t.status()).toBe(201);
    expect(((await t.json()) as { notices: string[] }).notices).toEqual([
      "line 1: skipped a title or header line before the first timed line ('# Lantern session transcript')",
    ]);

    await page.getByRole('link', { name: 'Cut list', exact: true }).click();
    await page.waitForURL(/\/cut-list$/);
    const panel = page.locator('section[aria-labelledby="mentions-title"]');
    const at = (time: string) => panel.getByRole('listitem', { name: `Mention at ${time}` });
    await expect.poll(() => at('0:00').getByText('× 3', { exact: true }).isVisible()).toBe(true);
    expect(await at('0:01').getByText('range', { exact: true }).isVisible()).toBe(true);
    expect(await at('0:01').getByText('not exact').isVisible()).toBe(true);
    expect(await at('0:01').getByRole('button', { name: 'Make a piece' }).count()).toBe(0);
    expect(await at('0:01').getByRole('button', { name: 'Use 3/8 in' }).isVisible()).toBe(true);
    expect(await at('0:02').getByText('every 1/4 in').isVisible()).toBe(true);
    expect(await at('0:03').getByText('taken back straight after').isVisible()).toBe(true);
    await shot(page, 'mentions-range-every-count');
    // Contrast is left out here: the palette's pencil and kraft tones fall short of 4.5:1 on every
    // page (reported to the lead); every other WCAG A/AA rule must pass on the panel.
    expect((await axeViolations(page, 'section[aria-labelledby="mentions-title"]')).filter((v) => !v.startsWith('color-contrast'))).toEqual([]);

    // The count is the quantity of the piece made from the size, named from the noun said ("mats").
    expect(await at('0:00').getByText('“Mat”, material to pick, × 3: 4 in × 6 in').isVisible()).toBe(true);
    await at('0:00').getByRole('button', { name: 'Make a piece' }).click();
    const mats = page.getByRole('row', { name: /Mat/ }).first();
    await expect.poll(() => mats.isVisible()).toBe(true);
    const pieces = (await (await page.request.get(`/api/tutorials/${tutorialId}/pieces`)).json()) as {
      pieces: { name: string; quantity: number; width: { display: string } }[];
    };
    expect(pieces.pieces.map((p) => [p.name, p.quantity, p.width.display])).toEqual([['Mat', 3, '4 in']]);
    // Used now: it says where it went, no longer counts as to go through, and a second piece needs saying so.
    expect(await at('0:00').getByText('In the cut list as “Mat”').isVisible()).toBe(true);
    expect(await at('0:00').getByRole('button', { name: 'Make another piece' }).isVisible()).toBe(true);
    // five said: the size is used and the taken-back length does not count
    expect(await panel.getByText('3 of 5 to go through').isVisible()).toBe(true);

    // A flap 4 in wide and 1 1/2 in long takes the step along its length: 1/4 ... 1 1/4 in, 5 lines (worked by hand).
    const form = page.getByRole('form', { name: 'Add a piece' });
    await form.getByLabel('Name').fill('Flap');
    await form.getByLabel('Width').fill('4');
    await form.getByLabel('Length').fill('1 1/2');
    await form.getByRole('button', { name: 'Add piece' }).click();
    await expect.poll(() => page.getByRole('row', { name: 'Flap' }).first().isVisible()).toBe(true);
    await at('0:02').getByRole('button', { name: 'Add as score line to…' }).click();
    await at('0:02').getByLabel('Piece to score').selectOption({ label: 'Flap' });
    await at('0:02').getByLabel('Measured on').selectOption('height');
    await at('0:02').getByRole('button', { name: 'Add', exact: true }).click();
    const flap = page.getByRole('row', { name: 'Flap' }).first();
    await expect.poll(() => flap.getByText('every 1/4 in').isVisible()).toBe(true);
    expect(await flap.getByText('on length · 1/4 in to 1 1/4 in (5 lines)').isVisible()).toBe(true);
    await expect.poll(() => at('0:02').getByText('Score lines of “Flap”').isVisible()).toBe(true);
    await shot(page, 'cut-list-every-quarter-inch');

    await page.setViewportSize({ width: 390, height: 844 });
    await shot(page, 'mentions-390');
    // The mentions panel itself fits the phone width (the pieces table scrolls sideways on its own).
    const panelBox = await panel.boundingBox();
    expect(panelBox!.x).toBeGreaterThanOrEqual(0);
    expect(panelBox!.x + panelBox!.width).toBeLessThanOrEqual(390);
    await ctx.close();
  });
});
