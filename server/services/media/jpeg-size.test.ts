import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { readJpegSize } from './jpeg-size';

const picture = (progressive: boolean) =>
  sharp({ create: { width: 37, height: 23, channels: 3, background: '#A87B4F' } })
    .jpeg({ progressive })
    .toBuffer();

describe('readJpegSize (ITU-T T.81 markers), checked against sharp/libvips metadata', () => {
  it('reads baseline (SOF0) and progressive (SOF2) JPEGs', async () => {
    for (const progressive of [false, true]) {
      const bytes = await picture(progressive);
      const meta = await sharp(bytes).metadata();
      expect(readJpegSize(bytes)).toEqual({ width: meta.width, height: meta.height });
    }
  });

  it('returns null for other files and for a JPEG cut before its frame header', async () => {
    expect(
      readJpegSize(
        await sharp({ create: { width: 4, height: 4, channels: 3, background: 'red' } })
          .png()
          .toBuffer(),
      ),
    ).toBeNull();
    expect(readJpegSize((await picture(false)).subarray(0, 6))).toBeNull();
    expect(readJpegSize(new Uint8Array())).toBeNull();
  });
});
