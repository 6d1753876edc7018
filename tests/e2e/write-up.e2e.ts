import { readFile } from 'node:fs/promises';
import { describe, expect, it } from 'vitest';
import type { APIRequestContext, Page } from 'playwright-core';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import { shot, signIn, useBrowser } from './browser';

const browser = useBrowser();

// A timed transcript of our own for a round gift box (WebVTT, W3C: "WEBVTT" then cues).
const TRANSCRIPT = `WEBVTT

00:00.000 --> 00:02.000
First we cut two circles from the kraft cardstock.

00:02.500 --> 00:04.500
Now we wrap the wall strip around the base and glue the tabs.
`;

/** State-changing API calls carry the session's CSRF token, as the client does (OWASP CSRF Prevention). */
async function csrfHeaders(request: APIRequestContext) {
  const { token } = (await (await request.get('/api/auth/csrf')).json()) as { token: string };
  return { 'x-csrf-token': token };
}

/** A recording, its transcript and two chapters, through the API with the page's session cookie. */
async function addFootage(request: APIRequestContext, tutorialId: string) {
  const headers = await csrfHeaders(request);
  const clip = await colourSteps(await tempDir());
  const up = await request.post(`/api/tutorials/${tutorialId}/recordings`, {
    headers,
    multipart: { file: { name: 'round-box.mp4', mimeType: 'video/mp4', buffer: await readFile(clip) } },
  });
  expect(up.status()).toBe(201);
  const recordingId = ((await up.json()) as { id: string }).id;
  const vtt = await request.post(`/api/recordings/${recordingId}/transcript`, {
    headers,
    multipart: { file: { name: 'round-box.vtt', mimeType: 'text/vtt', buffer: Buffer.from(TRANSCRIPT) } },
  });
  expect(vtt.ok()).toBe(true);
  for (const [title, startMs] of [
    ['Cut the circles', 0],
    ['Wrap the wall', 2500],
  ] as const) {
    const c = await request.post(`/api/recordings/${recordingId}/chapters`, { headers, data: { title, startMs } });
    expect(c.status()).toBe(201);
  }
}

const saveStatus = (page: Page) => page.getByRole('toolbar', { name: 'Write-up tools' }).getByRole('status');
const savedNow = (page: Page) => expect.poll(() => saveStatus(page).innerText(), { timeout: 15_000 }).toMatch(/^Saved \d\d:\d\d$/);
const step = (page: Page, n: number, title: string) => page.getByRole('region', { name: `Step ${n}: ${title}` });

/** Puts the cursor at the end of a step's first paragraph (not of its first visual line, as End would) and types there. */
async function typeInStep(page: Page, n: number, title: string, text: string) {
  const p = step(page, n, title).locator('p').first();
  await p.click();
  await p.evaluate((el) => {
    const r = document.createRange();
    r.selectNodeContents(el);
    r.collapse(false);
    getSelection()!.removeAllRanges();
    getSelection()!.addRange(r);
  });
  await page.keyboard.type(text);
}

const articleText = async (request: APIRequestContext, tutorialId: string) => {
  const a = (await (await request.get(`/api/tutorials/${tutorialId}/article`)).json()) as { doc: unknown; version: number };
  return { text: JSON.stringify(a.doc), version: a.version };
};

