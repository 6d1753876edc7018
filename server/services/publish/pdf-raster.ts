/**
 * Rasterizes our PDFs for the tests with Debian's poppler-utils (`pdftoppm`, independent of the
 * pdfkit that wrote them), as a printer would, and finds drawn lines in the pixels to a fraction
 * of a pixel: the centre of a thin line is the darkness-weighted mean of the pixels across it.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A greyscale page: one byte a pixel, 0 black, 255 white, rows top to bottom. */
export interface GreyPage {
  width: number;
  height: number;
  dpi: number;
  data: Uint8Array;
}

/** Reads a binary PGM (P5, maxval 255). */
function readPgm(buf: Buffer): Omit<GreyPage, 'dpi'> {
  let pos = 0;
  const token = (): string => {
    for (;;) {
      while (/\s/.test(String.fromCharCode(buf[pos]!))) pos++;
      if (buf[pos] === 0x23) while (buf[pos] !== 0x0a) pos++;
      else break;
    }
    const start = pos;
    while (!/\s/.test(String.fromCharCode(buf[pos]!))) pos++;
    return buf.subarray(start, pos).toString('ascii');
  };
  if (token() !== 'P5') throw new Error('not a binary PGM');
  const width = Number(token());
  const height = Number(token());
  if (Number(token()) !== 255) throw new Error('PGM maxval must be 255');
  pos++; // the single whitespace after maxval
  return { width, height, data: buf.subarray(pos, pos + width * height) };
}

/** One page of a PDF at `dpi`, greyscale, anti-aliased, through `pdftoppm`. */
export function rasterPage(pdf: Buffer, page: number, dpi = 300): GreyPage {
  const dir = mkdtempSync(join(tmpdir(), 'cardwright-raster-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', ['-r', String(dpi), '-gray', '-f', String(page), '-l', String(page), '-singlefile', file, join(dir, 'out')]);
    return { ...readPgm(readFileSync(join(dir, 'out.pgm'))), dpi };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * The x (in pixels, 0 at the page's left edge) of a vertical line near `nearX`, averaged over
 * rows `y0`..`y1` (pixels): each row's darkness-weighted centre within `reach` pixels. Pixel i
 * covers [i, i + 1), so its centre is i + 0.5. Throws when a row has no ink there.
 */
export function verticalLineX(g: GreyPage, nearX: number, y0: number, y1: number, reach = 8): number {
  const centres: number[] = [];
  for (let y = Math.ceil(y0); y <= Math.floor(y1); y++) {
    let sum = 0;
    let weight = 0;
    for (let x = Math.floor(nearX - reach); x <= Math.ceil(nearX + reach); x++) {
      const d = 255 - g.data[y * g.width + x]!;
      sum += (x + 0.5) * d;
      weight += d;
    }
    if (weight < 100) throw new Error(`no line near x = ${nearX.toFixed(1)} px on row ${y}`);
    centres.push(sum / weight);
  }
  return centres.reduce((a, b) => a + b, 0) / centres.length;
}
