import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateDemoVideo } from './demo-video';
import { grabFrame } from './frames';
import { MediaError } from './media-error';
import { probe } from './probe';
import { pixelAt, tempDir, topLevelBoxes } from './test-clips';

let dir: string;
beforeAll(async () => {
  dir = await tempDir();
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe('generateDemoVideo', () => {
  it('records coloured scenes with sound as H.264/AAC mp4 of the right length and size', async () => {
    const out = join(dir, 'demo.mp4');
    await generateDemoVideo(out, {
      width: 192,
      height: 108,
      scenes: [
        { title: 'Cut the 4" circle: 100% kraft', color: '#A87B4F', seconds: 1 },
        { title: 'Score at 1/2 in', color: '#6E8B74', seconds: 1.5 },
      ],
    });
    const info = await probe(out);
    expect(info).toMatchObject({ videoCodec: 'h264', audioCodec: 'aac', width: 192, height: 108, frameRate: 25 });
    expect(Math.abs(info.durationMs - 2500)).toBeLessThan(60);
    expect(topLevelBoxes(out).indexOf('moov')).toBeLessThan(topLevelBoxes(out).indexOf('mdat'));

    // A corner away from the text shows the scene colour; 8-bit YUV and JPEG shift it a few levels.
    const still = join(dir, 'scene-2.jpg');
    await grabFrame(out, 2000, still);
    const [r, g, b] = await pixelAt(still, 4, 100);
    for (const [got, want] of [
      [r, 0x6e],
      [g, 0x8b],
      [b, 0x74],
    ])
      expect(Math.abs(got - want)).toBeLessThanOrEqual(10);
  });

  it('refuses a colour that could smuggle filter options', async () => {
    await expect(generateDemoVideo(join(dir, 'bad.mp4'), { scenes: [{ title: 'x', color: 'red:s=9999x9999', seconds: 1 }] })).rejects.toBeInstanceOf(
      MediaError,
    );
  });
});
