import { describe, expect, it } from 'vitest';
import { shot, useBrowser } from './browser';

const browser = useBrowser();

// Scenario of our own: a hexagon treat box with a wrapped round lid.
describe('the cut list in the browser', () => {
  it('adds a piece from spoken words, edits it inline, shows checks, uses the wrap helper and draws the sheet plan', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const email = `cutter-${Date.now()}@e2e.example`;

    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Wren Calloway');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('kraft paper hexagon lids');
    await page.getByLabel('Studio name').fill('Calloway Card Co.');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Hexagon treat box');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);

    await page.getByRole('link', { name: 'Cut list', exact: true }).click();
    await page.waitForURL(/\/cut-list$/);
    await expect.poll(() => page.getByText('No pieces yet').isVisible()).toBe(true);
    await expect.poll(() => page.getByText('No transcript yet').isVisible()).toBe(true);
    await shot(page, 'cut-list-empty');

    // 10 9/16 in x 25.4 mm/in = 268.2875 mm (1 in = 25.4 mm exactly, NIST SP 811 App. B)
    const form = page.getByRole('form', { name: 'Add a piece' });
    await form.getByLabel('Name').fill('Side panel');
    await form.getByLabel('Width').fill('ten and nine sixteenths');
    await expect.poll(() => form.getByText('→ 10 9/16 in · 268.3 mm').isVisible()).toBe(true);
    await form.getByLabel('Length').fill('2 1/2');
    await form.getByRole('button', { name: 'Add piece' }).click();
    const side = page.getByRole('row', { name: 'Side panel' });
    await expect.poll(() => side.getByText('10 9/16 in', { exact: true }).isVisible()).toBe(true);
    expect(await side.getByText('268.3 mm', { exact: true }).isVisible()).toBe(true);
    expect(await side.getByText('63.5 mm', { exact: true }).isVisible()).toBe(true);

    // Inline: a spoken length previews as read (2.75 x 25.4 = 69.85 mm, NIST SP 811) and saves on Enter.
    await page.getByRole('button', { name: 'Edit length of Side panel' }).click();
    await page.getByLabel('length of Side panel', { exact: true }).fill('two and three quarters');
    await expect.poll(() => page.getByText('→ 2 3/4 in · 69.9 mm').isVisible()).toBe(true);
    await page.getByLabel('length of Side panel', { exact: true }).press('Enter');
    await expect.poll(() => side.getByText('2 3/4 in', { exact: true }).isVisible()).toBe(true);

    // Unreadable text is refused in words and kept for fixing; Escape puts the old value back.
    await page.getByRole('button', { name: 'Edit width of Side panel' }).click();
    await page.getByLabel('width of Side panel', { exact: true }).fill('as long as the lid');
    await page.getByLabel('width of Side panel', { exact: true }).press('Enter');
    await expect.poll(() => page.getByRole('alert').filter({ hasText: 'Could not read “as long as the lid”' }).isVisible()).toBe(true);
    expect(await page.getByLabel('width of Side panel', { exact: true }).inputValue()).toBe('as long as the lid');
    await page.getByLabel('width of Side panel', { exact: true }).press('Escape');
    await expect.poll(() => side.getByText('10 9/16 in', { exact: true }).isVisible()).toBe(true);
    expect(await page.getByText('All checks pass').count()).toBe(1);

    // 13 mm = 0.5118 in (NIST SP 811), between the 1/16 in marks; nearest 8/16 = 1/2 in.
    await page.getByRole('button', { name: 'Edit width of Side panel' }).click();
    await page.getByLabel('width of Side panel', { exact: true }).fill('13 mm');
    await page.getByLabel('width of Side panel', { exact: true }).press('Enter');
    await expect.poll(() => page.getByText(/Width 13 mm .*is between the 1\/16 in marks: nearest 1\/2 in/).isVisible()).toBe(true);
    expect(await page.getByText('Warning:').count()).toBe(1);
    await shot(page, 'cut-list-check');

    // Wrap helper, worked example: pi x 6 3/8 / 2 + 1/2 = 10.5138 in, rounded up to the 1/16 mark: 10 9/16 in
    // (round wrap strips up: common practice; REFERENCES.md "Geometry").
    await page.getByLabel('Diameter', { exact: true }).fill('6 3/8');
    await page.getByLabel('Number of strips').fill('2');
    await page.getByLabel('Overlap per strip').fill('1/2');
    const panel = page.getByRole('tabpanel');
    await expect.poll(() => panel.getByText('Cut 2 strips 10 9/16 in').isVisible()).toBe(true);
    expect(
      await panel
        .getByText(/10\.5138 in/)
        .first()
        .isVisible(),
    ).toBe(true);
    await panel.getByLabel('Wall height').fill('2 1/2');
    await panel.getByRole('button', { name: 'Add as piece' }).click();
    await expect.poll(() => panel.getByText('Added “Wall strip” to the cut list.').isVisible()).toBe(true);
    const wall = page.getByRole('row', { name: 'Wall strip' });
    await expect.poll(() => wall.getByText('10 9/16 in', { exact: true }).isVisible()).toBe(true);
    expect(await wall.getByRole('button', { name: 'Edit quantity of Wall strip' }).innerText()).toBe('2');
    await shot(page, 'cut-list-wrap');

    await page.getByRole('tab', { name: 'Sheet plan' }).click();
    await page.getByLabel('Kits').fill('3');
    const sheet = page.getByRole('img', { name: /sheets? 1 (of|to)/ }).first();
    await expect.poll(() => sheet.isVisible()).toBe(true);
    expect(await sheet.evaluate((el) => el.tagName.toLowerCase())).toBe('svg');
    // No material given: the plan uses 12 x 12 in sheets (common practice), so the drawing is 12 by 12 inches.
    expect(await sheet.getAttribute('viewBox')).toBe('0 0 12 12');
    expect(await sheet.locator('rect').count()).toBeGreaterThan(3);
    await shot(page, 'cut-list-sheet-plan');
    // a class: identical sheets are drawn once, with their count
    await page.getByLabel('Kits').fill('30');
    await expect
      .poll(() =>
        page
          .getByText(/\d+ sheets like this/)
          .first()
          .isVisible(),
      )
      .toBe(true);
    expect(await page.getByRole('img', { name: /all alike/ }).count()).toBeGreaterThan(0);
    await shot(page, 'cut-list-sheet-plan-class');
    await ctx.close();
  });
});
