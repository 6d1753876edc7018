import { Router, type Response } from 'express';
import { idParams } from '@shared/schemas/studio';
import { paperQuery, svgTemplateQuery, textExportQuery, versionQuery, type BlogExportDto, type TemplateInfoDto } from '@shared/schemas/publish';
import { config } from '../../config';
import { openRoute } from '../../lib/route';
import { ConflictError, NotFoundError } from '../../lib/errors';
import { blogImageBase } from '../../lib/media-urls';
import { exportSource, loadExportable } from '../../services/access';
import { loadPublishBundle } from '../../services/publish/bundle';
import { blogHtml, blogZip } from '../../services/publish/blog';
import { handoutPdf } from '../../services/publish/handout';
import { templatePdf, templateSvg } from '../../services/publish/template';
import { videoDescription } from '../../services/publish/description';
import { ensureBlogImages } from '../../services/publish/blog-images';
import { htmlToText } from '../../services/publish/plain-text';
import type { PublishBundle } from '../../services/publish/types';
import type { Tutorial, User } from '../../models';
import type { ExportVersion } from '@shared/schemas/publish';

const filename = (slug: string, ext: string) => `${slug || 'tutorial'}.${ext}`;
const sendFile = (res: Response, type: string, name: string, data: Buffer | string) => {
  res.type(type);
  res.attachment(name);
  res.send(data);
};

const EMPTY_CUT_LIST = 'The cut list is empty: add pieces in the Cut list section first';

/**
 * The tutorial and its bundle for an export: what readers see (the published version of a
 * published tutorial, never the draft behind it), or the draft when its people ask for it.
 */
async function exported(user: User | null, id: string, version: ExportVersion | undefined): Promise<{ t: Tutorial; bundle: PublishBundle }> {
  const t = await loadExportable(user, id);
  return { t, bundle: await loadPublishBundle(t, await exportSource(user, t, version)) };
}

/** The template needs pieces to draw: 409 with where to add them. */
function requirePieces(bundle: PublishBundle): void {
  if (bundle.pieces.length === 0) throw new ConflictError(EMPTY_CUT_LIST);
}

/**
 * GET exports under /api/tutorials/:id/export/: blog HTML (page, JSON with fragment and text),
 * zip, handout PDF, template PDF and SVG, video description. Anyone may ask: the tutorial policy's
 * `readExports` opens published tutorials to visitors and keeps drafts to those who may read them.
 */
export function exportsRouter() {
  const r = Router();

  r.get(
    '/:id/export/html',
    openRoute({ params: idParams, query: textExportQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      const blog = await blogHtml(bundle, { imageBase: blogImageBase(t.id, config.publicUrl) });
      await ensureBlogImages(t.id, blog.images);
      if (query.format === 'json') {
        const answer: BlogExportDto = { html: blog.html, text: htmlToText(blog.html), jsonLd: blog.jsonLd };
        res.json(answer);
        return;
      }
      res.type('text/html; charset=utf-8');
      if (query.download) res.attachment(filename(t.slug, 'html'));
      res.send(blog.page);
    }),
  );

  r.get(
    '/:id/export/zip',
    openRoute({ params: idParams, query: versionQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      res.type('application/zip');
      res.attachment(filename(t.slug, 'zip'));
      await blogZip(bundle, res);
    }),
  );

  r.get(
    '/:id/export/handout.pdf',
    openRoute({ params: idParams, query: paperQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      const pdf = await handoutPdf(bundle, { paper: query.paper });
      sendFile(res, 'application/pdf', `${t.slug}-handout-${query.paper}.pdf`, pdf);
    }),
  );

  r.get(
    '/:id/export/template.pdf',
    openRoute({ params: idParams, query: paperQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      requirePieces(bundle);
      const pdf = await templatePdf(bundle.pieces, { paper: query.paper, title: bundle.tutorial.title, precision: bundle.precision });
      sendFile(res, 'application/pdf', `${t.slug}-template-${query.paper}.pdf`, pdf);
    }),
  );

  // How many pages the template takes on a paper, so pages can offer every SVG page. An empty cut
  // list is an answer here (200), not an error: pages ask before anyone downloads.
  r.get(
    '/:id/export/template.json',
    openRoute({ params: idParams, query: paperQuery }, async ({ params, query, user, res }) => {
      const { bundle } = await exported(user, params.id, query.version);
      const answer: TemplateInfoDto =
        bundle.pieces.length === 0
          ? { kind: 'empty', message: EMPTY_CUT_LIST }
          : { kind: 'ready', pageCount: templateSvg(bundle.pieces, { paper: query.paper, title: bundle.tutorial.title, precision: bundle.precision }).length };
      res.json(answer);
    }),
  );

  r.get(
    '/:id/export/template.svg',
    openRoute({ params: idParams, query: svgTemplateQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      const { paper, page } = query;
      requirePieces(bundle);
      const pages = templateSvg(bundle.pieces, { paper, title: bundle.tutorial.title, precision: bundle.precision });
      if (page > pages.length) throw NotFoundError.saying(`The template has ${pages.length} page(s)`);
      res.set('X-Page-Count', String(pages.length));
      const name = pages.length > 1 ? `${t.slug}-template-${paper}-page-${page}.svg` : `${t.slug}-template-${paper}.svg`;
      sendFile(res, 'image/svg+xml', name, pages[page - 1]!);
    }),
  );

  r.get(
    '/:id/export/description.txt',
    openRoute({ params: idParams, query: textExportQuery }, async ({ params, query, user, res }) => {
      const { t, bundle } = await exported(user, params.id, query.version);
      const text = videoDescription(bundle);
      res.type('text/plain; charset=utf-8');
      if (query.download) res.attachment(filename(t.slug, 'txt'));
      res.send(text);
    }),
  );

  return r;
}
