/**
 * Resized copies of the stills for the blog page and the handout, made with sharp.
 * Sizes are worked out before resizing (so the HTML can be written without touching pixels)
 * and the resize is told the exact size, so the files always match the HTML's width and height.
 */
import sharp from 'sharp';

/** Widths of the blog's image files: the main one and the smaller srcset candidate. */
export const BLOG_WIDTHS = [1200, 600] as const;
/** JPEG quality of the blog's files. */
export const BLOG_QUALITY = 80;

/** One file of a blog image. */
export interface ImageVariant {
  name: string;
  width: number;
  height: number;
}

/** A still as the blog page uses it. */
export interface BlogImage {
  /** The still's id. */
  still: string;
  /** The full-size source JPEG (a path, or its bytes from object storage). */
  file: string | Buffer;
  /** File name of the main (up to 1200 px wide) copy. */
  name: string;
  width: number;
  height: number;
  /** Every file for the img's srcset, smallest first (the main file included). */
  srcset: ImageVariant[];
}

/** The displayed size of an image file: EXIF orientation applied. */
export async function imageSize(file: string | Buffer): Promise<{ width: number; height: number }> {
  const m = await sharp(file).metadata();
  const width = m.autoOrient?.width ?? m.width;
  const height = m.autoOrient?.height ?? m.height;
  if (!width || !height) throw new Error(`not an image with a size: ${typeof file === 'string' ? file : `${file.length} bytes`}`);
  return { width, height };
}

/** The size at `width` px wide, never larger than the source (no upscaling). */
export function fitWidth(source: { width: number; height: number }, width: number): { width: number; height: number } {
  const w = Math.min(source.width, width);
  return { width: w, height: Math.max(1, Math.round((source.height * w) / source.width)) };
}

/** The blog's files for a still: `${base}.jpg` up to 1200 px and `${base}-600.jpg` when that is smaller. */
export function blogVariants(source: { width: number; height: number }, base: string): ImageVariant[] {
  const [main, small] = BLOG_WIDTHS.map((w) => fitWidth(source, w)) as [{ width: number; height: number }, { width: number; height: number }];
  const out: ImageVariant[] = [];
  if (small.width < main.width) out.push({ name: `${base}-${small.width}.jpg`, ...small });
  out.push({ name: `${base}.jpg`, ...main });
  return out;
}

/** One resized JPEG at exactly the given size. */
export async function resizeJpeg(file: string | Buffer, size: { width: number; height: number }, quality = BLOG_QUALITY): Promise<Buffer> {
  // fit 'fill' with both sides given: the output is exactly this size (at most half a pixel off the source's ratio).
  return sharp(file).rotate().resize({ width: size.width, height: size.height, fit: 'fill' }).jpeg({ quality }).toBuffer();
}

/** Every file of a blog image, resized. */
export async function renderBlogImage(image: BlogImage): Promise<(ImageVariant & { data: Buffer })[]> {
  const out: (ImageVariant & { data: Buffer })[] = [];
  for (const v of image.srcset) out.push({ ...v, data: await resizeJpeg(image.file, v) });
  return out;
}
