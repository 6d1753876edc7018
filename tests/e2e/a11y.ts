import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { shot } from './browser';

// axe-core's browser build, read once; it is evaluated in the page through the DevTools protocol,
// so the app's Content-Security-Policy (no inline scripts) does not block it.
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** WCAG 2.0, 2.1 and 2.2 rules at levels A and AA (axe-core's tags for them). */
const WCAG_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

export type AxeViolation = { id: string; impact: string | null; help: string; targets: string[] };

/**
 * Runs axe-core on the page as it is now and returns the serious and critical violations of
 * WCAG 2.2 A/AA (the bar: none of them on any page). Minor and moderate findings are
 * returned too when `all` is set, for people tidying up.
 */
export async function axeViolations(page: Page, opts: { all?: boolean } = {}): Promise<AxeViolation[]> {
  const loaded = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe === 'object');
  if (!loaded) await page.evaluate(AXE_SOURCE);
  const found = await page.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, o: object) => Promise<{ violations: any[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return result.violations.map((v) => ({
      id: v.id as string,
      impact: v.impact as string | null,
      help: v.help as string,
      targets: (v.nodes as { target: string[] }[]).slice(0, 5).map((n) => n.target.join(' ')),
    }));
  }, WCAG_TAGS);
  return opts.all ? found : found.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

/** One line per violation, for a readable test failure. */
export function describeViolations(where: string, violations: AxeViolation[]): string {
  return violations.map((v) => `${where}: [${v.impact}] ${v.id} (${v.help}) at ${v.targets.join(', ')}`).join('\n');
}

/** How far the page is wider than the window (0 when nothing sticks out sideways). */
export async function sidewaysOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

export type PageCheck = { name: string; violations: AxeViolation[]; overflowPx: number };

/**
 * The check every page of the demo goes through: axe-core (serious and critical), nothing wider
 * than the window, and a full-page screenshot named `<name>-<width>` for people to look at.
 * Other browser tests call this on their own new pages.
 */
export async function checkPage(page: Page, name: string): Promise<PageCheck> {
  const width = page.viewportSize()?.width ?? 0;
  await shot(page, `${name}-${width}`);
  return { name: `${name} at ${width} px`, violations: await axeViolations(page), overflowPx: await sidewaysOverflow(page) };
}

/**
 * `checkPage` at 1280 and at 390 px (a phone), back to 1280 after; each finding names the markup
 * it points at, so a failure says which control it is.
 */
export async function checkBothWidths(page: Page, name: string): Promise<PageCheck[]> {
  const out: PageCheck[] = [];
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: width < 500 ? 844 : 900 });
    await page.waitForTimeout(150);
    const check = await checkPage(page, name);
    for (const v of check.violations)
      for (const t of v.targets) v.help += ` [${await page.evaluate((sel) => document.querySelector(sel)?.outerHTML.slice(0, 400) ?? '', t)}]`;
    out.push(check);
  }
  await page.setViewportSize({ width: 1280, height: 900 });
  return out;
}

/**
 * Collects what the page prints to the console (errors and warnings) and the requests it made that
 * failed, so a test can say the page is quiet. Vite's and React's development notes never show
 * here: the browser tests run the built client.
 */
export function watchConsole(page: Page) {
  const lines: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') lines.push(`${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (e) => lines.push(`pageerror: ${e.message}`));
  return {
    lines,
    /** Takes what was collected so far and starts again. */
    take(): string[] {
      return lines.splice(0, lines.length);
    },
  };
}
