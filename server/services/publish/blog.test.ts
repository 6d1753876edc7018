import { execFile } from 'node:child_process';
import { createWriteStream } from 'node:fs';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { HtmlValidate } from 'html-validate';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { blogHtml, blogZip, isoDuration } from './blog';
import { renderBlogImage } from './images';
import { hatboxBundle } from './test-fixtures';
import type { PublishBundle } from './types';

const run = promisify(execFile);

let dir: string;
let bundle: PublishBundle;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'cw-blog-'));
  bundle = await hatboxBundle(dir);
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** The attributes of every <img> in some HTML. */
function imgs(html: string): Record<string, string>[] {
  return [...html.matchAll(/<img\b([^>]*)>/g)].map((m) => Object.fromEntries([...m[1]!.matchAll(/([\w-]+)="([^"]*)"/g)].map((a) => [a[1]!, a[2]!])));
}

function jsonLd(html: string): Record<string, any> {
  const m = /<script type="application\/ld\+json">([\s\S]*?)<\/script>/.exec(html);
  expect(m).not.toBeNull();
  return JSON.parse(m![1]!);
}

describe('blogHtml', () => {
  it('passes html-validate with its "html-validate:recommended" rules', async () => {
    const { page } = await blogHtml(bundle, { imageBase: 'images/' });
    const report = await new HtmlValidate({ extends: ['html-validate:recommended'] }).validateString(page);
    const messages = report.results.flatMap((r) => r.messages.map((m) => `${m.ruleId}: ${m.message}`));
    expect(messages).toEqual([]);
    expect(report.valid).toBe(true);
  });

  it('still validates when the write-up has no section headings, no live lists and a bare photo', async () => {
    const doc = {
      type: 'doc',
      content: [
        { type: 'still', attrs: { stillId: 's2', src: '/media/s2.jpg', alt: '', caption: '', width: null, height: null } },
        {
          type: 'step',
          attrs: { atMs: null, chapterId: null },
          content: [
            { type: 'stepTitle', content: [] },
            { type: 'paragraph', content: [{ type: 'text', text: 'Fold it.' }] },
            { type: 'tip', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Crease hard.' }] }] },
          ],
        },
        { type: 'tip', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Use a bone folder.' }] }] },
        // One of our stills that no longer exists: left out rather than shown broken.
        { type: 'still', attrs: { stillId: 'gone', src: '/media/gone.jpg', alt: 'x', caption: '', width: null, height: null } },
      ],
    };
    const { page, html } = await blogHtml({ ...bundle, doc }, { imageBase: 'images/' });
    const report = await new HtmlValidate({ extends: ['html-validate:recommended'] }).validateString(page);
    expect(report.results.flatMap((r) => r.messages.map((m) => `${m.ruleId}: ${m.message}`))).toEqual([]);
    // The supplies and cut list are added under their own headings, before the steps.
    expect(html.indexOf('<h2>Supplies</h2>')).toBeLessThan(html.indexOf('<h2>Cut list</h2>'));
    expect(html.indexOf('<h2>Cut list</h2>')).toBeLessThan(html.indexOf('<h2>Steps</h2>'));
    expect(html).toContain('<h3>Step 1</h3>');
    // The s2 still keeps its caption as alt; the missing one is gone.
    expect(imgs(html).map((t) => t.alt)).toEqual(['Scoring the strip']);
    expect(html).not.toContain('gone');
  });

  it('is a complete HTML5 page with the article fragment inside it', async () => {
    const { page, html } = await blogHtml(bundle, { imageBase: 'images/' });
    expect(page).toMatch(/^<!DOCTYPE html>\n<html lang="en">/);
    expect(page).toContain('<meta charset="utf-8">');
    expect(page).toContain('<title>Round hatbox</title>');
    expect(page).toContain(html);
    expect(html).toMatch(/^<article[^>]*><h1>Round hatbox<\/h1>/);
    expect(html).toContain('<ol class="cw-steps">');
    expect(html).toContain('<figure class="cw-still">');
    expect(html).toContain('<figcaption>Everything cut</figcaption>');
  });

  it('has no script but the JSON-LD block and no inline event handlers', async () => {
    const { page } = await blogHtml(bundle, { imageBase: 'images/' });
    const scripts = [...page.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts).toEqual(['<script type="application/ld+json">']);
    expect(page).not.toMatch(/\son[a-z]+=/i);
    expect(page).not.toMatch(/javascript:/i);
  });

  it('gives every img an alt text, a width and a height matching the resized file (checked with sharp)', async () => {
    const { html, images } = await blogHtml(bundle, { imageBase: 'images/' });
    const tags = imgs(html);
    expect(tags).toHaveLength(3);
    for (const t of tags) {
      expect(t.alt?.trim()).toBeTruthy();
      expect(Number(t.width)).toBeGreaterThan(0);
      expect(Number(t.height)).toBeGreaterThan(0);
    }
    // alt: the still's own, else its caption, else the step's title.
    expect(tags.map((t) => t.alt)).toEqual(['Two kraft circles and two strips on a cutting mat', 'Scoring the strip', 'Glue the wall to the base']);
    for (const image of images) {
      const tag = tags.find((t) => t.src === `images/${image.name}`);
      if (!tag) continue; // the cover, when the write-up does not show it
      for (const file of await renderBlogImage(image)) {
        const meta = await sharp(file.data).metadata();
        expect(meta.format).toBe('jpeg');
        expect([meta.width, meta.height]).toEqual([file.width, file.height]);
        if (file.name === image.name) expect([String(meta.width), String(meta.height)]).toEqual([tag.width, tag.height]);
      }
    }
  });

  it('resizes to 1200 px wide with a 600 px srcset candidate and never upscales', async () => {
    const { html } = await blogHtml(bundle, { imageBase: 'images/' });
    const [big, mid, small] = imgs(html);
    // 1600 x 900 -> 1200 x 675 (the same 16:9).
    expect([big!.width, big!.height]).toEqual(['1200', '675']);
    expect(big!.srcset).toBe('images/round-hatbox-s1-600.jpg 600w, images/round-hatbox-s1.jpg 1200w');
    // 800 x 450 stays 800 wide; only the 600 px copy is smaller.
    expect([mid!.width, mid!.height]).toEqual(['800', '450']);
    expect(mid!.srcset).toBe('images/round-hatbox-s2-600.jpg 600w, images/round-hatbox-s2.jpg 800w');
    // 400 x 300 is smaller than both: one file at its own size, no srcset.
    expect([small!.width, small!.height]).toEqual(['400', '300']);
    expect(small!.srcset).toBeUndefined();
  });

  it('uses the image prefix it is given (the media address for "copy HTML")', async () => {
    const { html, jsonLd: ld } = await blogHtml(bundle, { imageBase: 'https://cardwright.example/media/pub/round-hatbox/' });
    for (const t of imgs(html)) {
      expect(t.src).toMatch(/^https:\/\/cardwright\.example\/media\/pub\/round-hatbox\/round-hatbox-s\d\.jpg$/);
      for (const candidate of (t.srcset ?? '').split(', ').filter(Boolean)) expect(candidate).toMatch(/^https:\/\/cardwright\.example\/media\/pub\//);
    }
    expect(ld.image).toBe('https://cardwright.example/media/pub/round-hatbox/round-hatbox-s1.jpg');
  });

  it('lists the supplies with rel="sponsored noopener" on sponsored links, the code, and the disclosure before them', async () => {
    const { html } = await blogHtml(bundle, { imageBase: 'images/' });
    expect(html).toContain('<a href="https://papershop.example/kraft-80" rel="sponsored noopener">Kraft cardstock, 80 lb</a>');
    // The tag beside the item, not only the disclosure above the list (FTC Endorsement Guides, 16 CFR 255).
    expect(html).toContain('Kraft cardstock, 80 lb</a> <span class="cw-sponsored">(sponsored link)</span>');
    expect(html).toContain('<a href="https://papershop.example/floral">Floral patterned paper</a>');
    expect(html).not.toContain('Floral patterned paper</a> <span class="cw-sponsored">');
    expect(html).toContain('HATBOX10');
    const disclosure = html.indexOf('Papershop sent me the kraft cardstock');
    expect(disclosure).toBeGreaterThan(0);
    expect(disclosure).toBeLessThan(html.indexOf('papershop.example/kraft-80'));
  });

  it('has the cut list as a table with fractions and millimetres', async () => {
    const { html } = await blogHtml(bundle, { imageBase: 'images/' });
    expect(html).toContain('<table>');
    // 10 9/16 in = 268.2875 mm, shown to 0.1 mm (1 in = 25.4 mm, NIST SP 811).
    expect(html).toContain('10 9/16 x 2 1/2 in <span class="cw-mm">(268.3 x 63.5 mm)</span>');
    expect(html).toContain('6 in circle <span class="cw-mm">(152.4 mm circle)</span>');
  });

  it('embeds schema.org HowTo JSON-LD with supplies, tools, steps and an ISO 8601 totalTime', async () => {
    const { html } = await blogHtml(bundle, { imageBase: 'images/' });
    const ld = jsonLd(html);
    // schema.org/HowTo: step (HowToStep), supply (HowToSupply), tool (HowToTool), totalTime (Duration).
    expect(ld['@context']).toBe('https://schema.org');
    expect(ld['@type']).toBe('HowTo');
    expect(ld.name).toBe('Round hatbox');
    expect(ld.totalTime).toBe('PT1H30M');
    expect(ld.image).toBe('images/round-hatbox-s1.jpg');
    expect(ld.supply.every((s: any) => s['@type'] === 'HowToSupply')).toBe(true);
    expect(ld.supply.map((s: any) => s.name)).toContain('Kraft cardstock, 80 lb');
    expect(ld.tool.map((t: any) => [t['@type'], t.name])).toEqual([
      ['HowToTool', 'Craft knife'],
      ['HowToTool', 'Scoring board'],
    ]);
    expect(ld.step).toHaveLength(4);
    expect(ld.step[0]).toMatchObject({
      '@type': 'HowToStep',
      position: 1,
      name: 'Cut the pieces',
      image: 'images/round-hatbox-s1.jpg',
      url: 'https://cardwright.example/t/round-hatbox#step-1',
    });
    expect(ld.step[0].text).toContain('craft knife on a cutting mat');
    expect(ld.step[3].image).toBeUndefined();
    // Every step url points at an id the page has.
    for (const s of ld.step) expect(html).toContain(`id="${s.url.split('#')[1]}"`);
  });

  it('keeps a hostile title from closing the JSON-LD script', async () => {
    const evil = { ...bundle, tutorial: { ...bundle.tutorial, title: 'Box </script><script>alert(1)</script>' } };
    const { html } = await blogHtml(evil, { imageBase: 'images/' });
    expect([...html.matchAll(/<script\b/g)]).toHaveLength(1);
    expect(jsonLd(html).name).toBe('Box </script><script>alert(1)</script>');
  });

  it('writes ISO 8601 durations (ISO 8601-1:2019, duration PnYnMnDTnHnMnS)', () => {
    expect(isoDuration(90)).toBe('PT1H30M');
    expect(isoDuration(45)).toBe('PT45M');
    expect(isoDuration(120)).toBe('PT2H');
  });
});

describe('blogZip', () => {
  it('writes a zip that Info-ZIP unzip tests clean, with index.html and the images it references', async () => {
    const file = join(dir, 'blog.zip');
    await blogZip(bundle, createWriteStream(file));
    await run('unzip', ['-tq', file]);
    const { stdout } = await run('unzip', ['-Z1', file]);
    const names = stdout.trim().split('\n').sort();
    expect(names).toEqual([
      'images/round-hatbox-s1-600.jpg',
      'images/round-hatbox-s1.jpg',
      'images/round-hatbox-s2-600.jpg',
      'images/round-hatbox-s2.jpg',
      'images/round-hatbox-s3.jpg',
      'index.html',
    ]);
    const { stdout: index } = await run('unzip', ['-p', file, 'index.html'], { maxBuffer: 10_000_000 });
    for (const t of imgs(index)) expect(names).toContain(t.src);
    const { stdout: jpeg } = await run('unzip', ['-p', file, 'images/round-hatbox-s1.jpg'], { encoding: 'buffer', maxBuffer: 10_000_000 });
    const meta = await sharp(jpeg).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 1200, 675]);
    expect((await readFile(file)).subarray(0, 4).toString('latin1')).toBe('PK\u0003\u0004');
  });
});
