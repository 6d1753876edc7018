import { describe, expect, it } from 'vitest';
import { checkBothWidths, describeViolations, type PageCheck } from './a11y';
import { shot, signUpWithTutorial, useBrowser } from './browser';

const browser = useBrowser();

function expectClean(checks: PageCheck[]) {
  const problems = [
    ...checks.flatMap((c) => (c.violations.length ? [describeViolations(c.name, c.violations)] : [])),
    ...checks.filter((c) => c.overflowPx > 0).map((c) => `${c.name} is ${c.overflowPx} px wider than the window`),
  ];
  expect(problems.join('\n')).toBe('');
}

// Scenario of our own: favours for a spring fair, a pillow box, a scalloped mat, a tag and a shutter card.
describe('shapes, grain and card folds in the cut list', () => {
  it('adds pieces of every kind of shape with their sizes, edits shapes, sizes and grain in place, sets a sheet grain and works out shutter and easel cards', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await signUpWithTutorial(page, {
      name: 'Ines Marlowe',
      email: `shapes-${Date.now()}@e2e.example`,
      password: 'spring fair favour boxes',
      studio: 'Marlowe Paper Works',
      tutorial: 'Spring fair favours',
    });
    await page.getByRole('link', { name: 'Cut list', exact: true }).click();
    await page.waitForURL(/\/cut-list$/);

    const form = page.getByRole('form', { name: 'Add a piece' });
    const add = async (name: string, shape: string, fill: Record<string, string>) => {
      await form.getByLabel('Name').fill(name);
      await form.getByLabel('Shape').selectOption({ label: shape });
      for (const [label, value] of Object.entries(fill)) await form.getByLabel(label, { exact: true }).fill(value);
      await form.getByRole('button', { name: 'Add piece' }).click();
      await expect.poll(() => page.getByRole('row', { name, exact: true }).isVisible()).toBe(true);
    };

    // A pillow box 3 x 4 in, 1 in deep: blank 2 x 3 + 1/2 = 6 1/2 in wide, 4 + 1 = 5 in long (shared/geometry pillowBlank, worked by hand).
    await add('Favour box', 'Pillow box', { Width: '3', Length: '4', Depth: '1' });
    await expect.poll(() => page.getByText('1 in deep; blank 6 1/2 x 5 in with a 1/2 in glue flap').isVisible()).toBe(true);
    // A scalloped mat with the usual 1/2 in scallops: 4 in across fits 8, 3 in down fits 6, 2 x 8 + 2 x 6 - 4 shared corners = 24 all round (worked by hand).
    await add('Scallop mat', 'Scalloped rectangle', { Width: '4', Length: '3' });
    await expect.poll(() => page.getByText('24 scallops of 1/2 in (8 across, 6 down)').isVisible()).toBe(true);
    await add('Gift tag', 'Tag', { Width: '2', Length: '3 1/2', 'Hole from the top': '5/8' });
    await expect.poll(() => page.getByText('clipped corners 3/8 in; 1/4 in hole, 5/8 in from the top').isVisible()).toBe(true);
    await add('Rounded card', 'Rounded rectangle', { Width: '4 1/4', Length: '5 1/2', 'Corner radius': '1/4' });
    // Strips and walls take grain along their length on their own (common practice).
    await add('Wall strip', 'Rectangle', { Width: '10 9/16', Length: '2 1/2' });
    await expect.poll(() => page.getByRole('button', { name: 'Edit grain of Wall strip: grain along its length' }).isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Edit grain of Gift tag: grain any way' }).isVisible()).toBe(true);

    // Scallops by count instead of size: 10 across a 4 in top makes each 4 / 10 = 2/5 in.
    await page.getByRole('button', { name: /Edit scallops across the top of Scallop mat/ }).click();
    await page.getByLabel('scallops across the top of Scallop mat', { exact: true }).fill('10');
    await page.getByLabel('scallops across the top of Scallop mat', { exact: true }).press('Enter');
    await expect.poll(() => page.getByText(/scallops of 0?\.4 in|scallops of 2\/5 in/).isVisible()).toBe(true);

    // The shape changes in place: the rounded card becomes an oval and its trim length shows.
    await page.getByRole('button', { name: 'Edit shape of Rounded card: Rounded rectangle' }).click();
    await page.getByLabel('shape of Rounded card', { exact: true }).selectOption('oval');
    await expect.poll(() => page.getByRole('button', { name: 'Edit shape of Rounded card: Oval' }).isVisible()).toBe(true);
    // Ramanujan's perimeter of a 4 1/4 x 5 1/2 in oval: 15.378 in, trim cut long to the next 1/16 in: 15 7/16 in (worked by hand).
    await expect.poll(() => page.getByText('trim round it 15 7/16 in').isVisible()).toBe(true);

    // Grain in place: the tag's grain along its length.
    await page.getByRole('button', { name: 'Edit grain of Gift tag: grain any way' }).click();
    await page.getByLabel('grain of Gift tag', { exact: true }).selectOption('length');
    await expect.poll(() => page.getByRole('button', { name: 'Edit grain of Gift tag: grain along its length' }).isVisible()).toBe(true);

    // A depth the box cannot take is refused by its check, in words.
    await page.getByRole('button', { name: /Edit depth of Favour box/ }).click();
    await page.getByLabel('depth of Favour box', { exact: true }).fill('3');
    await page.getByLabel('depth of Favour box', { exact: true }).press('Enter');
    await expect
      .poll(() =>
        page
          .getByText(/depth \(3 in\) must be less than the width/i)
          .first()
          .isVisible(),
      )
      .toBe(true);
    await page.getByRole('button', { name: /Edit depth of Favour box/ }).click();
    await page.getByLabel('depth of Favour box', { exact: true }).fill('1');
    await page.getByLabel('depth of Favour box', { exact: true }).press('Enter');
    await expect.poll(() => page.getByText('1 in deep; blank 6 1/2 x 5 in with a 1/2 in glue flap').isVisible()).toBe(true);

    // A stock sheet with its grain.
    await page.getByRole('tab', { name: 'Materials' }).click();
    const materialForm = page.getByRole('form', { name: 'Add a material' });
    await materialForm.getByLabel('Name').fill('white cardstock');
    await materialForm.getByLabel('Sheet grain').selectOption('height');
    await materialForm.getByRole('button', { name: 'Add material' }).click();
    await expect.poll(() => page.getByText('grain ↕ along the sheet’s height').isVisible()).toBe(true);
    await page.getByRole('row', { name: 'Scallop mat', exact: true }).scrollIntoViewIfNeeded();
    const table = await checkBothWidths(page, 'shapes-cut-list');

    // The card base helper: a 5 x 7 in shutter card with 1 in outer flaps (engine: inner (5 - 1/16) / 2 = 2 15/32 -> 2 7/16 in).
    await page.getByRole('tab', { name: 'Card base' }).click();
    const panel = page.getByRole('tabpanel');
    await panel.getByRole('textbox', { name: 'Finished width' }).fill('5');
    await panel.getByRole('textbox', { name: 'Finished height' }).fill('7');
    await panel.getByRole('combobox', { name: 'Fold' }).selectOption('shutter');
    await panel.getByRole('textbox', { name: 'Outer flap' }).fill('1');
    // Flat: 2 x (1 + 2 7/16) + 5 = 11 7/8 in (worked by hand).
    await expect.poll(() => panel.getByText('11 7/8 in × 7 in').first().isVisible()).toBe(true);
    expect(await panel.getByRole('img', { name: /The flat card, 11 7\/8 in × 7 in/ }).isVisible()).toBe(true);
    await panel.getByRole('textbox', { name: 'Outer flap' }).fill('3');
    await expect.poll(() => panel.getByText(/cannot be wider than the inner flap/).isVisible()).toBe(true);
    await panel.getByRole('textbox', { name: 'Outer flap' }).fill('1');
    await expect.poll(() => panel.getByText('11 7/8 in × 7 in').first().isVisible()).toBe(true);
    const shutter = await checkBothWidths(page, 'shapes-card-shutter');

    // An easel card 5 x 7 in: flat 5 x 14 in; the stopper at half the height stands the front at 60° (equilateral triangle).
    await panel.getByRole('combobox', { name: 'Fold' }).selectOption('easel');
    await expect.poll(() => panel.getByText(/front leaning at 60°/).isVisible()).toBe(true);
    await panel.getByRole('textbox', { name: 'Stopper from the bottom edge' }).fill('2');
    // arccos((7 - 2) / 7) = 44.4°.
    await expect.poll(() => panel.getByText(/front leaning at 44°/).isVisible()).toBe(true);
    await panel.getByRole('textbox', { name: 'Piece name' }).fill('Easel base');
    await panel.getByRole('button', { name: 'Add as piece' }).click();
    await expect.poll(() => panel.getByText('Added “Easel base” to the cut list.').isVisible()).toBe(true);
    // Folds crease with the grain along them: an easel's folds run side to side, across its 14 in length, so grain along its width.
    await expect.poll(() => page.getByRole('button', { name: 'Edit grain of Easel base: grain along its width' }).isVisible()).toBe(true);
    const easel = await checkBothWidths(page, 'shapes-card-easel');
    await shot(page, 'shapes-final');
    expectClean([...table, ...shutter, ...easel]);
    await ctx.close();
  });
});
