import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { JSONContent } from '@tiptap/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { handoutPdf } from './handout';
import { probePdf } from './pdf-probe';
import { detectHazards, safetyNotes } from './safety';
import { hatboxBundle, makeSolidJpeg } from './test-fixtures';
import type { PublishBundle } from './types';

let dir: string;
let bundle: PublishBundle;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'cw-handout-'));
  bundle = await hatboxBundle(dir);
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('handoutPdf', () => {
  it('has Letter pages of 612 x 792 pt and A4 pages of 595.28 x 841.89 pt (PDF reference, 1 pt = 1/72 in)', async () => {
    const letter = await probePdf(await handoutPdf(bundle, { paper: 'letter' }));
    for (const p of letter) expect([p.width, p.height]).toEqual([612, 792]);
    const a4 = await probePdf(await handoutPdf(bundle, { paper: 'a4' }));
    for (const p of a4) {
      expect(p.width).toBeCloseTo(595.28, 2);
      expect(p.height).toBeCloseTo(841.89, 2);
    }
  });

  it('prints the cut list with fractions and millimetres, and the numbered steps', async () => {
    const pages = await probePdf(await handoutPdf(bundle, { paper: 'letter' }));
    const text = pages.map((p) => p.text).join(' ');
    // 10 9/16 in x 25.4 mm/in = 268.2875 mm, shown to 0.1 mm (NIST SP 811: 1 in = 25.4 mm exactly).
    expect(text).toContain('10 9/16 in');
    expect(text).toContain('268.3 mm');
    expect(text).toContain('2 in (50.8 mm) from the top (tab)');
    expect(text).toContain('45 mm x 80 mm');
    for (const [i, title] of ['Cut the pieces', 'Score the wall strips', 'Glue the wall to the base', 'Cover the lid'].entries())
      expect(text).toContain(`${i + 1}. ${title}`);
    expect(text).toContain('Round hatbox');
    // A sponsored item says so beside its name on paper too (FTC Endorsement Guides, 16 CFR 255).
    expect(text).toContain('Kraft cardstock, 80 lb (sponsored link) (3 sheets)');
    expect(text).not.toContain('Floral patterned paper (sponsored link)');
    expect(text).toContain('papershop.example/kraft-80 · discount code HATBOX10');
    expect(text).toContain('glue guide (papershop.example/glue-guide)');
    expect(text).toContain('Clip the overlap with a binder clip');
    expect(text).toContain('Line the box with tissue paper');
    expect(text).toMatch(/Page 1 of \d/);
  });

  it('adds the blade and adhesive cautions, supervision for children and the closing line', async () => {
    const text = (await probePdf(await handoutPdf(bundle, { paper: 'a4' }))).map((p) => p.text).join(' ');
    for (const line of safetyNotes(new Set(['blade', 'adhesive']))) expect(text).toContain(line.slice(0, 40));
    expect(text).not.toContain('Heat tools:');
  });

  it('says the grain a piece is cut with beside its material, as the template draws it', async () => {
    const withGrain = { ...bundle, pieces: bundle.pieces.map((p) => (p.id === 'wall' ? { ...p, grain: 'length' as const } : p)) };
    const text = (await probePdf(await handoutPdf(withGrain, { paper: 'letter' }))).map((p) => p.text).join(' ');
    // The fonts have no arrow glyph, so the arrow prints as "<->" (fonts.ts substitutes it).
    expect(text).toContain('grain <-> along its length');
    expect((await probePdf(await handoutPdf(bundle, { paper: 'letter' }))).map((p) => p.text).join(' ')).not.toContain('grain <->');
  });

  it('the blade caution says to cut away from the fingers, change dull blades and keep blades from children (common practice)', async () => {
    const text = (await probePdf(await handoutPdf(bundle, { paper: 'letter' }))).map((p) => p.text).join(' ');
    expect(text).toContain('cut away from your fingers');
    expect(text).toContain('change a dull blade');
    expect(text).toContain('children');
    expect(text).toContain('use your own judgement');
  });

  it('embeds the cover, the step photos and the QR code as images, and both fonts', async () => {
    const pdf = await handoutPdf(bundle, { paper: 'letter' });
    const pages = await probePdf(pdf);
    // Cover + three step photos + QR code.
    expect(pages.reduce((n, p) => n + p.images, 0)).toBe(5);
    const raw = pdf.toString('latin1');
    expect(raw).toMatch(/\/FontName \/[A-Z]{6}\+Merriweather-Regular/);
    expect(raw).toMatch(/\/FontName \/[A-Z]{6}\+Merriweather-Bold/);
    expect(raw).toMatch(/\/FontName \/[A-Z]{6}\+Inter-Regular/);
    expect(raw).toContain('/FontFile2');
  });

  it('leaves the QR code out when there is neither a public page nor a video', async () => {
    const none = { ...bundle, tutorial: { ...bundle.tutorial, publicUrl: null, videoUrl: null } };
    const pages = await probePdf(await handoutPdf(none, { paper: 'letter' }));
    expect(pages.reduce((n, p) => n + p.images, 0)).toBe(4);
    expect(pages[0]!.text).not.toContain('Scan');
  });

  it('never puts a step photo on another page than its step', async () => {
    // Twenty steps with a photo each and text of varying length, so several land near a page end.
    const steps: JSONContent[] = [];
    const stills: PublishBundle['stills'] = [];
    for (let i = 1; i <= 20; i++) {
      const file = join(dir, `long-${i}.jpg`);
      await makeSolidJpeg(file, 800, 300 + ((i * 137) % 400), [(20 * i) % 255, 100, 150]);
      stills.push({ id: `l${i}`, atMs: i * 10_000, caption: `Photo ${i}`, alt: '', width: 800, height: 300 + ((i * 137) % 400), file });
      const words = 'Fold along the score line and press it flat with a bone folder. '.repeat(1 + ((i * 5) % 9));
      steps.push({
        type: 'step',
        attrs: { atMs: i * 10_000, chapterId: null },
        content: [
          { type: 'stepTitle', content: [{ type: 'text', text: `Panel ${i}` }] },
          { type: 'paragraph', content: [{ type: 'text', text: words }] },
          { type: 'still', attrs: { stillId: `l${i}`, src: `/media/l${i}.jpg`, alt: '', caption: '', width: null, height: null } },
        ],
      });
    }
    const long: PublishBundle = { ...bundle, stills, doc: { type: 'doc', content: steps } };
    const pages = await probePdf(await handoutPdf(long, { paper: 'letter' }));
    expect(pages.length).toBeGreaterThan(2);
    for (let i = 1; i <= 20; i++) {
      const titlePage = pages.findIndex((p) => p.items.some((it) => it.str === `${i}. Panel ${i}`));
      const captionPage = pages.findIndex((p) => p.items.some((it) => it.str === `Photo ${i}`));
      expect(titlePage, `step ${i} title`).toBeGreaterThanOrEqual(0);
      expect(captionPage, `step ${i} photo`).toBe(titlePage);
      // The photo sits below its title on that page (PDF y grows upwards).
      const page = pages[titlePage]!;
      const titleY = page.items.find((it) => it.str === `${i}. Panel ${i}`)!.y;
      const captionY = page.items.find((it) => it.str === `Photo ${i}`)!.y;
      expect(captionY).toBeLessThan(titleY);
    }
    // Each page's photos match its steps: one image per step title on it (the cover and QR code on page 1 aside).
    pages.forEach((p, k) => {
      const titles = p.items.filter((it) => /^\d+\. Panel \d+$/.test(it.str)).length;
      expect(p.images - (k === 0 ? 2 : 0)).toBe(titles);
    });
  });

  it('continues a step longer than a page on the next page without losing a line', async () => {
    const words = Array.from({ length: 900 }, (_, i) => `word${i + 1}`).join(' ');
    const doc: JSONContent = {
      type: 'doc',
      content: [
        {
          type: 'step',
          attrs: { atMs: null, chapterId: null },
          content: [
            { type: 'stepTitle', content: [{ type: 'text', text: 'A very long fold' }] },
            { type: 'paragraph', content: [{ type: 'text', text: words }] },
            { type: 'still', attrs: { stillId: 's1', src: '/media/s1.jpg', alt: '', caption: '', width: null, height: null } },
          ],
        },
      ],
    };
    const pages = await probePdf(await handoutPdf({ ...bundle, doc }, { paper: 'a4' }));
    const text = pages.map((p) => p.text).join(' ');
    const seen = new Set(text.match(/word\d+/g));
    expect(seen.size).toBe(900);
    // The step's photo starts on the page of its title.
    const titlePage = pages.findIndex((p) => p.text.includes('1. A very long fold'));
    expect(pages[titlePage]!.text).toContain('Everything cut');
  });
});