describe('the write-up in the browser', () => {
  it('drafts from the footage, autosaves an edit that survives a reload and going offline, and shows a conflict with "keep mine"', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const email = `writer-${Date.now()}@e2e.example`;
    const password = 'round boxes with wrapped lids';
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Juniper Hale');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByLabel('Studio name').fill('Hale Paper Goods');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Round gift box');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1]!;

    // Without footage the draft says where to go first.
    await page.getByRole('link', { name: 'Write-up', exact: true }).click();
    await expect.poll(() => page.getByText('This write-up is empty').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Make a first draft' }).click();
    await expect.poll(() => page.getByRole('link', { name: 'Go to Footage' }).isVisible()).toBe(true);
    await shot(page, 'write-up-empty');

    await addFootage(page.request, tutorialId);
    // An empty write-up takes the draft without asking; one step per chapter, in time order.
    await page.getByRole('button', { name: 'Make a first draft' }).click();
    await expect.poll(() => step(page, 1, 'Cut the circles').isVisible()).toBe(true);
    expect(await step(page, 2, 'Wrap the wall').isVisible()).toBe(true);
    expect(await step(page, 1, 'Cut the circles').getByText('cut two circles from the kraft cardstock').isVisible()).toBe(true);
    // The time chip links to the Footage section at the step's time (2.5 s = 2500 ms).
    expect(await step(page, 2, 'Wrap the wall').getByRole('link', { name: '▶ 0:02' }).getAttribute('href')).toBe(`/tutorials/${tutorialId}/footage?t=2500`);
    await savedNow(page);

    // An edit is saved a moment after typing stops, and is there after a reload.
    await typeInStep(page, 1, 'Cut the circles', ' Use a circle cutter set to 3 in.');
    await expect.poll(() => saveStatus(page).innerText()).toMatch(/^Saving…$|^Saved/);
    await savedNow(page);
    expect((await articleText(page.request, tutorialId)).text).toContain('Use a circle cutter set to 3 in.');
    await page.reload();
    await expect.poll(() => step(page, 1, 'Cut the circles').getByText('cardstock. Use a circle cutter set to 3 in.').isVisible()).toBe(true);
    await shot(page, 'write-up-drafted');

    // Offline: the status says so, the edit waits on the device, and goes out when the browser is back online.
    await ctx.setOffline(true);
    await typeInStep(page, 2, 'Wrap the wall', ' Hold it with clips.');
    await expect.poll(() => saveStatus(page).innerText(), { timeout: 10_000 }).toBe('Offline — changes kept on this device');
    const kept = await page.evaluate((id) => localStorage.getItem(`cardwright:write-up:${id}`), tutorialId);
    expect(kept).toContain('Hold it with clips.');
    await ctx.setOffline(false);
    await savedNow(page);
    expect((await articleText(page.request, tutorialId)).text).toContain('Hold it with clips.');
    expect(await page.evaluate((id) => localStorage.getItem(`cardwright:write-up:${id}`), tutorialId)).toBeNull();

    // The same person in a second browser: both start from the same version.
    const ctx2 = await browser.context();
    const other = await ctx2.newPage();
    await signIn(other, email, password);
    await other.goto(`/tutorials/${tutorialId}/write-up`);
    await expect.poll(() => step(other, 1, 'Cut the circles').isVisible()).toBe(true);

    await typeInStep(page, 2, 'Wrap the wall', ' Let the glue set for a minute.');
    await savedNow(page);
    await typeInStep(other, 1, 'Cut the circles', ' Keep the offcuts for the lid.');
    // The second save is refused as stale: both versions side by side, who saved the newer one, nothing lost.
    const banner = other.getByRole('alert').filter({ hasText: 'Someone saved a newer version while you were editing' });
    await expect.poll(() => banner.isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await banner.getByText('You (in another tab or on another device)').isVisible()).toBe(true);
    expect(await other.getByRole('region', { name: 'Their version' }).getByText('Let the glue set for a minute.').isVisible()).toBe(true);
    expect(await other.getByRole('region', { name: 'Your version' }).getByText('Keep the offcuts for the lid.').isVisible()).toBe(true);
    expect(await saveStatus(other).innerText()).toBe('Not saved: someone saved a newer version');
    await shot(other, 'write-up-conflict');

    const before = await articleText(page.request, tutorialId);
    await other.getByRole('button', { name: 'Keep my version' }).click();
    await savedNow(other);
    expect(await banner.count()).toBe(0);
    const after = await articleText(page.request, tutorialId);
    expect(after.version).toBe(before.version + 1);
    expect(after.text).toContain('Keep the offcuts for the lid.');
    expect(after.text).not.toContain('Let the glue set for a minute.');
    await shot(other, 'write-up-kept-mine');
    await ctx2.close();
    await ctx.close();
  });
});
