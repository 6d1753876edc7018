import QRCode from 'qrcode';
import { escapeHtml } from '@shared/editor/render-html';
import type { PublishBundle, Paper } from './types';
import { blogHtml } from './blog';
import { detectHazards, safetyNotes } from './safety';
import { ensureBlogImages } from './blog-images';
import { blogImageBase } from '../../lib/media-urls';
import { palette } from '@shared/palette';

const PAGE = { letter: 'letter', a4: 'A4' } as const;

/**
 * The handout as a web page for the browser's print dialog (P2's "print view"): the same parts as
 * the PDF, styled for paper, with steps kept whole across page breaks. Stills are served from
 * /media, small; the QR code is an inline PNG, so the page prints without the network.
 */
export async function printViewHtml(bundle: PublishBundle, opts: { paper: Paper; back: string; pdfHref: string; tutorialId: string }): Promise<string> {
  const { tutorial } = bundle;
  const c = palette;
  const target = tutorial.videoUrl ?? tutorial.publicUrl;
  const qr = target ? await QRCode.toDataURL(target, { margin: 1, width: 240, color: { dark: palette.ink, light: palette.white } }) : null;
  // The blog page's article: title, byline, supplies and cut list even when the write-up lacks
  // them, steps with their photos; the handout adds the QR code and the safety notes.
  const blog = await blogHtml(bundle, { imageBase: blogImageBase(opts.tutorialId) });
  await ensureBlogImages(opts.tutorialId, blog.images);
  const cover = bundle.stills[0];
  // The cover is the blog's resized copy, made from the bundle's own file: a published version's
  // still stays in print after the still itself is deleted from the footage.
  const coverImage = cover ? blog.images.find((i) => i.still === cover.id) : undefined;
  const coverHtml =
    cover && coverImage
      ? `<figure class="cover"><img src="${escapeHtml(blogImageBase(opts.tutorialId) + coverImage.name)}" alt="${escapeHtml(cover.alt || cover.caption || tutorial.title)}" width="${coverImage.width}" height="${coverImage.height}"></figure>`
      : '';
  // The cover photo goes before the first section, as on the PDF handout.
  const article = blog.html.replace(/<script type="application\/ld\+json">[\s\S]*?<\/script>/, '').replace(/<h2/, `${coverHtml}<h2`);
  const notes = safetyNotes(detectHazards(bundle));
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(tutorial.title)} — handout</title>
<link rel="stylesheet" href="/public/fonts.css">
<style>
@page { size: ${PAGE[opts.paper]}; margin: 14mm 14mm 16mm; }
body { font-family: Merriweather, Georgia, serif; color: ${c.ink}; background: ${c.paper}; margin: 0; font-size: 10.5pt; line-height: 1.5; }
main { max-width: 180mm; margin: 0 auto; padding: 10mm 0; position: relative; }
.bar { font-family: Inter, system-ui, sans-serif; display: flex; gap: 10px; align-items: center; padding: 10px 14px; background: #fff; border-bottom: 1px solid ${c.line}; }
.bar a, .bar button { font: inherit; font-size: 13px; color: ${c.ink}; background: #fff; border: 1px solid ${c.line}; border-radius: 6px; padding: 5px 10px; text-decoration: none; cursor: pointer; }
.bar button { background: ${c.kraft}; color: #fff; border-color: ${c.kraft}; }
h1 { font-size: 20pt; margin: 0 0 2mm; } h2 { clear: both; font-size: 13pt; margin: 6mm 0 2mm; border-bottom: 1.5px dashed ${c.kraft}; padding-bottom: 1mm; }
.cw-byline { font-family: Inter, system-ui, sans-serif; color: ${c.pencil}; font-size: 9pt; margin: 0 0 4mm; }
/* Floated so the title wraps beside it and the first section starts below it. */
.qr { float: right; margin: 0 0 3mm 6mm; font-family: Inter, system-ui, sans-serif; font-size: 7.5pt; color: ${c.pencil}; text-align: center; width: 30mm; } .qr img { width: 30mm; height: 30mm; display: block; }
table { border-collapse: collapse; width: 100%; font-size: 9pt; } th, td { border-bottom: 1px solid ${c.line}; text-align: left; padding: 1.2mm 1.5mm; vertical-align: top; }
figure { margin: 2mm 0; } figure.cover img { max-width: 100%; width: 120mm; } figure img { max-width: 60mm; height: auto; border-radius: 1.5mm; } figcaption { font-size: 8.5pt; color: ${c.pencil}; }
ol > li { break-inside: avoid; page-break-inside: avoid; }
aside { border-left: 3px solid ${c.sage}; padding: 0 4mm; margin: 3mm 0; break-inside: avoid; } aside.cw-caution { border-color: ${c.rosehip}; }
.safety { border: 1px solid ${c.rosehip}; border-radius: 2mm; padding: 2mm 4mm; font-size: 9pt; break-inside: avoid; }
@media print { .bar { display: none; } body { background: #fff; } main { padding: 0; max-width: none; } }
</style></head><body>
<nav class="bar" aria-label="Print view"><a href="${escapeHtml(opts.back)}">Back</a><button type="button" data-print>Print</button><a href="${escapeHtml(opts.pdfHref)}">Download PDF</a><span style="color:${c.pencil}">Paper: ${opts.paper === 'a4' ? 'A4' : 'Letter'}</span></nav>
<main>
${qr ? `<div class="qr"><img src="${qr}" alt="QR code to ${escapeHtml(target!)}" width="240" height="240">Scan to watch or read online</div>` : ''}
${article}
<h2>Work safely</h2>
<div class="safety">${notes.map((n) => `<p>${escapeHtml(n)}</p>`).join('')}</div>
</main>
<script src="/public/print.js"></script>
</body></html>`;
}
