import { describe, expect, it } from 'vitest';
import { shot, signIn, useBrowser } from './browser';

const browser = useBrowser();

describe('live lists in the write-up', () => {
  it('a selected cut list is not replaced by typing: it stays, the page says what it is, and Delete removes it', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await signIn(page, 'maker@example.com', 'cardwright-demo');
    await page.getByLabel('New tutorial').fill(`Tag book ${Date.now()}`);
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    await page.getByRole('link', { name: 'Write-up', exact: true }).click();
    const editor = page.locator('.ProseMirror');
    await editor.click();
    await page.keyboard.type('What you will cut');
    await page.getByRole('toolbar', { name: 'Write-up tools' }).getByRole('button', { name: 'Cut list' }).click();
    const live = editor.locator('.wu-live');
    await expect.poll(() => live.count()).toBe(1);

    // Clicking the list selects it whole; the first key typed would have replaced it.
    await live.locator('.wu-live-title').click();
    await expect.poll(() => live.evaluate((el) => el.classList.contains('is-selected'))).toBe(true);
    await page.keyboard.type('oops');
    expect(await live.count()).toBe(1);
    expect(await editor.innerText()).not.toContain('oops');
    const note = page.getByText('The cut list is a live list (it follows its section), so typing does not replace it.');
    await expect.poll(() => note.isVisible()).toBe(true);
    await shot(page, 'write-up-live-list-kept');

    await page.keyboard.press('Delete');
    await expect.poll(() => live.count()).toBe(0);
    expect(await editor.innerText()).toContain('What you will cut');
    await ctx.close();
  });
});
