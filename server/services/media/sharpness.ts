/**
 * How sharp a greyscale picture is: the variance of its Laplacian (4-neighbour kernel
 * [0 1 0; 1 -4 1; 0 1 0], sign flipped, which leaves the variance unchanged) over the inner pixels.
 * Blur flattens edges, so a blurred frame scores lower than a sharp one of the same scene
 * (a common focus measure; Pech-Pacheco et al., ICPR 2000, cited from memory).
 */
export function laplacianVariance(gray: Uint8Array, width: number, height: number): number {
  if (width < 3 || height < 3) return 0;
  if (gray.length < width * height) throw new RangeError(`expected ${width * height} bytes, got ${gray.length}`);
  let sum = 0;
  let sumSq = 0;
  for (let y = 1; y < height - 1; y++) {
    const row = y * width;
    for (let x = 1; x < width - 1; x++) {
      const i = row + x;
      const v = 4 * gray[i] - gray[i - 1] - gray[i + 1] - gray[i - width] - gray[i + width];
      sum += v;
      sumSq += v * v;
    }
  }
  const n = (width - 2) * (height - 2);
  const mean = sum / n;
  return sumSq / n - mean * mean;
}
