import { describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { checkPage, describeViolations, watchConsole, type PageCheck } from './a11y';
import { signIn, useBrowser } from './browser';

const browser = useBrowser();
const PASSWORD = 'cardwright-demo';
const WIDTHS = [1280, 768, 390] as const;

/** `allow`: console lines that are the page's point (a missing page answers 404, and Chromium logs it). */
type Visit = { name: string; url: string; ready: (page: Page) => Promise<unknown>; allow?: RegExp };
const NOT_FOUND = /status of 404 \(Not Found\)/;

/** Waits until the page has rendered its main heading (the client has loaded its data). */
const heading = (name: string | RegExp) => (page: Page) => page.getByRole('heading', { level: 1, name }).first().waitFor();

async function demoIds(page: Page) {
  return page.evaluate(async () => {
    const me = (await (await fetch('/api/auth/me')).json()) as { studios: { id: string; name: string }[] };
    const studio = me.studios.find((s) => s.name === 'Juniper Lane Paper Co.')!;
    const list = (await (await fetch(`/api/studios/${studio.id}/tutorials`)).json()) as { tutorials: { id: string; slug: string }[] };
    const bySlug = Object.fromEntries(list.tutorials.map((t) => [t.slug, t.id]));
    const classes = await fetch(`/api/studios/${studio.id}/classes`);
    const demoClass = classes.ok ? ((await classes.json()) as { classes: { id: string }[] }).classes[0]?.id : undefined;
    return {
      studio: studio.id,
      box: bySlug['round-keepsake-box']!,
      card: bySlug['gatefold-birthday-card']!,
      hexagon: bySlug['hexagon-treat-box']!,
      demoClass: demoClass ?? 'none',
    };
  });
}

/** Visits each page at each width, checks it, and returns every finding and console line. */
async function run(ctx: BrowserContext, visits: Visit[]) {
  const page = await ctx.newPage();
  const console = watchConsole(page);
  const checks: PageCheck[] = [];
  const noise: string[] = [];
  for (const width of WIDTHS) {
    // A phone (390 x 844), a tablet upright (768 x 1024) and a laptop.
    await page.setViewportSize({ width, height: width < 500 ? 844 : width < 1000 ? 1024 : 900 });
    for (const v of visits) {
      await page.goto(v.url);
      await v.ready(page);
      const t0 = Date.now();
      await page.waitForLoadState('networkidle');
      const t1 = Date.now();
      checks.push(await checkPage(page, `a11y-${v.name}`));
      if (process.env.A11Y_TIMES) globalThis.console.log(`${v.name}@${width}: idle ${t1 - t0} ms, check ${Date.now() - t1} ms`);
      noise.push(...console.take().flatMap((l) => (v.allow?.test(l) ? [] : [`${v.name}: ${l}`])));
    }
  }
  await page.close();
  return { checks, noise };
}

/** Every problem found, one a line, so a failure lists them all at once. */
function expectClean({ checks, noise }: { checks: PageCheck[]; noise: string[] }) {
  const problems = [
    ...checks.flatMap((c) => (c.violations.length ? [describeViolations(c.name, c.violations)] : [])),
    ...checks.filter((c) => c.overflowPx > 0).map((c) => `${c.name} is ${c.overflowPx} px wider than the window`),
    ...noise.map((l) => `console: ${l}`),
  ];
  expect(problems.join('\n')).toBe('');
}

// WCAG 2.2 AA through axe-core (serious and critical findings), nothing wider than the window
// (a 390 px phone, a 768 px tablet, a laptop), and a quiet console, on every page of the demo studio as each role sees it.
describe('every page of the demo, at 1280, 768 and 390 px', () => {
  it('signed-out pages and the public tutorial page', async () => {
    const ctx = await browser.context();
    const result = await run(ctx, [
      { name: 'sign-in', url: '/sign-in', ready: heading(/sign in/i) },
      { name: 'sign-up', url: '/sign-up', ready: heading(/studio|account/i) },
      { name: 'reset-request', url: '/reset', ready: heading(/password/i) },
      { name: 'reset-bad-token', url: '/reset/not-a-real-token-000', ready: heading(/password/i) },
      { name: 'invite-bad-token', url: '/invite/not-a-real-token-000', ready: (p) => p.getByRole('heading').first().waitFor(), allow: NOT_FOUND },
      { name: 'public-page', url: '/t/juniper-lane/round-keepsake-box', ready: heading('Round keepsake box with a wrapped lid') },
      { name: 'public-print', url: '/t/juniper-lane/round-keepsake-box/print?paper=letter', ready: heading('Round keepsake box with a wrapped lid') },
      { name: 'public-missing', url: '/t/juniper-lane/no-such-tutorial', ready: heading('This tutorial is not here'), allow: NOT_FOUND },
    ]);
    expectClean(result);
    await ctx.close();
  });

  it('the owner’s studio, members, outbox, print view and not-found page', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await signIn(page, 'owner@example.com', PASSWORD);
    const ids = await demoIds(page);
    // A message in the Outbox to open: a password-reset mail to the owner (the Outbox lists one's own mail).
    await page.evaluate(async () => {
      const { token } = (await (await fetch('/api/auth/csrf')).json()) as { token: string };
      await fetch('/api/auth/reset-request', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
        body: JSON.stringify({ email: 'owner@example.com' }),
      });
    });
    await page.goto('/outbox');
    const first = page.getByRole('link', { name: /password/i }).first();
    await first.waitFor();
    const message = (await first.getAttribute('href'))!;
    await page.close();
    const result = await run(ctx, [
      { name: 'studio', url: `/studios/${ids.studio}`, ready: heading('Tutorials') },
      { name: 'members', url: `/studios/${ids.studio}/members`, ready: heading(/members/i) },
      { name: 'outbox', url: '/outbox', ready: heading(/outbox/i) },
      { name: 'account', url: '/account', ready: heading('Your account') },
      { name: 'outbox-message', url: message, ready: (p) => p.getByRole('link', { name: /\/reset\// }).waitFor() },
      { name: 'print-view', url: `/print/${ids.box}?paper=a4`, ready: heading('Round keepsake box with a wrapped lid') },
      { name: 'not-found', url: '/no-such-page', ready: heading('This page does not exist') },
      { name: 'classes', url: `/studios/${ids.studio}/classes`, ready: heading('Classes') },
      { name: 'class', url: `/classes/${ids.demoClass}`, ready: heading('Round keepsake box: evening class') },
      { name: 'class-public', url: `/c/juniper-lane/${ids.demoClass}`, ready: heading('Round keepsake box: evening class') },
    ]);
    expectClean(result);
    await ctx.close();
  });

  it('every section of a finished tutorial (the demo box)', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await signIn(page, 'owner@example.com', PASSWORD);
    const ids = await demoIds(page);
    await page.close();
    const box = (s: string) => `/tutorials/${ids.box}/${s}`;
    const result = await run(ctx, [
      { name: 'footage', url: box('footage'), ready: (p) => p.locator('video').waitFor() },
      { name: 'cut-list', url: box('cut-list'), ready: (p) => p.getByRole('table').first().waitFor() },
      { name: 'supplies', url: box('supplies'), ready: (p) => p.getByRole('table').first().waitFor() },
      { name: 'write-up', url: box('write-up'), ready: (p) => p.locator('.ProseMirror').waitFor() },
      { name: 'publish', url: box('publish'), ready: (p) => p.getByRole('region', { name: 'Status' }).waitFor() },
    ]);
    expectClean(result);
    await ctx.close();
  }, 240_000);

  it('the sections of an empty tutorial (the demo hexagon box)', async () => {
    const ctx = await browser.context();
    const page = await ctx.newPage();
    await signIn(page, 'maker@example.com', PASSWORD);
    const ids = await demoIds(page);
    await page.close();
    const hexagon = (s: string) => `/tutorials/${ids.hexagon}/${s}`;
    const title = heading('Hexagon treat box');
    const result = await run(ctx, [
      { name: 'footage-empty', url: hexagon('footage'), ready: title },
      { name: 'cut-list-empty', url: hexagon('cut-list'), ready: title },
      { name: 'supplies-empty', url: hexagon('supplies'), ready: title },
      { name: 'write-up-empty', url: hexagon('write-up'), ready: (p) => p.locator('.ProseMirror').waitFor() },
      { name: 'publish-draft', url: hexagon('publish'), ready: (p) => p.getByRole('region', { name: 'Status' }).waitFor() },
    ]);
    expectClean(result);
    await ctx.close();
  });

  it('the coordinator reviewing and the student’s view', async () => {
    const checks: PageCheck[] = [];
    const noise: string[] = [];
    for (const who of ['coordinator', 'student'] as const) {
      const ctx = await browser.context();
      const page = await ctx.newPage();
      await signIn(page, `${who}@example.com`, PASSWORD);
      const ids = await demoIds(page);
      await page.close();
      const visits: Visit[] =
        who === 'coordinator'
          ? [{ name: 'review-publish', url: `/tutorials/${ids.card}/publish`, ready: heading(/Gatefold/) }]
          : [
              { name: 'student-studio', url: `/studios/${ids.studio}`, ready: heading('Tutorials') },
              { name: 'student-tutorial', url: `/tutorials/${ids.box}`, ready: heading('Round keepsake box with a wrapped lid') },
            ];
      const r = await run(ctx, visits);
      checks.push(...r.checks);
      noise.push(...r.noise);
      await ctx.close();
    }
    expectClean({ checks, noise });
  });
});
