import { Router } from 'express';
import { z } from 'zod';
import { docToMarkdown, markdownToDoc } from '@shared/editor';
import { idParams } from '@shared/schemas/studio';
import { Revision } from '../../models';
import { validate } from '../../middlewares/validate';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { authorize } from '../../policies';
import { notFound } from '../../lib/http-error';
import { loadTutorial } from '../../services/access';
import { checkedDoc, draftFor, getArticle, isEmptyDoc, listRevisions, saveArticle } from '../../services/write-up';
import { renderContext } from '../../services/render-context';

const version = z.number().int().min(0);
const saveSchema = z.object({ doc: z.record(z.string(), z.unknown()), version });
const versionOnly = z.object({ version });
const markdownImport = z.object({ markdown: z.string().max(2_000_000, 'The Markdown is too long'), version });

/** The write-up: article, first draft, revisions, Markdown in and out. */
export function articlesRouter() {
  const r = Router();
  r.use(['/tutorials', '/revisions'], requireUser);

  r.get('/tutorials/:id/article', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    res.json({ ...(await getArticle(tutorial)), abilities: { update: abilities.update } });
  });

  r.put('/tutorials/:id/article', validate({ params: idParams, body: saveSchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update', 'Only people who can edit this tutorial can change its write-up');
    const doc = checkedDoc(req.body.doc);
    res.json(await saveArticle({ tutorial, user: currentUser(req), doc, version: req.body.version }));
  });

  // A preview: the draft is not saved until the maker applies it.
  r.post('/tutorials/:id/draft', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const current = await getArticle(tutorial);
    res.json({ doc: await draftFor(tutorial), replaces: !isEmptyDoc(current.doc), version: current.version });
  });

  r.post('/tutorials/:id/draft/apply', validate({ params: idParams, body: versionOnly }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const doc = await draftFor(tutorial);
    // The write-up it replaces is already kept as the newest revision; the draft starts a new one.
    const saved = await saveArticle({ tutorial, user: currentUser(req), doc, version: req.body.version, note: 'First draft from the footage', newRevision: true });
    res.json({ ...saved, doc });
  });

  r.get('/tutorials/:id/revisions', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    res.json({ revisions: await listRevisions(tutorial) });
  });

  r.get('/revisions/:id', validate({ params: idParams }), async (req, res) => {
    const rev = await Revision.findByPk(req.params.id as string);
    if (!rev) throw notFound('Revision');
    const { abilities } = await loadTutorial(req, rev.tutorialId);
    authorize(abilities, 'read');
    res.json({ id: rev.id, version: rev.version, note: rev.note, createdAt: rev.createdAt, doc: rev.doc });
  });

  r.post('/revisions/:id/restore', validate({ params: idParams, body: versionOnly }), async (req, res) => {
    const rev = await Revision.findByPk(req.params.id as string);
    if (!rev) throw notFound('Revision');
    const { tutorial, abilities } = await loadTutorial(req, rev.tutorialId);
    authorize(abilities, 'update');
    const note = `Restored from version ${rev.version} (${rev.updatedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC)`;
    const saved = await saveArticle({ tutorial, user: currentUser(req), doc: checkedDoc(rev.doc), version: req.body.version, note, newRevision: true });
    res.json({ ...saved, doc: rev.doc });
  });

  r.get('/tutorials/:id/article/markdown', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const { doc } = await getArticle(tutorial);
    res.type('text/markdown; charset=utf-8');
    res.attachment(`${tutorial.slug}.md`);
    res.send(docToMarkdown(doc, await renderContext(tutorial)));
  });

  r.post('/tutorials/:id/article/markdown', validate({ params: idParams, body: markdownImport }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const doc = checkedDoc(markdownToDoc(req.body.markdown));
    const saved = await saveArticle({ tutorial, user: currentUser(req), doc, version: req.body.version, note: 'Imported from Markdown', newRevision: true });
    res.json({ ...saved, doc });
  });

  return r;
}
