import { describe, expect, it } from 'vitest';
import { DEFAULT_DISCLOSURE } from '@shared/schemas/supply';
import { shot, useBrowser } from './browser';

const browser = useBrowser();

// Scenario of our own: the supplies of a round gift box, one of them bought through a sponsored shop link.
describe('supplies in the browser', () => {
  it('adds two supplies, marks a link sponsored, sees the disclosure, rewrites it and finds it kept after a reload', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();

    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Juniper Hale');
    await page.getByLabel('E-mail').fill(`supplies-${Date.now()}@e2e.example`);
    await page.getByLabel('Password').fill('round gift boxes with lids');
    await page.getByLabel('Studio name').fill('Hale Paper Goods');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Round gift box');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1];

    await page.getByRole('link', { name: 'Supplies', exact: true }).click();
    await page.waitForURL(/\/supplies$/);
    await expect.poll(() => page.getByText('No supplies yet').isVisible()).toBe(true);
    expect(await page.getByText(/List the papers, cardstock/).isVisible()).toBe(true);
    await shot(page, 'supplies-empty');

    // The add row: Enter adds, the category follows the name, the cursor goes back to Name.
    const name = page.getByLabel('New supply name');
    await name.fill('Kraft cardstock');
    expect(await page.getByLabel('New supply category').inputValue()).toBe('cardstock');
    await page.getByLabel('New supply quantity').fill('2 sheets');
    await page.getByLabel('New supply quantity').press('Enter');
    await expect.poll(() => page.getByRole('button', { name: 'Name of Kraft cardstock: Kraft cardstock' }).isVisible()).toBe(true);
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('New supply name');

    await page.keyboard.type('Liquid glue');
    expect(await page.getByLabel('New supply category').inputValue()).toBe('adhesive');
    await page.getByLabel('New supply shop link').fill('https://www.papershop.example/liquid-glue');
    await page.getByLabel('New supply discount code').fill('ROUND10');
    await page.getByLabel('New supply discount code').press('Enter');
    await expect.poll(() => page.getByRole('button', { name: 'Name of Liquid glue: Liquid glue' }).isVisible()).toBe(true);

    // The link shows its shop's host and opens in a new tab.
    const link = page.getByRole('link', { name: /papershop\.example/ });
    expect(await link.getAttribute('href')).toBe('https://www.papershop.example/liquid-glue');
    expect(await link.getAttribute('target')).toBe('_blank');
    expect(await link.getAttribute('rel')).toBe('noopener');

    // Nothing sponsored yet: only the quiet note.
    expect(await page.getByText(/No shop link is marked sponsored/).isVisible()).toBe(true);
    expect(await page.getByLabel('Disclosure wording').count()).toBe(0);

    // A link without a shop address cannot be marked sponsored.
    expect(await page.getByLabel('Sponsored link: Kraft cardstock').isDisabled()).toBe(true);
    await page.getByLabel('Sponsored link: Liquid glue').check();
    await expect.poll(() => page.getByRole('heading', { name: 'Sponsorship disclosure' }).isVisible()).toBe(true);
    const wording = page.getByLabel('Disclosure wording');
    await expect.poll(() => wording.inputValue()).toBe(DEFAULT_DISCLOSURE);
    await shot(page, 'supplies-disclosure');

    const own = 'The glue link is an affiliate link: Papershop pays me a little if you buy through it.';
    await wording.fill(own);
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => page.getByText('Saved your wording.').isVisible()).toBe(true);

    await page.reload();
    await expect.poll(() => page.getByLabel('Disclosure wording').inputValue()).toBe(own);
    expect(await page.getByText('Your own wording').isVisible()).toBe(true);
    expect(await page.getByLabel('Sponsored link: Liquid glue').isChecked()).toBe(true);
    await shot(page, 'supplies-disclosure-kept');

    // What the server kept, read through the API.
    const saved = (await (await page.request.get(`/api/tutorials/${tutorialId}/supplies`)).json()) as {
      supplies: { name: string; category: string; quantity: string; sponsored: boolean; discountCode: string | null }[];
      disclosure: { required: boolean; text: string; custom: boolean };
    };
    expect(saved.supplies.map((s) => [s.name, s.category, s.quantity, s.sponsored, s.discountCode])).toEqual([
      ['Kraft cardstock', 'cardstock', '2 sheets', false, null],
      ['Liquid glue', 'adhesive', '', true, 'ROUND10'],
    ]);
    expect(saved.disclosure).toEqual({ required: true, text: own, custom: true });
    await ctx.close();
  });
});
