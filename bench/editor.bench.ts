/**
 * The write-up editor with a long tutorial, in one run against a fresh bench database:
 *  1. the save round trip, PUT /api/tutorials/:id/article with a 50-step write-up holding
 *     50 photos, beside two baselines measured the same way in the same run: a PUT of a
 *     one-paragraph write-up, and a GET of the 50-step one;
 *  2. the editor's time to first keystroke in Chromium: from navigation start to the first
 *     typed character being in the editor's DOM (page.goto the Write-up page, click in the
 *     editor, type one character), for the 50-step write-up and, as a baseline, the
 *     one-paragraph one; with a cold cache (a new browser context each run) and warm (reload).
 * No targets are set for these (the issue gives none): it prints the figures.
 *
 *   npx tsx bench/editor.bench.ts [--runs 15] [--page-runs 5]
 */
import type { JSONContent } from '@tiptap/core';
import { chromium, type Browser, type BrowserContext } from 'playwright-core';
import { buildClientIfStale } from '../scripts/lib/build';
import { isMain, median, ms, numberArg, seeded, timeAsync, type Timing } from './lib';
import { BenchClient, startBenchServer } from './support/client';

const WORDS =
  'score the panel along the long edge then fold it toward you and burnish the crease with a bone folder before gluing the tab to the inside of the wall so the seam sits flat'.split(
    ' ',
  );

function sentence(rand: () => number, n: number): string {
  const words = Array.from({ length: n }, () => WORDS[Math.floor(rand() * WORDS.length)]!);
  const s = words.join(' ');
  return `${s.charAt(0).toUpperCase()}${s.slice(1)}.`;
}

/**
 * A 50-step write-up of our own (a round keepsake box, drawn out), each step with a title, two
 * paragraphs and a photo. The photos point at /media/ addresses that do not exist: a broken image
 * costs the page the same layout work, and the timing is about the editor, not the pictures.
 */
export function longWriteUp(steps = 50, seed = 7): JSONContent {
  const rand = seeded(seed);
  const content: JSONContent[] = [
    { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Round keepsake box, step by step' }] },
    { type: 'paragraph', content: [{ type: 'text', text: sentence(rand, 30) }] },
    { type: 'cutList', attrs: { units: 'both' } },
  ];
  for (let i = 0; i < steps; i++) {
    content.push({
      type: 'step',
      attrs: { atMs: i * 12_000, chapterId: null },
      content: [
        { type: 'stepTitle', content: [{ type: 'text', text: `Part ${i + 1}: ${sentence(rand, 4).slice(0, -1)}` }] },
        { type: 'paragraph', content: [{ type: 'text', text: `${sentence(rand, 25)} ${sentence(rand, 18)}` }] },
        {
          type: 'still',
          attrs: {
            stillId: null,
            src: `/media/stills/bench-${i + 1}.jpg`,
            alt: `Step ${i + 1} in progress`,
            caption: sentence(rand, 8),
            width: 1280,
            height: 720,
          },
        },
        { type: 'paragraph', content: [{ type: 'text', text: sentence(rand, 20) }] },
      ],
    });
  }
  return { type: 'doc', content };
}

const ONE_PARAGRAPH: JSONContent = {
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text: 'A gatefold card with a pocket for a tag.' }] }],
};

/** Saves over and over, each time with the version the last save returned (as autosave does). */
async function timeSaves(c: BenchClient, tutorialId: string, doc: JSONContent, runs: number): Promise<Timing> {
  let version = (await c.request('GET', `/api/tutorials/${tutorialId}/article`)).json.version as number;
  let n = 0;
  return timeAsync(
    async () => {
      // A real change each time, at the end of the document.
      const edited = { ...doc, content: [...doc.content!, { type: 'paragraph', content: [{ type: 'text', text: `Edit ${++n}` }] }] };
      const r = await c.request('PUT', `/api/tutorials/${tutorialId}/article`, { doc: edited, version });
      if (r.status !== 200) throw new Error(`PUT answered ${r.status}: ${JSON.stringify(r.json).slice(0, 200)}`);
      version = r.json.version;
    },
    runs,
    2,
  );
}

type Keystroke = { total: number; editorReady: number; keyToDom: number };

