import path from 'node:path';
import express, { Router, type Response } from 'express';
import { z } from 'zod';
import { printViewQuery } from '@shared/schemas/publish';
import { openRoute } from '../../lib/route';
import { loadUser } from '../../middlewares/authenticate';
import { ForbiddenError, NotFoundError } from '../../lib/errors';
import { exportSource, loadExportable, loadPublicPage } from '../../services/access';
import { loadPublishBundle, type BundleSource } from '../../services/publish/bundle';
import { printViewHtml } from '../../services/publish/print-view';
import { notFoundPageHtml } from '../../services/publish/public-page';
import { publicPage } from '../../services/public-pages';
import type { Tutorial } from '../../models';

const FONT_DIRS = ['merriweather', 'inter'].map((f) => path.resolve(import.meta.dirname, `../../../node_modules/@fontsource/${f}/files`));
const FONT_FILES = new Set([
  'merriweather-latin-400-normal.woff2',
  'merriweather-latin-700-normal.woff2',
  'inter-latin-400-normal.woff2',
  'inter-latin-600-normal.woff2',
]);
const slugParams = z.object({ studio: z.string(), tutorial: z.string() });
const fontParams = z.object({ file: z.string() });
// A bad id is a page that is not here, not a 400: these are addresses people type and share.
const printParams = z.object({ id: z.string() });

const notFoundPage = (res: Response) => res.status(404).type('html').send(notFoundPageHtml());
const exportsBase = (tutorialId: string) => `/api/tutorials/${tutorialId}/export`;

/** Public pages (/t/:studio/:tutorial), print views, and the static files they use. */
export function publicRouter() {
  const r = Router();
  r.use('/public', express.static(path.resolve(import.meta.dirname, '../../public'), { maxAge: '1h', index: false }));
  r.get(
    '/public/fonts/:file',
    openRoute({ params: fontParams }, ({ params, res }) => {
      if (!FONT_FILES.has(params.file)) return void notFoundPage(res);
      const dir = FONT_DIRS.find((d) => params.file.startsWith(path.basename(path.dirname(d))));
      res.sendFile(path.join(dir!, params.file), { maxAge: '30d' });
    }),
  );
  // The same page for everyone, from the cache (publishing refreshes it): no session or person is read.
  // `no-cache` lets a browser or a shared cache keep it but ask each time; the answer is then a 304.
  r.get(
    '/t/:studio/:tutorial',
    openRoute({ params: slugParams }, async ({ params, req, res }) => {
      const page = await publicPage(params.studio, params.tutorial);
      if (!page) return void notFoundPage(res);
      res.set({ 'Cache-Control': 'public, no-cache', ETag: page.etag, 'Last-Modified': page.lastModified.toUTCString() });
      if (req.fresh) return void res.status(304).end();
      res.type('html').send(page.html);
    }),
  );

  // Outside /api, so the signed-in person is loaded here (the print view of a draft needs them).
  r.use('/print', loadUser);

  r.get(
    '/t/:studio/:tutorial/print',
    openRoute({ params: slugParams, query: printViewQuery }, async ({ params, query, res }) => {
      const found = await loadPublicPage(params.studio, params.tutorial);
      if (!found) return void notFoundPage(res);
      const { paper } = query;
      res.type('html').send(
        await printViewHtml(await loadPublishBundle(found.tutorial), {
          paper,
          back: `/t/${found.studio.slug}/${found.tutorial.slug}`,
          pdfHref: `${exportsBase(found.tutorial.id)}/handout.pdf?paper=${paper}`,
          tutorialId: found.tutorial.id,
        }),
      );
    }),
  );

  // The print view of a tutorial that may not be published yet, for the people working on it.
  r.get(
    '/print/:id',
    openRoute({ params: printParams, query: printViewQuery }, async ({ params, query, user, res }) => {
      const id = z.uuid().safeParse(params.id);
      if (!id.success) return void notFoundPage(res);
      let tutorial: Tutorial;
      let source: BundleSource;
      try {
        tutorial = await loadExportable(user, id.data);
        source = await exportSource(user, tutorial, query.version);
      } catch (e) {
        if (e instanceof NotFoundError || e instanceof ForbiddenError) return void notFoundPage(res);
        throw e;
      }
      const { paper } = query;
      res.type('html').send(
        await printViewHtml(await loadPublishBundle(tutorial, source), {
          paper,
          back: `/tutorials/${tutorial.id}/publish`,
          pdfHref: `${exportsBase(tutorial.id)}/handout.pdf?paper=${paper}${source === 'draft' ? '&version=draft' : ''}`,
          tutorialId: tutorial.id,
        }),
      );
    }),
  );

  return r;
}
