import { create, all } from 'mathjs';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { laplacianVariance } from './sharpness';

const math = create(all);

/** The same measure written with mathjs matrix operations, as an independent cross-check. */
function mathjsLaplacianVariance(gray: Uint8Array, w: number, h: number): number {
  const m = Array.from({ length: h }, (_, r) => Array.from(gray.subarray(r * w, r * w + w)));
  const at = (r0: number, c0: number) => math.subset(m, math.index(math.range(r0, r0 + h - 2), math.range(c0, c0 + w - 2))) as number[][];
  const lap = math.subtract(math.multiply(4, at(1, 1)), math.add(math.add(at(0, 1), at(2, 1)), math.add(at(1, 0), at(1, 2)))) as number[][];
  return math.variance(lap.flat(), 'uncorrected') as unknown as number;
}

function noise(w: number, h: number, seed = 7): Uint8Array {
  const out = new Uint8Array(w * h);
  let s = seed;
  for (let i = 0; i < out.length; i++) {
    s = (s * 1103515245 + 12345) & 0x7fffffff;
    out[i] = s & 0xff;
  }
  return out;
}

describe('laplacianVariance', () => {
  it('a flat picture scores 0', () => {
    expect(laplacianVariance(new Uint8Array(25).fill(90), 5, 5)).toBe(0);
  });

  it('worked by hand: one bright pixel in a 4x3 picture gives Laplacians 32 and -8, variance 400', () => {
    const g = new Uint8Array([0, 0, 0, 0, 0, 8, 0, 0, 0, 0, 0, 0]);
    expect(laplacianVariance(g, 4, 3)).toBe(400);
  });

  it('matches the same kernel and population variance computed with mathjs (reference library)', () => {
    const g = noise(23, 17);
    expect(laplacianVariance(g, 23, 17)).toBeCloseTo(mathjsLaplacianVariance(g, 23, 17), 6);
  });

  it('a picture blurred by sharp/libvips (reference library) scores lower than the original', async () => {
    const w = 64;
    const h = 48;
    const g = noise(w, h, 3);
    const blurred = await sharp(Buffer.from(g), { raw: { width: w, height: h, channels: 1 } })
      .blur(2)
      .raw()
      .toBuffer();
    expect(laplacianVariance(new Uint8Array(blurred), w, h)).toBeLessThan(laplacianVariance(g, w, h) / 10);
  });
});
