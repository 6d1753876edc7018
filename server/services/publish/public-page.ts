import { escapeHtml } from '@shared/editor/render-html';
import { palette as c } from '@shared/palette';
import type { BlogResult } from './blog';

const PAGE_CSS = `
body{margin:0;background:${c.paper};color:${c.ink};font-family:Merriweather,Georgia,serif;line-height:1.65}
header.site{font-family:Inter,system-ui,sans-serif;display:flex;gap:1rem;align-items:center;justify-content:space-between;padding:.8rem 1.2rem;border-bottom:1px solid ${c.line};background:#fff}
header.site a{color:${c.ink};text-decoration:none}.brand{font-family:Merriweather,Georgia,serif;font-weight:700}
.wrap{display:grid;grid-template-columns:minmax(0,1fr) 16rem;gap:2.5rem;max-width:66rem;margin:0 auto;padding:2rem 1.2rem}
@media (max-width:52rem){.wrap{grid-template-columns:minmax(0,1fr)}}
article img{max-width:100%;height:auto;border-radius:6px}figure{margin:1.2rem 0}figcaption{font-size:.85em;color:${c.pencil}}
table{border-collapse:collapse;width:100%;font-size:.9em}th,td{border-bottom:1px solid ${c.line};text-align:left;padding:.35rem .5rem;vertical-align:top}
h2{border-bottom:1.5px dashed ${c.kraft};padding-bottom:.2rem}aside{border-left:3px solid ${c.sage};padding:.1rem 1rem;margin:1rem 0;background:#fff}aside.cw-caution{border-color:${c.rosehip}}
a{color:${c.kraftDark}}.actions{font-family:Inter,system-ui,sans-serif;font-size:.9rem;position:sticky;top:1rem;align-self:start;background:#fff;border:1px solid ${c.line};border-radius:10px;padding:1rem}
.actions h2{font-family:Merriweather,Georgia,serif;font-size:1rem;border:0;margin:.2rem 0 .6rem}.actions a,.actions button{display:block;width:100%;box-sizing:border-box;margin:.35rem 0;padding:.45rem .7rem;border:1px solid ${c.line};border-radius:6px;background:#fff;color:${c.ink};text-decoration:none;font:inherit;text-align:left;cursor:pointer}
.actions button{background:${c.kraft};color:#fff;border-color:${c.kraft}}.actions p{color:${c.pencil};font-size:.8rem}
@media (max-width:40rem){.cw-cut-list thead{position:absolute;width:1px;height:1px;overflow:hidden;clip-path:inset(50%)}
.cw-cut-list table,.cw-cut-list tbody,.cw-cut-list tr,.cw-cut-list th,.cw-cut-list td{display:block}
.cw-cut-list tr{background:#fff;border:1px solid ${c.line};border-radius:8px;margin:.6rem 0;padding:.4rem .7rem}
.cw-cut-list th,.cw-cut-list td{border:0;padding:.1rem 0}.cw-cut-list th{font-size:1.05em}
.cw-cut-list td:empty{display:none}.cw-cut-list td::before{content:attr(data-label) ": ";font-family:Inter,system-ui,sans-serif;font-size:.85em;color:${c.pencil}}}
@media print{header.site,.actions{display:none}.wrap{display:block;padding:0}}`;

/** What the public page shows around the article. */
export type PublicPageInput = {
  title: string;
  studioName: string;
  /** The page's own address, /t/<studio>/<tutorial>. */
  here: string;
  /** The tutorial's export folder, /api/tutorials/<id>/export. */
  exportsBase: string;
  /** How many pages the SVG cutting template takes on Letter (0: no pieces, no template). */
  svgPages: number;
  videoUrl: string | null;
  blog: Pick<BlogResult, 'html' | 'jsonLd'>;
};

/** The page of a published tutorial at /t/<studio>/<tutorial>: the blog article and a panel to print and download. */
export function publicPageHtml(p: PublicPageInput): string {
  const api = p.exportsBase;
  const svgLinks = Array.from({ length: p.svgPages }, (_, i) =>
    p.svgPages === 1
      ? `<a href="${api}/template.svg?paper=letter">Cutting template SVG</a>`
      : `<a href="${api}/template.svg?paper=letter&amp;page=${i + 1}">Cutting template SVG, page ${i + 1} of ${p.svgPages}</a>`,
  ).join('');
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(p.title)} · ${escapeHtml(p.studioName)}</title>
<meta name="description" content="${escapeHtml(String(p.blog.jsonLd.description ?? '').slice(0, 300))}">
<link rel="stylesheet" href="/public/fonts.css"><style>${PAGE_CSS}</style></head>
<body><header class="site"><a class="brand" href="/">Cardwright</a><span>${escapeHtml(p.studioName)}</span></header>
<div class="wrap">${p.blog.html}
<aside class="actions" aria-label="Print and download"><h2>Take it to the table</h2>
<button type="button" data-print>Print this page</button>
<a href="${p.here}/print?paper=letter">Handout, print view</a>
<a href="${api}/handout.pdf?paper=letter">Handout PDF (Letter)</a><a href="${api}/handout.pdf?paper=a4">Handout PDF (A4)</a>
${p.svgPages ? `<a href="${api}/template.pdf?paper=letter">Cutting template PDF (Letter)</a><a href="${api}/template.pdf?paper=a4">Cutting template PDF (A4)</a>${svgLinks}<p>Print templates at 100% (actual size) and check the 1 in square.</p>` : ''}
${p.videoUrl ? `<a href="${escapeHtml(p.videoUrl)}" rel="noopener">Watch the video</a>` : ''}
</aside></div><script src="/public/print.js"></script></body></html>`;
}

/** The 404 page of a public address that is not (or no longer) published. */
export function notFoundPageHtml(): string {
  return `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Not found</title><link rel="stylesheet" href="/public/fonts.css"></head>
<body style="font-family:Merriweather,Georgia,serif;background:${c.paper};color:${c.ink};text-align:center;padding:15vh 1rem">
<h1>This tutorial is not here</h1><p style="color:${c.pencil}">It may not be published yet, or the address has changed.</p><p><a href="/" style="color:${c.kraftDark}">Cardwright</a></p></body></html>`;
}
