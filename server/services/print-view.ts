import QRCode from 'qrcode';
import { escapeHtml, renderDocHtml } from '@shared/editor/render-html';
import type { StillAttrs } from '@shared/editor';
import type { PublishBundle, Paper } from './publish/types';
import { toRenderPieces, toRenderSupplies } from './publish/render-inputs';
import { detectHazards, safetyNotes } from './publish/safety';

const PAGE = { letter: 'letter', a4: 'A4' } as const;

/**
 * The handout as a web page for the browser's print dialog (P2's "print view"): the same parts as
 * the PDF, styled for paper, with steps kept whole across page breaks. Stills are served from
 * /media, small; the QR code is an inline PNG, so the page prints without the network.
 */
export async function printViewHtml(bundle: PublishBundle, opts: { paper: Paper; back: string; pdfHref: string }): Promise<string> {
  const { tutorial } = bundle;
  const target = tutorial.publicUrl ?? tutorial.videoUrl;
  const qr = target ? await QRCode.toDataURL(target, { margin: 1, width: 240, color: { dark: '#22303C', light: '#FFFFFF' } }) : null;
  const cover = bundle.stills[0];
  const resolveStill = (s: StillAttrs): StillAttrs => ({ ...s, width: s.width ? Math.min(s.width, 480) : s.width, height: s.width && s.height ? Math.round((s.height * Math.min(s.width, 480)) / s.width) : s.height });
  const body = renderDocHtml(bundle.doc, {
    pieces: toRenderPieces(bundle.pieces, bundle.precision),
    supplies: toRenderSupplies(bundle.supplies),
    precision: bundle.precision,
    disclosure: bundle.disclosure ?? undefined,
    resolveStill,
  });
  const notes = safetyNotes(detectHazards(bundle));
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(tutorial.title)} — handout</title>
<link rel="stylesheet" href="/public/fonts.css">
<style>
@page { size: ${PAGE[opts.paper]}; margin: 14mm 14mm 16mm; }
body { font-family: Merriweather, Georgia, serif; color: #22303C; background: #FBF8F3; margin: 0; font-size: 10.5pt; line-height: 1.5; }
main { max-width: 180mm; margin: 0 auto; padding: 10mm 0; }
.bar { font-family: Inter, system-ui, sans-serif; display: flex; gap: 10px; align-items: center; padding: 10px 14px; background: #fff; border-bottom: 1px solid #E6DFD3; }
.bar a, .bar button { font: inherit; font-size: 13px; color: #22303C; background: #fff; border: 1px solid #E6DFD3; border-radius: 6px; padding: 5px 10px; text-decoration: none; cursor: pointer; }
.bar button { background: #A87B4F; color: #fff; border-color: #A87B4F; }
h1 { font-size: 20pt; margin: 0 0 2mm; } h2 { font-size: 13pt; margin: 6mm 0 2mm; border-bottom: 1.5px dashed #A87B4F; padding-bottom: 1mm; }
.byline { font-family: Inter, system-ui, sans-serif; color: #8A8F98; font-size: 9pt; margin: 0 0 4mm; }
.head { display: flex; gap: 6mm; align-items: flex-start; }
.head .cover { width: 62%; height: auto; border-radius: 2mm; }
.qr { font-family: Inter, system-ui, sans-serif; font-size: 8pt; color: #8A8F98; text-align: center; } .qr img { width: 30mm; height: 30mm; display: block; }
table { border-collapse: collapse; width: 100%; font-size: 9pt; } th, td { border-bottom: 1px solid #E6DFD3; text-align: left; padding: 1.2mm 1.5mm; vertical-align: top; }
figure { margin: 2mm 0; } figure img { max-width: 60mm; height: auto; border-radius: 1.5mm; } figcaption { font-size: 8.5pt; color: #8A8F98; }
ol.cw-steps > li, li.cw-step, .cw-step { break-inside: avoid; page-break-inside: avoid; }
aside { border-left: 3px solid #6E8B74; padding: 0 4mm; margin: 3mm 0; break-inside: avoid; } aside.cw-caution { border-color: #B5475B; }
.safety { border: 1px solid #B5475B; border-radius: 2mm; padding: 2mm 4mm; font-size: 9pt; break-inside: avoid; }
@media print { .bar { display: none; } body { background: #fff; } main { padding: 0; max-width: none; } }
</style></head><body>
<nav class="bar" aria-label="Print view"><a href="${escapeHtml(opts.back)}">Back</a><button type="button" data-print>Print</button><a href="${escapeHtml(opts.pdfHref)}">Download PDF</a><span style="color:#8A8F98">Paper: ${opts.paper === 'a4' ? 'A4' : 'Letter'}</span></nav>
<main>
<div class="head">${cover ? `<img class="cover" src="/media/stills/${escapeHtml(cover.id)}.jpg" alt="${escapeHtml(cover.alt || cover.caption || tutorial.title)}" width="${cover.width}" height="${cover.height}">` : ''}
${qr ? `<div class="qr"><img src="${qr}" alt="QR code to ${escapeHtml(target!)}" width="240" height="240">Scan to watch or read online</div>` : ''}</div>
${body.replace(/^<h1>[\s\S]*?<\/h1>/, (h) => `${h}<p class="byline">${escapeHtml([tutorial.authorName, tutorial.studioName].filter(Boolean).join(', '))}</p>`)}
<h2>Work safely</h2>
<div class="safety">${notes.map((n) => `<p>${escapeHtml(n)}</p>`).join('')}</div>
</main>
<script src="/public/print.js"></script>
</body></html>`;
}
