import { Router } from 'express';
import { docToMarkdown } from '@shared/editor';
import { idParams } from '@shared/schemas/studio';
import { versionQuery } from '@shared/schemas/publish';
import { markdownImportSchema, saveArticleSchema, versionOnlySchema, type DraftPreviewDto } from '@shared/schemas/article';
import { route } from '../../lib/route';
import { authorize } from '../../policies';
import { exportSource, loadTutorial } from '../../services/access';
import {
  applyDraft,
  checkedDoc,
  findRevision,
  getArticle,
  importMarkdown,
  listRevisions,
  previewDraft,
  restoreRevision,
  saveArticle,
} from '../../services/write-up';
import { loadPublishBundle } from '../../services/publish/bundle';
import { bundleRenderContext } from '../../services/publish/render-inputs';
import { presentArticle, presentReplaced, presentRevision, presentRevisions, presentSaved } from '../../presenters/article.presenter';

/** The write-up: article, first draft, revisions, Markdown in and out. */
export function articlesRouter() {
  const r = Router();

  r.get(
    '/tutorials/:id/article',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json(presentArticle(await getArticle(tutorial), abilities));
    }),
  );

  r.put(
    '/tutorials/:id/article',
    route({ params: idParams, body: saveArticleSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', 'Only people who can edit this tutorial can change its write-up');
      res.json(presentSaved(await saveArticle({ tutorial, user, doc: checkedDoc(body.doc), version: body.version })));
    }),
  );

  // A preview: the draft is not saved until the maker applies it.
  r.post(
    '/tutorials/:id/draft',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      const preview: DraftPreviewDto = await previewDraft(tutorial);
      res.json(preview);
    }),
  );

  r.post(
    '/tutorials/:id/draft/apply',
    route({ params: idParams, body: versionOnlySchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      res.json(presentReplaced(await applyDraft({ tutorial, user, version: body.version })));
    }),
  );

  r.get(
    '/tutorials/:id/revisions',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readRevisions', 'Revisions are for the studio’s team; students read the published write-up');
      res.json(presentRevisions(await listRevisions(tutorial)));
    }),
  );

  r.get(
    '/revisions/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const revision = await findRevision(params.id);
      const { abilities } = await loadTutorial(user, revision.tutorialId);
      authorize(abilities, 'readRevisions', 'Revisions are for the studio’s team; students read the published write-up');
      res.json(presentRevision(revision));
    }),
  );

  r.post(
    '/revisions/:id/restore',
    route({ params: idParams, body: versionOnlySchema }, async ({ params, body, user, res }) => {
      const revision = await findRevision(params.id);
      const { tutorial, abilities } = await loadTutorial(user, revision.tutorialId);
      authorize(abilities, 'update');
      res.json(presentReplaced(await restoreRevision({ tutorial, user, revision, version: body.version })));
    }),
  );

  r.get(
    '/tutorials/:id/article/markdown',
    route({ params: idParams, query: versionQuery }, async ({ params, query, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'read');
      // An export: what readers see of a published tutorial, unless its people ask for the draft.
      const bundle = await loadPublishBundle(tutorial, await exportSource(user, tutorial, query.version));
      res.type('text/markdown; charset=utf-8');
      res.attachment(`${tutorial.slug}.md`);
      res.send(docToMarkdown(bundle.doc, bundleRenderContext(bundle)));
    }),
  );

  r.post(
    '/tutorials/:id/article/markdown',
    route({ params: idParams, body: markdownImportSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      res.json(presentReplaced(await importMarkdown({ tutorial, user, markdown: body.markdown, version: body.version })));
    }),
  );

  return r;
}
