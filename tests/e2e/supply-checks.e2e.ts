import { describe, expect, it } from 'vitest';
import { checkBothWidths, describeViolations } from './a11y';
import { call, signUpWithTutorial, useBrowser } from './browser';

const browser = useBrowser();

// Scenario of our own: a nest of three round boxes whose circles each take a 12 x 12 in sheet.
describe('supplies checked against the sheet plan', () => {
  it('warns in Supplies and Publish, keeps a count on purpose, fixes it in one click and asks before publishing with a warning open', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const tutorialId = await signUpWithTutorial(page, {
      name: 'Tomasz Brandt',
      email: `checks-${Date.now()}@e2e.example`,
      password: 'three nesting round boxes',
      studio: 'Brandt Boxes',
      tutorial: 'Nesting round boxes',
    });

    // Three 6 3/8 in circles: each one's square leaves 5 5/8 in of a 12 in sheet, too little for another (worked by hand), so 3 sheets.
    expect((await call(page, 'POST', `/api/tutorials/${tutorialId}/materials`, { name: 'kraft cardstock', sheetWidth: '12', sheetHeight: '12' })).status).toBe(
      201,
    );
    for (const name of ['Small base', 'Middle base', 'Large base'])
      expect(
        (await call(page, 'POST', `/api/tutorials/${tutorialId}/pieces`, { name, material: 'kraft cardstock', shape: 'circle', width: '6 3/8' })).status,
      ).toBe(201);
    expect(
      (await call(page, 'POST', `/api/tutorials/${tutorialId}/supplies`, { category: 'cardstock', name: 'Kraft cardstock, 12 x 12 in', quantity: '2 sheets' }))
        .status,
    ).toBe(201);

    await page.getByRole('link', { name: 'Supplies', exact: true }).click();
    await page.waitForURL(/\/supplies$/);
    const warning = 'Kraft cardstock, 12 x 12 in: the supplies say 2 sheets, but the sheet plan needs 3 sheets of 12 x 12 in kraft cardstock';
    const panel = page.getByRole('region', { name: 'Supplies checked against the sheet plan' });
    await expect.poll(() => panel.getByText(warning).isVisible()).toBe(true);
    const supplies = await checkBothWidths(page, 'supply-checks-warning');

    // Kept on purpose, then asked about again.
    await panel.getByRole('button', { name: 'Keep 2 sheets on purpose' }).click();
    await expect.poll(() => panel.getByText('Accepted:').isVisible()).toBe(true);
    await panel.getByRole('button', { name: 'Warn me again' }).click();
    await expect.poll(() => panel.getByText('Warning:').isVisible()).toBe(true);

    // Through review to approved, then Publish: the section warns too.
    await page.getByRole('link', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/publish$/);
    // Each move opens its note form; the form's own button sends it without a note.
    for (const move of ['Send for review', 'Approve']) {
      await page.getByRole('button', { name: move, exact: true }).first().click();
      await page.getByRole('form', { name: move }).getByRole('button', { name: move, exact: true }).click();
      await expect.poll(() => page.getByRole('form', { name: move }).count()).toBe(0);
    }
    await expect.poll(() => page.getByRole('button', { name: 'Publish', exact: true }).isVisible()).toBe(true);
    const publishPanel = page.getByRole('region', { name: 'Supplies checked against the sheet plan' });
    await expect.poll(() => publishPanel.getByText(warning).isVisible()).toBe(true);

    // Publishing asks first, naming the warning.
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    const dialog = page.getByRole('dialog', { name: /Publish “Nesting round boxes” with a warning open\?/ });
    await expect.poll(() => dialog.isVisible()).toBe(true);
    expect(await dialog.getByText(warning).isVisible()).toBe(true);
    const confirm = await checkBothWidths(page, 'supply-checks-publish-confirm');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    expect((await call(page, 'GET', `/api/tutorials/${tutorialId}`)).body).toMatchObject({ state: 'approved' });

    // One click uses the plan's figure; publishing then goes straight through.
    await publishPanel.getByRole('button', { name: 'Use the plan’s figure: 3 sheets' }).click();
    await expect.poll(() => publishPanel.getByText('3 sheets; the sheet plan needs 3.').isVisible()).toBe(true);
    expect((await call(page, 'GET', `/api/tutorials/${tutorialId}/supplies`)).body).toMatchObject({ supplies: [{ quantity: '3 sheets' }] });
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    await expect.poll(() => page.getByText('Done: the tutorial is now published.').isVisible()).toBe(true);
    const problems = [...supplies, ...confirm].flatMap((c) => [
      ...(c.violations.length ? [describeViolations(c.name, c.violations)] : []),
      ...(c.overflowPx > 0 ? [`${c.name} is ${c.overflowPx} px wider than the window`] : []),
    ]);
    expect(problems.join('\n')).toBe('');
    await ctx.close();
  });
});
