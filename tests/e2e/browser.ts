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
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  });
  afterAll(async () => {
    await state.browser?.close();
  });
  return {
    async context(): Promise<BrowserContext> {
      const ctx = await state.browser!.newContext({
        viewport: { width: 1360, height: 860 },
        baseURL: BASE,
        acceptDownloads: true,
        // No colour fades mid-check: axe reads a button's colours the moment it looks (the app honours reduced motion).
        reducedMotion: 'reduce',
      });
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

/** A JSON request from the page, with the session's CSRF token, as the client makes it (body null when there is none). */
export async function call<T = unknown>(page: Page, method: string, url: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, url, body }) => {
      const { token } = (await (await fetch('/api/auth/csrf')).json()) as { token: string };
      const r = await fetch(url, {
        method,
        headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: r.status, body: await r.json().catch(() => null) };
    },
    { method, url, body },
  );
}

/** Signs a new owner up with a studio of their own and creates one tutorial; answers its id (the page is on its Footage section). */
export async function signUpWithTutorial(page: Page, o: { name: string; email: string; password: string; studio: string; tutorial: string }): Promise<string> {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill(o.name);
  await page.getByLabel('E-mail').fill(o.email);
  await page.getByLabel('Password').fill(o.password);
  await page.getByLabel('Studio name').fill(o.studio);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(/\/studios\//);
  await page.getByLabel('New tutorial').fill(o.tutorial);
  await page.getByRole('button', { name: 'Create tutorial' }).click();
  await page.waitForURL(/\/tutorials\/.+\/footage/);
  return /\/tutorials\/([^/]+)\//.exec(page.url())![1]!;
}
