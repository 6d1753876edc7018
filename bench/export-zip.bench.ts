/**
 * The blog zip (P1) of a 30-step tutorial with 30 full-size 1920 x 1080 stills: index.html plus
 * a 1200 px and a 600 px JPEG of each still. Target: under 5 s. Printed beside two baselines
 * from the same run: reading the 30 files, and one sharp resize to 1200 px of each still in turn
 * (the least any zip of resized stills can cost on one thread).
 *
 *   npx tsx bench/export-zip.bench.ts [--runs 3]
 *
 * The stills (smooth gradients with seeded noise, so they weigh what camera frames weigh) are
 * made once and cached in bench/out/export-zip/.
 */
import { createWriteStream, existsSync } from 'node:fs';
import { mkdir, readFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { JSONContent } from '@tiptap/core';
import sharp from 'sharp';
import { blogZip } from '@server/services/publish/blog';
import { hatboxBundle } from '@server/services/publish/test-fixtures';
import type { PublishBundle, PublishStill } from '@server/services/publish/types';
import { isMain, ms, numberArg, seeded, timeAsync, verdict } from './lib';

const TARGET_MS = 5000;
const STEPS = 30;
const OUT = fileURLToPath(new URL('./out/export-zip/', import.meta.url));

/** A 1920 x 1080 JPEG (quality 90) with gradients and noise, cached between runs. */
async function makeStill(file: string, seed: number): Promise<void> {
  if (existsSync(file) && (await stat(file)).size > 100_000) return;
  const w = 1920;
  const h = 1080;
  const rand = seeded(seed);
  const raw = Buffer.alloc(w * h * 3);
  const [r0, g0, b0] = [rand() * 200, rand() * 200, rand() * 200];
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const i = (y * w + x) * 3;
      const n = (rand() - 0.5) * 24;
      raw[i] = Math.max(0, Math.min(255, r0 + (x / w) * 55 + n));
      raw[i + 1] = Math.max(0, Math.min(255, g0 + (y / h) * 55 + n));
      raw[i + 2] = Math.max(0, Math.min(255, b0 + ((x + y) / (w + h)) * 55 + n));
    }
  }
  await sharp(raw, { raw: { width: w, height: h, channels: 3 } })
    .jpeg({ quality: 90 })
    .toFile(file);
}

/** The hatbox bundle stretched to 30 steps, each with its own full-size still. */
async function bigBundle(): Promise<PublishBundle> {
  await mkdir(OUT, { recursive: true });
  const base = await hatboxBundle(join(OUT, 'small'));
  const stills: PublishStill[] = [];
  const steps: JSONContent[] = [];
  for (let i = 1; i <= STEPS; i++) {
    const file = join(OUT, `still-${i}.jpg`);
    await makeStill(file, 1000 + i);
    stills.push({ id: `s${i}`, atMs: i * 20_000, caption: `Step ${i} done`, alt: `The box after step ${i}`, width: 1920, height: 1080, file });
    steps.push({
      type: 'step',
      attrs: { atMs: i * 20_000, chapterId: null },
      content: [
        { type: 'stepTitle', content: [{ type: 'text', text: `Fold panel ${i}` }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'Score along the marks, fold firmly and glue the tab to the next panel. '.repeat(3) }] },
        { type: 'still', attrs: { stillId: `s${i}`, src: `/media/stills/s${i}.jpg`, alt: '', caption: '', width: 1920, height: 1080 } },
      ],
    });
  }
  const doc: JSONContent = { type: 'doc', content: [...(base.doc.content ?? []).filter((n) => n.type !== 'step'), ...steps] };
  return { ...base, doc, stills, chapters: stills.map((s, i) => ({ title: `Panel ${i + 1}`, startMs: s.atMs })) };
}

export async function benchExportZip(runs = 3): Promise<{ zipMs: number; readMs: number; resizeMs: number; pass: boolean }> {
  const bundle = await bigBundle();
  const files = bundle.stills.map((s) => s.file);
  const zipFile = join(OUT, 'blog.zip');
  const mb = (await Promise.all(files.map((f) => stat(f)))).reduce((n, s) => n + s.size, 0) / 1e6;

  const read = await timeAsync(() => Promise.all(files.map((f) => readFile(f))), runs);
  const resize = await timeAsync(async () => {
    for (const f of files) await sharp(f).resize({ width: 1200 }).jpeg({ quality: 80 }).toBuffer();
  }, runs);
  const zip = await timeAsync(() => blogZip(bundle, createWriteStream(zipFile)), runs);
  const size = (await stat(zipFile)).size / 1e6;
  const pass = zip.median < TARGET_MS;

  const row = (label: string, t: number, extra = '') => console.log(`  ${label.padEnd(52)} ${ms(t).padStart(9)}${extra}`);
  console.log(`blog zip: ${STEPS} steps, ${files.length} stills 1920x1080 (${mb.toFixed(1)} MB of JPEG), median of ${runs}:`);
  row(`baseline: read the ${files.length} files`, read.median);
  row('baseline: resize each to 1200 px, one at a time', resize.median);
  row('blogZip: index.html + 1200 and 600 px of each, zipped', zip.median, `  (min ${ms(zip.min)}, max ${ms(zip.max)}; zip ${size.toFixed(1)} MB)`);
  console.log(`  ${(zip.median / resize.median).toFixed(2)}x the one-size resize baseline; target < ${TARGET_MS} ms: ${verdict(zip.median, TARGET_MS)}`);
  return { zipMs: zip.median, readMs: read.median, resizeMs: resize.median, pass };
}

if (isMain(import.meta.url)) {
  void benchExportZip(numberArg('runs', 3)).then((r) => {
    if (!r.pass) process.exitCode = 1;
  });
}