/** One page load: navigation start to the typed character in the DOM, read from the page's own clock. */
async function firstKeystroke(ctx: BrowserContext, url: string, reload = false): Promise<Keystroke> {
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  if (reload) await page.reload({ waitUntil: 'commit' });
  else await page.goto(url, { waitUntil: 'commit' });
  const editor = page.locator('.wu-prose[contenteditable="true"]');
  await editor.waitFor({ timeout: 60_000 });
  await page.evaluate(() => {
    const w = window as unknown as { __wu: { ready: number; key: number | null; typed: number | null } };
    w.__wu = { ready: performance.now(), key: null, typed: null };
    const root = document.querySelector('.wu-prose')!;
    // The bench documents hold no "q": the first one to appear is the typed one. (No named
    // helpers in here: tsx would wrap them in a __name() the page does not have.)
    const before = root.textContent!.split('q').length;
    document.addEventListener('keydown', () => (w.__wu.key ??= performance.now()), { capture: true });
    new MutationObserver(() => {
      if (w.__wu.typed === null && root.textContent!.split('q').length > before) w.__wu.typed = performance.now();
    }).observe(root, { subtree: true, childList: true, characterData: true });
  });
  await editor.locator('p').first().click();
  await page.keyboard.press('q');
  await page.waitForFunction(() => (window as unknown as { __wu: { typed: number | null } }).__wu.typed !== null);
  // performance.now() counts from the navigation's time origin (W3C High Resolution Time).
  const t = await page.evaluate(() => (window as unknown as { __wu: { ready: number; key: number; typed: number } }).__wu);
  return { total: t.typed, editorReady: t.ready, keyToDom: t.typed - t.key };
}

async function keystrokes(browser: Browser, cookie: { name: string; value: string }, base: string, url: string, runs: number) {
  const cold: Keystroke[] = [];
  const warm: Keystroke[] = [];
  for (let i = 0; i < runs; i++) {
    const ctx = await browser.newContext({ viewport: { width: 1360, height: 860 } });
    await ctx.addCookies([{ ...cookie, url: base }]);
    cold.push(await firstKeystroke(ctx, url));
    warm.push(await firstKeystroke(ctx, url, true));
    await ctx.close();
  }
  const sum = (xs: Keystroke[]) => ({
    total: median(xs.map((x) => x.total)),
    editorReady: median(xs.map((x) => x.editorReady)),
    keyToDom: median(xs.map((x) => x.keyToDom)),
  });
  return { cold: sum(cold), warm: sum(warm) };
}

export async function benchEditor(runs = 15, pageRuns = 5) {
  buildClientIfStale();
  const server = await startBenchServer();
  const base = `http://127.0.0.1:${server.port}`;
  const c = new BenchClient(base);
  let browser: Browser | undefined;
  try {
    await c.signIn(server.email, server.password);
    const long = longWriteUp();
    const studioId = (await c.request('GET', `/api/tutorials/${server.tutorialId}`)).json.studioId as string;
    const small = (await c.request('POST', '/api/tutorials', { studioId, title: 'Gatefold card' })).json.id as string;
    const bytes = Buffer.byteLength(JSON.stringify(long));

    // 1. save round trip
    const put = await timeSaves(c, server.tutorialId, long, runs);
    const putSmall = await timeSaves(c, small, ONE_PARAGRAPH, runs);
    const get = await timeAsync(() => c.request('GET', `/api/tutorials/${server.tutorialId}/article`), runs, 2);
    console.log(`save round trip, median of ${runs} (after 2 warm-up runs):`);
    console.log(`  PUT 50 steps + 50 photos (${(bytes / 1024).toFixed(0)} KB of JSON)   ${ms(put.median)}  (min ${ms(put.min)}, max ${ms(put.max)})`);
    console.log(`  baseline: PUT one paragraph                  ${ms(putSmall.median)}  (min ${ms(putSmall.min)}, max ${ms(putSmall.max)})`);
    console.log(`  baseline: GET the 50-step write-up           ${ms(get.median)}  (min ${ms(get.min)}, max ${ms(get.max)})`);
    console.log(`  the long save costs ${(put.median / putSmall.median).toFixed(1)}x the one-paragraph save`);

    // 2. time to first keystroke
    browser = await chromium.launch({ executablePath: '/usr/bin/chromium', headless: true, args: ['--no-sandbox', '--disable-gpu'] });
    const eq = c.cookie.indexOf('=');
    const [name, value] = [c.cookie.slice(0, eq), c.cookie.slice(eq + 1)];
    const longKeys = await keystrokes(browser, { name, value }, base, `${base}/tutorials/${server.tutorialId}/write-up`, pageRuns);
    const smallKeys = await keystrokes(browser, { name, value }, base, `${base}/tutorials/${small}/write-up`, pageRuns);
    console.log(`time to first keystroke in Chromium, median of ${pageRuns} (navigation start → typed character in the editor's DOM):`);
    const line = (label: string, k: { total: number; editorReady: number; keyToDom: number }) =>
      console.log(`  ${label.padEnd(40)} ${ms(k.total).padStart(8)}   (editor ready at ${ms(k.editorReady)}, key to DOM ${ms(k.keyToDom)})`);
    line('50 steps + 50 photos, cold cache', longKeys.cold);
    line('50 steps + 50 photos, warm (reload)', longKeys.warm);
    line('baseline: one paragraph, cold cache', smallKeys.cold);
    line('baseline: one paragraph, warm (reload)', smallKeys.warm);
  } finally {
    await browser?.close();
    server.child.kill('SIGTERM');
  }
}

if (isMain(import.meta.url)) await benchEditor(numberArg('runs', 15), numberArg('page-runs', 5));
