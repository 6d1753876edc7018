import { readFile } from 'node:fs/promises';
import { describe, expect, it } from 'vitest';
import type { Download, Locator, Page } from 'playwright-core';
import { BASE, shot, useBrowser } from './browser';

const browser = useBrowser();

/** Clicks a download button and returns the file the browser saved. */
async function download(page: Page, button: Locator): Promise<{ name: string; data: Buffer }> {
  const [d] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), button.click()]);
  const path = await (d as Download).path();
  return { name: d.suggestedFilename(), data: await readFile(path!) };
}

// Scenario of our own: a pillow box with a window, taken from an empty draft to a public page.
describe('the Publish section in the browser', () => {
  it('downloads every export, opens the print view, moves through review and publishes a page visitors can read', async () => {
    const ctx = await browser.context();
    await ctx.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: BASE });
    const page = await ctx.newPage();
    const email = `publisher-${Date.now()}@e2e.example`;
    const title = 'Pillow box with a window';

    // The new person owns their studio, so they may review and publish their own tutorial.
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Tamsin Reyes');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('vellum windows and kraft');
    await page.getByLabel('Studio name').fill('Reyes Fold Studio');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill(title);
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1]!;

    // An empty draft: the template says the cut list is empty and where to fill it.
    await page.getByRole('link', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/publish$/);
    const status = page.getByRole('region', { name: 'Status' });
    await expect.poll(() => status.getByText('This tutorial is a draft.').isVisible()).toBe(true);
    const template = page.getByRole('region', { name: 'Cutting template' });
    await expect.poll(() => template.getByText('The cut list is empty').isVisible()).toBe(true);
    expect(await template.getByRole('button', { name: 'Download PDF' }).count()).toBe(0);
    const empty = await page.evaluate(async (id) => {
      const r = await fetch(`/api/tutorials/${id}/export/template.pdf?paper=letter`);
      return { status: r.status, body: await r.json() };
    }, tutorialId);
    expect(empty.status).toBe(409);
    expect(empty.body.error).toMatch(/cut list is empty/);
    const description = page.getByRole('region', { name: 'Video description' });
    await expect.poll(() => description.getByText(/No chapter list yet/).isVisible()).toBe(true);
    await shot(page, 'publish-empty-draft');

    // Two pieces through the Cut list UI: both fit on a Letter page.
    await template.getByRole('link', { name: 'Go to the Cut list' }).click();
    await page.waitForURL(/\/cut-list$/);
    const form = page.getByRole('form', { name: 'Add a piece' });
    for (const [name, width, length] of [
      ['Box body', '4', '6'],
      ['Window frame', '3', '2 1/2'],
    ]) {
      await form.getByLabel('Name').fill(name!);
      await form.getByLabel('Width').fill(width!);
      await form.getByLabel('Length').fill(length!);
      await form.getByRole('button', { name: 'Add piece' }).click();
      await expect.poll(() => page.getByRole('row', { name, exact: true }).isVisible()).toBe(true);
    }
    await page.getByRole('link', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/publish$/);

    // The video address is checked with the server's schema; a bad one is refused in words.
    const video = page.getByRole('form', { name: 'Video address' });
    await video.getByLabel('Video address').fill('video.example/pillow-box');
    await video.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => video.getByRole('alert').filter({ hasText: 'Use the full address of the video, starting with https://' }).isVisible()).toBe(true);
    await video.getByLabel('Video address').fill('https://video.example/watch/pillow-box');
    await video.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => video.getByText('Saved the video address.').isVisible()).toBe(true);

    // Blog post: a scriptless sandboxed preview, Copy HTML as text/html, the zip and the page.
    const blog = page.getByRole('region', { name: 'Blog post' });
    const preview = blog.locator('iframe[title="Blog post preview"]');
    expect(await preview.getAttribute('sandbox')).not.toContain('allow-scripts');
    await expect.poll(() => page.frameLocator('iframe[title="Blog post preview"]').getByRole('heading', { name: title, level: 1 }).isVisible()).toBe(true);
    await blog.getByRole('button', { name: 'Copy HTML' }).click();
    await expect.poll(() => blog.getByText('Copied: paste into your blog editor').isVisible()).toBe(true);
    const clip = await page.evaluate(async () => {
      const [item] = await navigator.clipboard.read();
      return { types: item!.types, html: await (await item!.getType('text/html')).text() };
    });
    expect(clip.types).toEqual(expect.arrayContaining(['text/html', 'text/plain']));
    expect(clip.html).toContain(`<h1>${title}</h1>`);
    expect(clip.html).not.toMatch(/<script(?![^>]*application\/ld\+json)/);

    // File signatures: zip local file header "PK\x03\x04" (PKWARE APPNOTE 4.3.7); PDF header "%PDF-" (ISO 32000-1, 7.5.2).
    const zip = await download(page, blog.getByRole('button', { name: 'Download zip' }));
    expect(zip.name).toMatch(/\.zip$/);
    expect(zip.data.subarray(0, 4).toString('latin1')).toBe('PK\x03\x04');
    expect(zip.data.includes(Buffer.from('index.html'))).toBe(true);
    const html = await download(page, blog.getByRole('button', { name: 'Download HTML' }));
    expect(html.name).toMatch(/\.html$/);
    expect(html.data.toString('utf8')).toMatch(/^<!DOCTYPE html>/i);
    expect(html.data.toString('utf8')).toContain(title);

    // Handout on A4, remembered after a reload. A4 is 595.28 x 841.89 pt (PDF reference; ISO 216 210 x 297 mm).
    const handout = page.getByRole('region', { name: 'Handout' });
    await handout.getByText('A4', { exact: true }).click();
    const a4 = await download(page, handout.getByRole('button', { name: 'Download PDF' }));
    expect(a4.data.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(a4.name).toMatch(/a4\.pdf$/);
    expect(a4.data.toString('latin1')).toMatch(/\/MediaBox \[0 0 595\.28 841\.89\]/);
    await page.reload();
    expect(await page.getByRole('region', { name: 'Handout' }).getByRole('radio', { name: 'A4' }).isChecked()).toBe(true);

    // Cutting template on Letter: 612 x 792 pt (PDF reference) and an SVG sized in inches (ANSI Letter 8.5 x 11 in).
    const tpl = page.getByRole('region', { name: 'Cutting template' });
    await tpl.getByText('Letter', { exact: true }).click();
    await expect.poll(() => tpl.getByText('Print at 100% (actual size) and check the 1 in square', { exact: false }).isVisible()).toBe(true);
    const tplPdf = await download(page, tpl.getByRole('button', { name: 'Download PDF' }));
    expect(tplPdf.data.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(tplPdf.data.toString('latin1')).toMatch(/\/MediaBox \[0 0 612 792\]/);
    const svg = await download(page, tpl.getByRole('button', { name: 'Download SVG' }));
    expect(svg.name).toMatch(/\.svg$/);
    const svgText = svg.data.toString('utf8');
    expect(svgText).toContain('<svg');
    expect(svgText).toContain('width="8.5in"');
    expect(svgText).toContain('height="11in"');
    expect(svgText).toContain('Box body');

    // Video description: the text, and the same as a .txt file.
    const desc = page.getByRole('region', { name: 'Video description' });
    const shown = await desc.getByLabel('Video description text').inputValue();
    expect(shown).toContain(title);
    const txt = await download(page, desc.getByRole('button', { name: 'Download .txt' }));
    expect(txt.name).toMatch(/\.txt$/);
    expect(txt.data.toString('utf8')).toBe(shown);
    await shot(page, 'publish-draft-exports');

    // The print view opens in a new tab with its Print button.
    const [print] = await Promise.all([
      ctx.waitForEvent('page'),
      page
        .getByRole('region', { name: 'Handout' })
        .getByRole('link', { name: /Open print view/ })
        .click(),
    ]);
    await print.waitForLoadState();
    expect(print.url()).toContain(`/print/${tutorialId}?paper=a4`);
    expect(await print.getByRole('button', { name: 'Print' }).isVisible()).toBe(true);
    // The print view of an empty write-up has no heading of its own yet; its document title names the tutorial.
    expect(await print.title()).toContain(title);
    await shot(print, 'publish-print-view');
    await print.close();

    // Review: send for review -> approve -> publish, each move shown at once in the header.
    const header = page.locator('main').first();
    for (const [button, state] of [
      ['Send for review', 'in review'],
      ['Approve', 'approved'],
      ['Publish', 'published'],
    ] as const) {
      await status.getByRole('button', { name: button, exact: true }).click();
      // Sending for review and approving ask for a note first (left empty here).
      if (button !== 'Publish') await status.getByRole('form', { name: button }).getByRole('button', { name: button, exact: true }).click();
      await expect.poll(() => status.getByText(`Done: the tutorial is now ${state}.`).isVisible()).toBe(true);
      await expect.poll(() => header.getByText(state, { exact: true }).first().isVisible()).toBe(true);
      if (state === 'approved') {
        expect(
          await status
            .getByText(/^Publishing makes the page and exports public at http:\/\/127\.0\.0\.1:\d+\/t\/[a-z0-9-]+\/pillow-box-with-a-window\.$/)
            .isVisible(),
        ).toBe(true);
        await shot(page, 'publish-approved');
      }
    }
    const publicLink = status.getByRole('link', { name: /Open/ });
    const href = await publicLink.getAttribute('href');
    expect(href).toMatch(/\/t\/[a-z0-9-]+\/pillow-box-with-a-window$/);
    expect(await status.getByRole('button', { name: 'Unpublish' }).isVisible()).toBe(true);
    await shot(page, 'publish-published');

    // A visitor, signed out, reads the public page.
    const visitorCtx = await browser.context();
    const visitor = await visitorCtx.newPage();
    const res = await visitor.goto(href!);
    expect(res?.status()).toBe(200);
    expect(await visitor.getByRole('heading', { name: title, level: 1 }).isVisible()).toBe(true);
    expect(await visitor.getByRole('link', { name: 'Cutting template PDF (Letter)' }).isVisible()).toBe(true);
    await shot(visitor, 'publish-public-page');

    // Unpublishing asks first, then the visitor's page is gone.
    await status.getByRole('button', { name: 'Unpublish' }).click();
    const dialog = page.getByRole('dialog').filter({ hasText: `Unpublish “${title}”?` });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    await dialog.getByRole('button', { name: 'Unpublish' }).click();
    await expect.poll(() => status.getByText('Done: the tutorial is now approved.').isVisible()).toBe(true);
    expect(await status.getByRole('button', { name: 'Publish', exact: true }).isVisible()).toBe(true);
    expect((await visitor.goto(href!))?.status()).toBe(404);
    expect(await visitor.getByRole('heading', { name: 'This tutorial is not here' }).isVisible()).toBe(true);
    await visitorCtx.close();
    await ctx.close();
  });
});
