import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const BASE = `http://127.0.0.1:${process.env.PORT ?? 3999}`;
const SHOTS = path.resolve(import.meta.dirname, '../screenshots');

/** One Chromium per test file (Debian's, never a downloaded one). */
export function useBrowser() {
  const state: { browser?: Browser } = {};
  beforeAll(async () => {
    state.browser = await chromium.launch({
      executablePath: '/usr/bin/chromium',
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    });
  });
  afterAll(async () => {
    await state.browser?.close();
  });
  return {
    async context(): Promise<BrowserContext> {
      const ctx = await state.browser!.newContext({ viewport: { width: 1360, height: 860 }, baseURL: BASE, acceptDownloads: true });
      ctx.setDefaultTimeout(15_000);
      return ctx;
    },
  };
}

/** Saves a screenshot under tests/screenshots (git-ignored) for people to look at. */
export async function shot(page: Page, name: string) {
  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: true });
}

/** Signs in through the form. */
export async function signIn(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/studios\//);
}
