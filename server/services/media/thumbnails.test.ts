import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MediaError } from './media-error';
import { makeThumbnails } from './thumbnails';
import { colourSteps, nearestStep, pixelAt, STEPS, tempDir } from './test-clips';

let dir: string;
let steps: string;
beforeAll(async () => {
  dir = await tempDir();
  steps = await colourSteps(dir); // 5 s, one colour a second
});
afterAll(() => rm(dir, { recursive: true, force: true }));

/** The colour in the middle of tile i of a sheet. */
const tileColour = (file: string, i: number, columns: number, w: number, h: number) =>
  pixelAt(file, (i % columns) * w + w / 2, Math.floor(i / columns) * h + h / 2).then(nearestStep);

describe('makeThumbnails (one sprite sheet per 100 tiles, the frame on screen at each time)', () => {
  it('five thumbnails of a 5 s clip show each second in order on one sheet', async () => {
    const t = await makeThumbnails(steps, join(dir, 'five'), { count: 5, width: 40 });
    expect(t).toMatchObject({ atMs: [0, 1000, 2000, 3000, 4000], columns: 5, rows: 1, perSheet: 5, tileWidth: 40, tileHeight: 30 });
    expect(t.files).toHaveLength(1);
    expect(await sharp(t.files[0]).metadata()).toMatchObject({ width: 200, height: 30, format: 'jpeg' });
    for (let i = 0; i < 5; i++) expect(await tileColour(t.files[0], i, 5, 40, 30)).toBe(STEPS[i].name);
  });

  it('everyMs spaces them evenly', async () => {
    const t = await makeThumbnails(steps, join(dir, 'every'), { everyMs: 2500, width: 40 });
    expect(t.atMs).toEqual([0, 2500]);
    expect([await tileColour(t.files[0], 0, 2, 40, 30), await tileColour(t.files[0], 1, 2, 40, 30)]).toEqual(['red', 'blue']);
  });

  it('more than 100 go onto further sheets of the same grid, never more than there are frames', async () => {
    const t = await makeThumbnails(steps, join(dir, 'many'), { count: 400, width: 16 });
    // 5 s at 25 fps has 125 frames.
    expect(t.atMs).toHaveLength(125);
    expect(t).toMatchObject({ columns: 10, rows: 10, perSheet: 100 });
    expect(t.files).toHaveLength(2);
    expect(await sharp(t.files[1]).metadata()).toMatchObject({ width: 160, height: 120 });
    // Tile 100 is the first on sheet 2, at 100 x 40 ms = 4 s.
    expect(t.atMs[100]).toBe(4000);
    expect(await tileColour(t.files[1], 0, 10, 16, 12)).toBe('magenta');
  });

  it('refuses count and everyMs together', async () => {
    await expect(makeThumbnails(steps, join(dir, 'both'), { count: 3, everyMs: 100 })).rejects.toBeInstanceOf(MediaError);
  });
});
