import { describe, expect, it } from 'vitest';
import { BASE, shot, signIn, useBrowser } from './browser';

const browser = useBrowser();

describe('accounts in the browser', () => {
  it('signs up, signs out, signs in, creates a tutorial, invites a member who follows the mailed link', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const email = `owner-${Date.now()}@e2e.example`;
    const password = 'folded paper lanterns glow';

    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Rowan Pike');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('too short');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => page.getByText('Use at least 15 characters').isVisible()).toBe(true);
    await page.getByLabel('Password').fill(password);
    await page.getByLabel('Studio name').fill('Pike Paper Works');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await expect.poll(() => page.getByText('No tutorials yet').isVisible()).toBe(true);
    await shot(page, 'studio-empty');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await signIn(page, email, password);

    await page.getByLabel('New tutorial').fill('Pop-up snowflake card');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    await expect.poll(() => page.getByRole('heading', { name: 'Pop-up snowflake card' }).isVisible()).toBe(true);
    for (const s of ['Footage', 'Cut list', 'Supplies', 'Write-up', 'Publish']) expect(await page.getByRole('link', { name: s, exact: true }).count()).toBe(1);
    await shot(page, 'tutorial-footage');

    await page.getByRole('link', { name: 'Tutorials' }).click();
    await expect.poll(() => page.getByRole('link', { name: 'Pop-up snowflake card' }).isVisible()).toBe(true);
    await shot(page, 'studio-list');

    const invitee = `maker-${Date.now()}@e2e.example`;
    await page.getByRole('link', { name: 'Members' }).click();
    await page.getByLabel('E-mail', { exact: true }).fill(invitee);
    await page.getByLabel('Role', { exact: true }).selectOption('maker');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText(`Invitation sent to ${invitee}.`).isVisible()).toBe(true);
    await shot(page, 'members');

    // The owner's Outbox holds only their own mail: the invitation went to someone else.
    await page.getByRole('link', { name: 'Outbox' }).click();
    await expect.poll(() => page.getByText('No mail for you yet').isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: /invited you to Pike Paper Works/ }).count()).toBe(0);
    await shot(page, 'outbox');
    // Every caught message is in the development mailbox, which this machine (loopback) may open.
    await page.getByRole('link', { name: 'development mailbox' }).click();
    await page.waitForURL(/\/dev\/mail$/);
    await page
      .getByRole('link', { name: new RegExp(`invited you to Pike Paper Works[\\s\\S]*${invitee.replace(/[.]/g, '\\.')}`) })
      .first()
      .click();
    const link = page.getByRole('link', { name: /\/invite\// });
    const href = await link.getAttribute('href');
    expect(href).toMatch(/\/invite\//);
    await shot(page, 'dev-mailbox');

    await page.goto('/');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto(href!);
    await page.getByRole('link', { name: 'Create your account' }).click();
    await page.getByLabel('Your name').fill('Ada Quill');
    expect(await page.getByLabel('E-mail').inputValue()).toBe(invitee);
    await page.getByLabel('Password').fill('scissors and bone folders');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await expect.poll(() => page.getByRole('link', { name: 'Pop-up snowflake card' }).isVisible()).toBe(true);
    expect(await page.locator('header').getByText('Maker').isVisible()).toBe(true);
    await shot(page, 'invitee-studio');
    await ctx.close();
  });

  it('after sign-in follows ?next= on this site and ignores another site’s address (goes home, no error)', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    for (const next of ['https://evil.example/steal', '//evil.example/steal', '/\\evil.example/steal']) {
      await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
      await page.getByLabel('E-mail').fill('owner@example.com');
      await page.getByLabel('Password').fill('cardwright-demo');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/studios\//);
      expect(new URL(page.url()).host).toBe(new URL(BASE).host);
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL(/\/sign-in/);
    }
    await page.goto(`/sign-in?next=${encodeURIComponent('/outbox')}`);
    await page.getByLabel('E-mail').fill('owner@example.com');
    await page.getByLabel('Password').fill('cardwright-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/outbox$/);
    await shot(page, 'sign-in-next-outbox');
    await ctx.close();
  });

  it('changes the password on the Account page: a wrong current one is named, the new one signs in, the old one no longer does', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    const email = `account-${Date.now()}@e2e.example`;
    const first = 'scored and folded twice over';
    const second = 'a quieter passphrase for cards';
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Ines Calder');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(first);
    await page.getByLabel('Studio name').fill('Calder Cards');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);

    await page.getByRole('link', { name: 'Account' }).click();
    await page.waitForURL(/\/account$/);
    await page.getByLabel('Current password').fill('not my password at all');
    await page.getByLabel('New password').fill(second);
    await page.getByRole('button', { name: 'Change password' }).click();
    await expect.poll(() => page.getByText('Not your current password', { exact: true }).isVisible()).toBe(true);
    await page.getByLabel('Current password').fill(first);
    await page.getByRole('button', { name: 'Change password' }).click();
    await expect.poll(() => page.getByText('Your password is changed').isVisible()).toBe(true);
    await shot(page, 'account-password-changed');

    // Still signed in (a new session with its own token): signing out works, then only the new password signs in.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(first);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByText(/do not match/i).isVisible()).toBe(true);
    await signIn(page, email, second);
    await ctx.close();
  });
});
