import path from 'node:path';
import express, { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { escapeHtml } from '@shared/editor/render-html';
import { Studio, Tutorial } from '../../models';
import { loadUser } from '../../middlewares/authenticate';
import { loadExportable } from '../../services/export-access';
import { loadPublishBundle } from '../../services/publish-bundle';
import { blogHtml } from '../../services/publish/blog';
import { ensureBlogImages } from '../../services/blog-images';
import { printViewHtml } from '../../services/print-view';
import { HttpError } from '../../lib/http-error';

const FONT_DIRS = ['merriweather', 'inter'].map((f) => path.resolve(import.meta.dirname, `../../../node_modules/@fontsource/${f}/files`));
const FONT_FILES = new Set(['merriweather-latin-400-normal.woff2', 'merriweather-latin-700-normal.woff2', 'inter-latin-400-normal.woff2', 'inter-latin-600-normal.woff2']);
const paperQuery = z.object({ paper: z.enum(['letter', 'a4']).catch('letter') });

function notFoundPage(res: Response) {
  res.status(404).type('html').send(`<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><title>Not found</title><link rel="stylesheet" href="/public/fonts.css"></head>
<body style="font-family:Merriweather,Georgia,serif;background:#FBF8F3;color:#22303C;text-align:center;padding:15vh 1rem">
<h1>This tutorial is not here</h1><p style="color:#8A8F98">It may not be published yet, or the address has changed.</p><p><a href="/" style="color:#8C6440">Cardwright</a></p></body></html>`);
}

/** A published tutorial by its stable address, or null. */
async function publishedBySlugs(studioSlug: string, tutorialSlug: string) {
  const studio = await Studio.findOne({ where: { slug: studioSlug } });
  if (!studio) return null;
  const t = await Tutorial.findOne({ where: { studioId: studio.id, slug: tutorialSlug, state: 'published' } });
  return t ? { studio, tutorial: t } : null;
}

const PAGE_CSS = `
body{margin:0;background:#FBF8F3;color:#22303C;font-family:Merriweather,Georgia,serif;line-height:1.65}
header.site{font-family:Inter,system-ui,sans-serif;display:flex;gap:1rem;align-items:center;justify-content:space-between;padding:.8rem 1.2rem;border-bottom:1px solid #E6DFD3;background:#fff}
header.site a{color:#22303C;text-decoration:none}.brand{font-family:Merriweather,Georgia,serif;font-weight:700}
.wrap{display:grid;grid-template-columns:minmax(0,1fr) 16rem;gap:2.5rem;max-width:66rem;margin:0 auto;padding:2rem 1.2rem}
@media (max-width:52rem){.wrap{grid-template-columns:minmax(0,1fr)}}
article img{max-width:100%;height:auto;border-radius:6px}figure{margin:1.2rem 0}figcaption{font-size:.85em;color:#8A8F98}
table{border-collapse:collapse;width:100%;font-size:.9em}th,td{border-bottom:1px solid #E6DFD3;text-align:left;padding:.35rem .5rem;vertical-align:top}
h2{border-bottom:1.5px dashed #A87B4F;padding-bottom:.2rem}aside{border-left:3px solid #6E8B74;padding:.1rem 1rem;margin:1rem 0;background:#fff}aside.cw-caution{border-color:#B5475B}
a{color:#8C6440}.actions{font-family:Inter,system-ui,sans-serif;font-size:.9rem;position:sticky;top:1rem;align-self:start;background:#fff;border:1px solid #E6DFD3;border-radius:10px;padding:1rem}
.actions h2{font-family:Merriweather,Georgia,serif;font-size:1rem;border:0;margin:.2rem 0 .6rem}.actions a,.actions button{display:block;width:100%;box-sizing:border-box;margin:.35rem 0;padding:.45rem .7rem;border:1px solid #E6DFD3;border-radius:6px;background:#fff;color:#22303C;text-decoration:none;font:inherit;text-align:left;cursor:pointer}
.actions button{background:#A87B4F;color:#fff;border-color:#A87B4F}.actions p{color:#8A8F98;font-size:.8rem}
@media (max-width:40rem){table{display:block;overflow-x:auto;font-size:.85em}th,td{white-space:nowrap}}
@media print{header.site,.actions{display:none}.wrap{display:block;padding:0}}`;

/** Public pages (/t/:studio/:tutorial), print views, and the static files they use. */
export function publicRouter() {
  const r = Router();
  r.use('/public', express.static(path.resolve(import.meta.dirname, '../../public'), { maxAge: '1h', index: false }));
  r.get('/public/fonts/:file', (req, res, next) => {
    const file = req.params.file;
    if (!FONT_FILES.has(file)) return next();
    const dir = FONT_DIRS.find((d) => file.startsWith(path.basename(path.dirname(d))));
    res.sendFile(path.join(dir!, file), { maxAge: '30d' });
  });

  r.get('/t/:studio/:tutorial', loadUser, async (req: Request, res: Response) => {
    const found = await publishedBySlugs(req.params.studio as string, req.params.tutorial as string);
    if (!found) return notFoundPage(res);
    const { tutorial, studio } = found;
    const bundle = await loadPublishBundle(tutorial);
    const blog = await blogHtml(bundle, { imageBase: `/media/blog/${tutorial.id}/` });
    await ensureBlogImages(tutorial.id, blog.images);
    const api = `/api/tutorials/${tutorial.id}/export`;
    const here = `/t/${studio.slug}/${tutorial.slug}`;
    res.type('html').send(`<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(tutorial.title)} · ${escapeHtml(studio.name)}</title>
<meta name="description" content="${escapeHtml(String(blog.jsonLd.description ?? '').slice(0, 300))}">
<link rel="stylesheet" href="/public/fonts.css"><style>${PAGE_CSS}</style></head>
<body><header class="site"><a class="brand" href="/">Cardwright</a><span>${escapeHtml(studio.name)}</span></header>
<div class="wrap">${blog.html}
<aside class="actions" aria-label="Print and download"><h2>Take it to the table</h2>
<button type="button" data-print>Print this page</button>
<a href="${here}/print?paper=letter">Handout, print view</a>
<a href="${api}/handout.pdf?paper=letter">Handout PDF (Letter)</a><a href="${api}/handout.pdf?paper=a4">Handout PDF (A4)</a>
${bundle.pieces.length ? `<a href="${api}/template.pdf?paper=letter">Cutting template PDF (Letter)</a><a href="${api}/template.pdf?paper=a4">Cutting template PDF (A4)</a><a href="${api}/template.svg?paper=letter">Cutting template SVG</a><p>Print templates at 100% (actual size) and check the 1 in square.</p>` : ''}
${tutorial.videoUrl ? `<a href="${escapeHtml(tutorial.videoUrl)}" rel="noopener">Watch the video</a>` : ''}
</aside></div><script src="/public/print.js"></script></body></html>`);
  });

  r.get('/t/:studio/:tutorial/print', async (req, res) => {
    const found = await publishedBySlugs(req.params.studio as string, req.params.tutorial as string);
    if (!found) return notFoundPage(res);
    const { paper } = paperQuery.parse(req.query);
    const here = `/t/${found.studio.slug}/${found.tutorial.slug}`;
    res.type('html').send(await printViewHtml(await loadPublishBundle(found.tutorial), { paper, back: here, pdfHref: `/api/tutorials/${found.tutorial.id}/export/handout.pdf?paper=${paper}`, tutorialId: found.tutorial.id }));
  });

  // The print view of a tutorial that may not be published yet, for the people working on it.
  r.get('/print/:id', loadUser, async (req, res) => {
    const id = z.uuid().safeParse(req.params.id);
    if (!id.success) return notFoundPage(res);
    let tutorial: Tutorial;
    try {
      tutorial = await loadExportable(req, id.data);
    } catch (e) {
      if (e instanceof HttpError && (e.status === 404 || e.status === 403)) return notFoundPage(res);
      throw e;
    }
    const { paper } = paperQuery.parse(req.query);
    res.type('html').send(await printViewHtml(await loadPublishBundle(tutorial), { paper, back: `/tutorials/${tutorial.id}/publish`, pdfHref: `/api/tutorials/${tutorial.id}/export/handout.pdf?paper=${paper}`, tutorialId: tutorial.id }));
  });

  return r;
}
