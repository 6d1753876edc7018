import { readFile, rm } from 'node:fs/promises';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { grabFrame, grabSharpest } from './frames';
import { MediaError } from './media-error';
import { laplacianVariance } from './sharpness';
import { colourSteps, ffmpegMake, nearestStep, pixelAt, STEPS, tempDir } from './test-clips';

let dir: string;
let steps: string;

beforeAll(async () => {
  dir = await tempDir();
  steps = await colourSteps(dir);
});
afterAll(() => rm(dir, { recursive: true, force: true }));

const colourAt = async (atMs: number) => {
  const out = join(dir, `at-${atMs}.jpg`);
  const size = await grabFrame(steps, atMs, out);
  return { colour: nearestStep(await pixelAt(out, 80, 60)), size, out };
};

async function sharpnessOf(file: string): Promise<number> {
  const { data, info } = await sharp(file).greyscale().raw().toBuffer({ resolveWithObject: true });
  return laplacianVariance(new Uint8Array(data), info.width, info.height);
}

describe('grabFrame (ffmpeg: -ss before -i decodes to the exact frame; first frame at or after the time)', () => {
  it('lands in the right second of a clip that changes colour every second', async () => {
    for (const [i, step] of STEPS.entries()) {
      expect((await colourAt(i * 1000 + 500)).colour, `at ${i}.5 s`).toBe(step.name);
    }
  });

  it('is exact to the frame across a colour change at 25 fps (frames at 1.96 s and 2.00 s)', async () => {
    expect((await colourAt(1960)).colour).toBe('lime'); // the last frame of second 1 starts at 1.96 s
    expect((await colourAt(1961)).colour).toBe('blue'); // the next frame at or after 1.961 s is 2.00 s
    expect((await colourAt(2000)).colour).toBe('blue');
  });

  it('keeps the full source resolution (checked with sharp metadata)', async () => {
    const { size, out } = await colourAt(250);
    const meta = await sharp(out).metadata();
    expect(size).toEqual({ width: 160, height: 120 });
    expect(size).toEqual({ width: meta.width, height: meta.height });
  });

  it('refuses a time past the end and a negative time with a MediaError', async () => {
    const late = await grabFrame(steps, 9000, join(dir, 'late.jpg')).catch((e: unknown) => e);
    expect(late).toBeInstanceOf(MediaError);
    expect((late as MediaError).reason).toBe('There is no frame at 0:09: the video ends before that');
    await expect(grabFrame(steps, -1, join(dir, 'neg.jpg'))).rejects.toBeInstanceOf(MediaError);
  });
});

describe('grabSharpest (variance of the Laplacian as a focus measure, a common practice)', () => {
  let blurry: string;
  beforeAll(async () => {
    // testsrc2 is sharp everywhere; a strong box blur covers every frame except 1.40-1.60 s.
    blurry = await ffmpegMake(join(dir, 'blurry.mp4'), [
      '-f',
      'lavfi',
      '-i',
      'testsrc2=s=320x240:r=25:d=3',
      '-vf',
      "boxblur=luma_radius=6:luma_power=2:chroma_radius=6:enable='not(between(t,1.39,1.61))'",
      '-c:v',
      'libx264',
      '-preset',
      'ultrafast',
      '-pix_fmt',
      'yuv420p',
      '-g',
      '250',
    ]);
  });

  it('picks a sharp frame within ±1 s, sharper than the frame asked for', async () => {
    const out = join(dir, 'sharpest.jpg');
    const still = await grabSharpest(blurry, 1000, out);
    expect(still.atMs).toBeGreaterThanOrEqual(1390);
    expect(still.atMs).toBeLessThanOrEqual(1610);
    expect(still).toMatchObject({ width: 320, height: 240 });
    expect(still.score).toBeGreaterThan(0);

    const asked = join(dir, 'asked.jpg');
    await grabFrame(blurry, 1000, asked);
    expect(await sharpnessOf(out)).toBeGreaterThan(3 * (await sharpnessOf(asked)));
  });

  it('its time grabs back the very same frame', async () => {
    const out = join(dir, 'sharpest-2.jpg');
    const still = await grabSharpest(blurry, 1800, out, { windowMs: 600 });
    const again = join(dir, 'again.jpg');
    await grabFrame(blurry, still.atMs, again);
    expect((await readFile(again)).equals(await readFile(out))).toBe(true);
  });

  it('looks only inside the bounds it is given (a chapter starting at 1.7 s never takes the sharp frames of the one before)', async () => {
    const free = await grabSharpest(blurry, 1700, join(dir, 'free.jpg'));
    expect(free.atMs).toBeLessThan(1650);
    const inside = await grabSharpest(blurry, 1700, join(dir, 'inside.jpg'), { within: { fromMs: 1700, toMs: 3000 } });
    expect(inside.atMs).toBeGreaterThanOrEqual(1700);
    expect(inside.atMs).toBeLessThan(3000);
  });

  it('keeps the window inside the video near its start and end', async () => {
    const early = await grabSharpest(blurry, 100, join(dir, 'early.jpg'));
    expect(early.atMs).toBeGreaterThanOrEqual(0);
    expect(early.atMs).toBeLessThanOrEqual(1610);
    const late = await grabSharpest(blurry, 60_000, join(dir, 'late-sharp.jpg'), { windowMs: 300 });
    expect(late.atMs).toBeGreaterThanOrEqual(2600);
    expect(late.atMs).toBeLessThan(3000);
  });
});
