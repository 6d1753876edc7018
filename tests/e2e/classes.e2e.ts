import { describe, expect, it } from 'vitest';
import { shot, useBrowser } from './browser';
import { checkPage, describeViolations } from './a11y';

const browser = useBrowser();

// Scenario of our own: a teacher schedules a round gift box class; an attendee with no account registers and pays on the fake checkout.
describe('classes in the browser', () => {
  it('schedules a class, an attendee registers in another browser without an account and pays, the confirmation is caught, the roster shows paid', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Marta Quill');
    await page.getByLabel('E-mail').fill(`teacher-${Date.now()}@e2e.example`);
    await page.getByLabel('Password').fill('kraft paper and bone folders');
    await page.getByLabel('Studio name').fill('Quill Craft Room');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Round gift box');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);

    await page.getByRole('link', { name: 'Classes', exact: true }).click();
    await page.waitForURL(/\/classes$/);
    await expect.poll(() => page.getByText('No classes yet').isVisible()).toBe(true);
    const form = page.getByRole('form', { name: 'Schedule a class' });
    const date = new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
    await form.getByLabel('Date').fill(date);
    await form.getByLabel('Time', { exact: true }).fill('18:30');
    await form.getByLabel('Time zone').fill('America/Chicago');
    await form.getByLabel('Place').fill('Quill Craft Room, 4 Mill Lane');
    await form.getByLabel('Seats').fill('6');
    await form.getByLabel(/^Kit fee/).fill('abc');
    await form.getByRole('button', { name: 'Schedule class' }).click();
    await expect.poll(() => form.getByText('Use an amount like 15 or 15.50').isVisible()).toBe(true);
    await form.getByLabel(/^Kit fee/).fill('15');
    await shot(page, 'classes-schedule');
    await form.getByRole('button', { name: 'Schedule class' }).click();
    await page.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByRole('heading', { name: 'Round gift box', level: 1 }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('Nobody has registered yet').isVisible()).toBe(true);
    const publicPath = await page.getByRole('link', { name: /\/c\// }).getAttribute('href');
    expect(publicPath).toMatch(/^\/c\/[a-z0-9-]+\/[0-9a-f-]{36}$/);
    await expect
      .poll(() =>
        page
          .getByRole('region', { name: 'Kit planner' })
          .getByText(/no cut list yet/)
          .isVisible(),
      )
      .toBe(true);
    await shot(page, 'class-page-empty');

    // A second browser, no account: the public page, the form, the fake checkout page.
    const visitorCtx = await browser.context();
    const visitor = await visitorCtx.newPage();
    await visitor.goto(publicPath!);
    await expect.poll(() => visitor.getByRole('heading', { name: 'Round gift box', level: 1 }).isVisible()).toBe(true);
    expect(
      await visitor
        .getByRole('region', { name: 'Safety in the class' })
        .getByText(/blades are counted back in/)
        .isVisible(),
    ).toBe(true);
    const attendee = `ada-${Date.now()}@attendee.example`;
    const reg = visitor.getByRole('form', { name: 'Register' });
    await reg.getByLabel('Your name').fill('Ada Lovell');
    await reg.getByLabel('E-mail').fill('not an address');
    await reg.getByRole('button', { name: 'Register and pay $15.00' }).click();
    await expect.poll(() => reg.getByText('Enter an e-mail address').isVisible()).toBe(true);
    await reg.getByLabel('E-mail').fill(attendee);
    await shot(visitor, 'class-public-page');
    await reg.getByRole('button', { name: 'Register and pay $15.00' }).click();
    await visitor.waitForURL(/\/checkout\/cs_test_/);
    expect(await visitor.getByLabel('Amount to pay').textContent()).toBe('$15.00');
    await shot(visitor, 'class-fake-checkout');
    await visitor.getByRole('button', { name: 'Pay $15.00' }).click();
    await visitor.waitForURL(/\/c\/.+\/r\/[0-9a-f-]{36}\?token=.+&checkout=paid/);
    await expect.poll(() => visitor.getByText('You’re in: your seat is confirmed.').isVisible()).toBe(true);
    expect(await visitor.getByRole('link', { name: 'Handout (PDF)' }).isVisible()).toBe(true);
    await shot(visitor, 'class-registration-paid');

    // The confirmation, caught by the local mail stand-in (the loopback-only view of all mail).
    const mail = await ctx.newPage();
    await expect
      .poll(
        async () => {
          await mail.goto('/dev/mail');
          return mail.getByRole('link', { name: new RegExp(`You’re in: Round gift box.*${attendee.replace(/[.]/g, '\\.')}`) }).count();
        },
        { timeout: 30_000, interval: 1000 },
      )
      .toBe(1);
    await mail
      .getByRole('link', { name: new RegExp(`You’re in: Round gift box`) })
      .first()
      .click();
    await expect.poll(() => mail.getByText(/round-gift-box-handout\.pdf/).isVisible()).toBe(true);
    expect(await mail.getByText(/round-gift-box\.ics/).isVisible()).toBe(true);
    await shot(mail, 'class-confirmation-mail');

    // The roster shows the attendee as paid.
    await page.reload();
    const row = page.getByRole('row', { name: 'Ada Lovell' });
    await expect.poll(() => row.getByText('paid', { exact: true }).isVisible()).toBe(true);
    expect(await page.getByText('1 of 6 seats taken').isVisible()).toBe(true);
    // The box follows the server: it is ticked once the roster comes back.
    await row.getByRole('checkbox', { name: 'Ada Lovell is here' }).click();
    await expect.poll(() => row.getByRole('checkbox', { name: 'Ada Lovell is here' }).isChecked()).toBe(true);
    await shot(page, 'class-roster-paid');

    // Every class screen at 1280 and 390 px: axe-core (WCAG 2.2 A/AA, serious and critical) and nothing wider than the window.
    const registrationUrl = visitor.url();
    for (const width of [1280, 390]) {
      for (const [p, name, url] of [
        [visitor, 'class-public', publicPath!],
        [visitor, 'class-registration', registrationUrl],
        [page, 'class-page', page.url()],
      ] as const) {
        await p.setViewportSize({ width, height: 844 });
        await p.goto(url);
        await p.waitForLoadState('networkidle');
        const c = await checkPage(p, name);
        expect(describeViolations(`${name} at ${width}`, c.violations)).toBe('');
        expect(c.overflowPx, `${name} at ${width}`).toBeLessThanOrEqual(0);
      }
    }
  });
});
