import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { colourSteps, nearestStep, pixelAt, tempDir } from '@server/services/media/test-clips';
import { shot, useBrowser } from './browser';

const browser = useBrowser();

// A timed transcript of our own for the 5 s colour-step clip (one colour a second).
const TRANSCRIPT = `WEBVTT

00:00.000 --> 00:01.500
Hello, today we fold a hexagon treat box.

00:01.500 --> 00:03.000
First we score the base panel.

00:03.000 --> 00:05.000
Next we glue the walls to the base.
`;

// Both timings have a single-dash arrow: WebVTT cue timings need "-->" (W3C WebVTT, "cue timings"), so the parser
// drops both cues and no timed line is left; the refusal names the first one skipped, at line 5.
const MALFORMED = `WEBVTT

NOTE both timings below use a short arrow

00:00.000 -> 00:01.500
Hello.

00:01.500 -> 00:03.000
First we score the base panel.
`;

describe('footage in the browser', () => {
  it('uploads a recording, attaches a transcript, marks and renames a chapter, pulls a still and captions it', async () => {
    const dir = await tempDir();
    const clip = await colourSteps(dir);
    await writeFile(join(dir, 'hexagon-box.vtt'), TRANSCRIPT);
    await writeFile(join(dir, 'broken.vtt'), MALFORMED);

    const ctx = await browser.context();
    const page = await ctx.newPage();
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Wren Tolliver');
    await page.getByLabel('E-mail').fill(`footage-${Date.now()}@e2e.example`);
    await page.getByLabel('Password').fill('hexagon boxes fold flat');
    await page.getByLabel('Studio name').fill('Tolliver Paper Studio');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(/\/studios\//);
    await page.getByLabel('New tutorial').fill('Hexagon treat box');
    await page.getByRole('button', { name: 'Create tutorial' }).click();
    await page.waitForURL(/\/tutorials\/.+\/footage/);
    const tutorialId = /\/tutorials\/([^/]+)\//.exec(page.url())![1];

    await expect.poll(() => page.getByText('Drop the recording here or').isVisible()).toBe(true);
    await shot(page, 'footage-empty');

    // Upload through the drop zone's file input; the page follows processing until the player shows.
    await page.getByLabel('Recording file').setInputFiles(clip);
    await page.locator('video').waitFor({ timeout: 90_000 });
    expect(await page.getByText('steps.mp4', { exact: true }).isVisible()).toBe(true);
    expect(await page.getByText('160 × 120 · 25 fps · 0:05').isVisible()).toBe(true);
    const recordingId = await page.evaluate(
      async (id) => ((await (await fetch(`/api/tutorials/${id}/recordings`)).json()) as { recordings: { id: string; status: string }[] }).recordings[0].id,
      tutorialId,
    );

    // A malformed transcript is refused with the line named; nothing is saved.
    await page.getByLabel('Transcript file').setInputFiles(join(dir, 'broken.vtt'));
    await expect.poll(() => page.getByText(/Line 5: .*Nothing was saved/).isVisible()).toBe(true);
    await shot(page, 'footage-transcript-refused');

    await page.getByLabel('Transcript file').setInputFiles(join(dir, 'hexagon-box.vtt'));
    await expect.poll(() => page.getByText('Read 3 timed lines from “hexagon-box.vtt” (WebVTT).').isVisible()).toBe(true);
    const cues = page.getByRole('list', { name: 'Transcript lines' }).getByRole('button');
    await expect.poll(() => cues.count()).toBe(3);

    // Clicking a line seeks the video to its start, and that line becomes the spoken one.
    await cues.filter({ hasText: 'First we score the base panel.' }).click();
    await expect.poll(() => page.locator('video').evaluate((v: HTMLVideoElement) => v.currentTime)).toBeCloseTo(1.5, 1);
    await expect.poll(() => cues.filter({ hasText: 'First we score' }).getAttribute('aria-current')).toBe('true');

    // Search marks every match and steps through them.
    const search = page.getByPlaceholder('Search the transcript');
    await search.fill('we');
    await expect.poll(() => page.getByText('1 of 3').isVisible()).toBe(true);
    expect(await page.locator('mark').count()).toBe(3);
    await search.press('Enter');
    await expect.poll(() => page.getByText('2 of 3').isVisible()).toBe(true);
    // Keys typed into the search box are text, not shortcuts: no chapter appears.
    await search.press('c');
    await search.fill('');

    // C marks a chapter at the playhead, named from the line said there ("First we score ..." -> "Score ...").
    await page.getByRole('heading', { name: 'Chapters' }).click();
    await page.keyboard.press('c');
    const chapters = page.getByRole('list', { name: 'Chapters in time order' });
    await expect.poll(() => chapters.getByRole('button', { name: 'Score the base panel', exact: true }).isVisible()).toBe(true);
    expect(await chapters.getByRole('listitem').count()).toBe(1);
    expect(await chapters.getByText('0:01').isVisible()).toBe(true);
    // The first chapter sits at 1.5 s, so the page offers to move it to 0:00.
    await expect.poll(() => page.getByText('The first chapter should start at 0:00').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Move “Score the base panel” to 0:00' }).click();
    await expect.poll(() => page.getByText('The first chapter should start at 0:00').count()).toBe(0);
    expect(await chapters.getByText('0:00').isVisible()).toBe(true);

    // Rename in place: click the title, type, Enter.
    await chapters.getByRole('button', { name: 'Score the base panel', exact: true }).click();
    await page.getByLabel('Chapter title').fill('Score the base');
    await page.getByLabel('Chapter title').press('Enter');
    await expect.poll(() => chapters.getByRole('button', { name: 'Score the base', exact: true }).isVisible()).toBe(true);
    await shot(page, 'footage-chapters');

    // Pull the exact frame at the playhead (1.5 s: the second colour of the clip).
    await page.getByRole('button', { name: /^Pull still/ }).click();
    const stills = page.getByRole('list', { name: 'Stills in time order' });
    await expect.poll(() => stills.getByRole('listitem').count(), { timeout: 20_000 }).toBe(1);
    const caption = stills.getByLabel('Caption');
    await caption.fill('The base panel, scored on every side');
    await stills.getByLabel('Alt text').click();
    await expect.poll(() => stills.getByText('Saved').isVisible()).toBe(true);
    expect(await stills.getByText(/screen readers/).isVisible()).toBe(true);
    await shot(page, 'footage-still');

    // What the server kept: the caption, and a frame of the colour on screen at 1.5 s
    // (colourSteps: one colour a second, in STEPS order).
    const saved = (await (await page.request.get(`/api/recordings/${recordingId}/stills`)).json()) as {
      stills: { caption: string; url: string; atMs: number }[];
    };
    expect(saved.stills).toHaveLength(1);
    expect(saved.stills[0].caption).toBe('The base panel, scored on every side');
    const image = join(dir, 'still.jpg');
    await writeFile(image, await (await page.request.get(saved.stills[0].url)).body());
    expect(nearestStep(await pixelAt(image, 80, 60))).toBe('lime');

    // The chapter list copies as "0:00 Title" lines.
    await ctx.grantPermissions(['clipboard-read', 'clipboard-write']);
    await page.getByRole('button', { name: 'Copy chapter list' }).click();
    await expect.poll(() => page.evaluate(() => navigator.clipboard.readText())).toBe('0:00 Score the base');

    // After a reload everything is still there.
    await page.reload();
    await page.locator('video').waitFor();
    await expect
      .poll(() => page.getByRole('list', { name: 'Chapters in time order' }).getByRole('button', { name: 'Score the base', exact: true }).isVisible())
      .toBe(true);
    await expect
      .poll(() => page.getByRole('list', { name: 'Stills in time order' }).getByLabel('Caption').inputValue())
      .toBe('The base panel, scored on every side');
    await shot(page, 'footage-reloaded');
    await ctx.close();
  });
});
