import { createHash, randomBytes } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { config } from '@server/config';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import { shot, useBrowser } from './browser';
import { checkPage, describeViolations } from './a11y';

const browser = useBrowser();
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

describe('a recording upload that survives a reload', () => {
  it('paused at 40 %, the page reloaded and the same file chosen again, it continues from the server offset and the stored file is byte-identical', async () => {
    const dir = await tempDir();
    // a real MP4 and 6 MB after it, so the upload takes a few seconds on a throttled link
    const bytes = Buffer.concat([readFileSync(await colourSteps(dir)), randomBytes(6_000_000)]);
    const file = join(dir, 'long-take.mp4');
    await writeFile(file, bytes);

    const ctx = await browser.context();
    const page = await ctx.newPage();
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Ines Marlow');
    await page.getByLabel('E-mail').fill(`resume-${Date.now()}@e2e.example`);
    await page.getByLabel('Password').fill('slow uploads still arrive');
    await page.getByLabel('Studio name').fill('Marlow Card Studio');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Pop-up birthday card');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1];

    // a home connection's upload speed: 2 MB/s
    const cdp = await ctx.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 2_000_000 });

    await page.getByLabel('Recording file').setInputFiles(file);
    const progress = page.getByText(/\d+ % · /);
    await expect
      .poll(async () => Number(/(\d+) %/.exec((await progress.textContent().catch(() => '')) ?? '')?.[1] ?? 0), { timeout: 30_000, interval: 100 })
      .toBeGreaterThanOrEqual(40);
    await page.getByRole('button', { name: 'Pause' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Resume' }).isVisible()).toBe(true);
    // the paused upload reads and works at phone width too (axe-core: 0 serious or critical)
    for (const width of [1280, 390]) {
      await page.setViewportSize({ width, height: width === 390 ? 844 : 900 });
      const check = await checkPage(page, 'upload-paused');
      expect(check.violations, describeViolations(check.name, check.violations)).toEqual([]);
      expect(check.overflowPx, `${check.name} is wider than the window`).toBe(0);
    }
    await page.setViewportSize({ width: 1280, height: 900 });

    // a new page: the upload is continued, not started over
    await page.reload();
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 }).catch(() => {});
    const offsets: number[] = [];
    page.on('request', (r) => {
      if (r.method() === 'PATCH' && r.url().includes('/api/uploads/')) offsets.push(Number(r.headers()['upload-offset']));
    });
    await page.getByLabel('Recording file').setInputFiles(file);
    await page.locator('video').waitFor({ timeout: 90_000 });
    expect(offsets[0], 'the first byte sent after the reload').toBeGreaterThanOrEqual(0.3 * bytes.length);

    const recordings = await page.evaluate(
      async (id) => ((await (await fetch(`/api/tutorials/${id}/recordings`)).json()) as { recordings: { id: string }[] }).recordings,
      tutorialId,
    );
    expect(recordings).toHaveLength(1);
    const folder = join(config.mediaDir, 'recordings', recordings[0].id);
    const source = readdirSync(folder).find((n) => n.startsWith('source.'))!;
    expect(sha256(readFileSync(join(folder, source)))).toBe(sha256(bytes));
    await shot(page, 'upload-resumed');
  });
});
