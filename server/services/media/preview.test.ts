import { readdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makePoster, makePreview } from './preview';
import { probe } from './probe';
import { colourSteps, ffmpegMake, ffprobeVideo, nearestStep, pixelAt, tempDir, topLevelBoxes } from './test-clips';

let dir: string;
beforeAll(async () => {
  dir = await tempDir();
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe('makePreview (H.264 + AAC, at most 720 px tall, moov before mdat)', () => {
  it('scales a 1280x960 recording to 960x720 H.264/yuv420p with AAC and faststart, reporting progress', async () => {
    const source = await ffmpegMake(join(dir, 'big.mp4'), [
      '-f',
      'lavfi',
      '-i',
      'testsrc2=s=1280x960:r=25:d=2',
      '-f',
      'lavfi',
      '-i',
      'sine=f=330:r=48000:d=2',
      '-c:v',
      'libx264',
      '-preset',
      'ultrafast',
      '-pix_fmt',
      'yuv420p',
      '-c:a',
      'aac',
      '-shortest',
    ]);
    const out = join(dir, 'preview.mp4');
    const progress: number[] = [];
    await makePreview(source, out, { onProgress: (p) => progress.push(p) });

    const info = await probe(out);
    expect(info).toMatchObject({ videoCodec: 'h264', audioCodec: 'aac', width: 960, height: 720 });
    expect(Math.abs(info.durationMs - 2000)).toBeLessThan(60);
    expect((await ffprobeVideo(out)).pix_fmt).toBe('yuv420p');

    // ISO/IEC 14496-12 top-level boxes: with +faststart the moov box comes before mdat.
    const boxes = topLevelBoxes(out);
    expect(boxes).toContain('mdat');
    expect(boxes.indexOf('moov')).toBeGreaterThanOrEqual(0);
    expect(boxes.indexOf('moov')).toBeLessThan(boxes.indexOf('mdat'));

    expect(progress.length).toBeGreaterThan(0);
    expect(progress.every((p, i) => p >= 0 && p <= 100 && (i === 0 || p > progress[i - 1]))).toBe(true);
    expect(progress[progress.length - 1]).toBeGreaterThanOrEqual(90);
    expect((await readdir(dir)).filter((f) => f.endsWith('.part'))).toEqual([]);
  });

  it('never upscales, rounds odd sizes to even, and copes with no sound', async () => {
    const source = await ffmpegMake(join(dir, 'odd.mkv'), [
      '-f',
      'lavfi',
      '-i',
      'testsrc2=s=321x241:r=25:d=0.5',
      '-c:v',
      'libx264',
      '-preset',
      'ultrafast',
      '-pix_fmt',
      'yuv444p',
    ]);
    const out = join(dir, 'odd-preview.mp4');
    await makePreview(source, out);
    const info = await probe(out);
    expect(info).toMatchObject({ width: 320, height: 240, hasAudio: false });
  });
});

describe('makePoster', () => {
  it('takes the poster at 10% of the duration but not before 1 s, or at the time asked', async () => {
    const steps = await colourSteps(dir); // 5 s: red, lime, blue, yellow, magenta
    const poster = join(dir, 'poster.jpg');
    expect(await makePoster(steps, poster)).toEqual({ atMs: 1000, width: 160, height: 120 });
    expect(nearestStep(await pixelAt(poster, 80, 60))).toBe('lime');
    expect((await makePoster(steps, poster, 3500)).atMs).toBe(3500);
    expect(nearestStep(await pixelAt(poster, 80, 60))).toBe('yellow');
  });
});
