import { Router, type Response } from 'express';
import { z } from 'zod';
import { idParams } from '@shared/schemas/studio';
import { validate } from '../../middlewares/validate';
import { config } from '../../config';
import { HttpError } from '../../lib/http-error';
import { loadExportable } from '../../services/export-access';
import { loadPublishBundle } from '../../services/publish-bundle';
import { blogHtml, blogZip } from '../../services/publish/blog';
import { handoutPdf } from '../../services/publish/handout';
import { templatePdf, templateSvg } from '../../services/publish/template';
import { videoDescription } from '../../services/publish/description';
import { ensureBlogImages } from '../../services/blog-images';

const paperQuery = z.object({ paper: z.enum(['letter', 'a4']).default('letter') });
const svgQuery = paperQuery.extend({ page: z.coerce.number().int().min(1).default(1) });

/** A fragment's words as plain text, for pasting where HTML is not taken. */
export function htmlToText(html: string): string {
  return html
    .replace(/<script[\s\S]*?<\/script>/gi, '')
    .replace(/<(?:br)\s*\/?>/gi, '\n')
    .replace(/<li[^>]*>/gi, '\n• ')
    .replace(/<\/(?:p|h[1-6]|li|figure|figcaption|tr|table|aside|ol|ul)>/gi, '\n')
    .replace(/<t[dh][^>]*>/gi, ' | ')
    .replace(/<[^>]+>/g, '')
    .replace(/&nbsp;/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;|&#x27;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/[ \t]+\n/g, '\n')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

const filename = (slug: string, ext: string) => `${slug || 'tutorial'}.${ext}`;
const sendFile = (res: Response, type: string, name: string, data: Buffer | string) => {
  res.type(type);
  res.attachment(name);
  res.send(data);
};

/**
 * GET exports under /api/tutorials/:id/export/: blog HTML (page, JSON with fragment and text),
 * zip, handout PDF, template PDF and SVG, video description. Published tutorials' exports are
 * public; otherwise the reader's role is checked.
 */
export function exportsRouter() {
  const r = Router();

  r.get('/:id/export/html', validate({ params: idParams }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const bundle = await loadPublishBundle(t);
    const blog = await blogHtml(bundle, { imageBase: `${config.publicUrl}/media/blog/${t.id}/` });
    await ensureBlogImages(t.id, blog.images);
    if (req.query.format === 'json') {
      res.json({ html: blog.html, text: htmlToText(blog.html), jsonLd: blog.jsonLd });
      return;
    }
    res.type('text/html; charset=utf-8');
    if (req.query.download) res.attachment(filename(t.slug, 'html'));
    res.send(blog.page);
  });

  r.get('/:id/export/zip', validate({ params: idParams }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const bundle = await loadPublishBundle(t);
    res.type('application/zip');
    res.attachment(filename(t.slug, 'zip'));
    await blogZip(bundle, res);
  });

  r.get('/:id/export/handout.pdf', validate({ params: idParams, query: paperQuery }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const { paper } = req.query as { paper: 'letter' | 'a4' };
    const pdf = await handoutPdf(await loadPublishBundle(t), { paper });
    sendFile(res, 'application/pdf', `${t.slug}-handout-${paper}.pdf`, pdf);
  });

  r.get('/:id/export/template.pdf', validate({ params: idParams, query: paperQuery }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const { paper } = req.query as { paper: 'letter' | 'a4' };
    const bundle = await loadPublishBundle(t);
    if (bundle.pieces.length === 0) throw new HttpError(409, 'The cut list is empty: add pieces in the Cut list section first');
    const pdf = await templatePdf(bundle.pieces, { paper, title: t.title, precision: bundle.precision });
    sendFile(res, 'application/pdf', `${t.slug}-template-${paper}.pdf`, pdf);
  });

  r.get('/:id/export/template.svg', validate({ params: idParams, query: svgQuery }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const { paper, page } = req.query as unknown as { paper: 'letter' | 'a4'; page: number };
    const bundle = await loadPublishBundle(t);
    if (bundle.pieces.length === 0) throw new HttpError(409, 'The cut list is empty: add pieces in the Cut list section first');
    const pages = templateSvg(bundle.pieces, { paper, title: t.title, precision: bundle.precision });
    if (page > pages.length) throw new HttpError(404, `The template has ${pages.length} page(s)`);
    res.set('X-Page-Count', String(pages.length));
    sendFile(res, 'image/svg+xml', pages.length > 1 ? `${t.slug}-template-${paper}-page-${page}.svg` : `${t.slug}-template-${paper}.svg`, pages[page - 1]!);
  });

  r.get('/:id/export/description.txt', validate({ params: idParams }), async (req, res) => {
    const t = await loadExportable(req, req.params.id as string);
    const text = videoDescription(await loadPublishBundle(t));
    res.type('text/plain; charset=utf-8');
    if (req.query.download) res.attachment(filename(t.slug, 'txt'));
    res.send(text);
  });

  return r;
}