describe('detectHazards', () => {
  const base = { doc: { type: 'doc', content: [] } as JSONContent };
  const supply = (category: string, name: string) => ({ category, name, quantity: '', note: '', url: null, sponsored: false, discountCode: null });

  it('finds blades, heat tools and adhesives in supplies and text (common-practice safety list)', () => {
    expect(detectHazards({ ...base, supplies: [supply('tool', 'Paper trimmer')] })).toEqual(new Set(['blade']));
    expect(detectHazards({ ...base, supplies: [supply('tool', 'Heat gun')] })).toEqual(new Set(['heat']));
    expect(detectHazards({ ...base, supplies: [supply('adhesive', 'Double-sided tape')] })).toEqual(new Set(['adhesive']));
    const doc: JSONContent = {
      type: 'doc',
      content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Melt the embossing powder, then spray the fixative.' }] }],
    };
    expect(detectHazards({ doc, supplies: [] })).toEqual(new Set(['heat', 'adhesive']));
  });

  it('does not take dry embossing with a folder for a heat tool', () => {
    expect(detectHazards({ ...base, supplies: [supply('tool', 'Embossing folder')] }).has('heat')).toBe(false);
  });

  it('always ends with the line deferring to the maker and local rules', () => {
    expect(safetyNotes(new Set()).at(-1)).toMatch(/own judgement.*rules of your venue or school/);
    expect(safetyNotes(new Set(['heat']))).toContain('In a class with children, an adult supervises every use of blades and heat tools.');
    expect(safetyNotes(new Set(['adhesive'])).join(' ')).not.toContain('children');
  });
});
