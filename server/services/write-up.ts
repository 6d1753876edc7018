import type { JSONContent } from '@tiptap/core';
import type { Transaction } from 'sequelize';
import { markdownToDoc, validateDoc } from '@shared/editor';
import { ensureStepIds } from '@shared/editor/step-ids';
import { generateDraft } from '@shared/draft';
import { Article, Chapter, Cue, Revision, Still, User, sequelize, type Tutorial } from '../models';
import type { DocJson } from '../models/article';
import { ConflictError, fieldError, NotFoundError } from '../lib/errors';
import { stillUrl } from '../lib/media-urls';
import { newestRecording } from './recordings';

/** What the editor starts from: the schema needs one block, so an empty paragraph. */
export const EMPTY_DOC: DocJson = { type: 'doc', content: [{ type: 'paragraph' }] };

/** Saves within this long of the same person's last revision update it instead of adding one. */
const REVISION_SESSION_MS = 10 * 60_000;

/** True for a write-up with nothing in it yet. */
export const isEmptyDoc = (d: DocJson) => !d.content || d.content.length === 0 || (d.content.length === 1 && !(d.content[0] as JSONContent).content?.length);

/** A write-up as saved: the document, its version and who saved it last. */
export type StoredArticle = { doc: DocJson; version: number; updatedAt: Date | null; updatedBy: { id: string; name: string } | null };

/** The current write-up, or an empty one at version 0 when nothing was saved yet. */
export async function getArticle(tutorial: Tutorial): Promise<StoredArticle> {
  const a = await Article.findByPk(tutorial.id, { include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'] }] });
  if (!a) return { doc: EMPTY_DOC, version: 0, updatedAt: null, updatedBy: null };
  return { doc: a.doc, version: a.version, updatedAt: a.updatedAt, updatedBy: a.updatedBy ? { id: a.updatedBy.id, name: a.updatedBy.name } : null };
}

/** Validates a submitted document against the shared schema; 400 names what is wrong. */
export function checkedDoc(json: unknown): DocJson {
  const r = validateDoc(json);
  if (!r.ok) throw fieldError('doc', r.error);
  return r.doc as DocJson;
}

/**
 * Saves a write-up if it is based on the current version. A stale save answers 409 with the newer
 * document, so the person can compare and choose; nothing is overwritten silently. Each save keeps
 * a revision: the same person's saves within ten minutes update one revision (an editing session).
 */
export async function saveArticle(opts: {
  tutorial: Tutorial;
  user: User;
  doc: DocJson;
  version: number;
  note?: string;
  newRevision?: boolean;
}): Promise<{ version: number; updatedAt: Date; doc: DocJson }> {
  return sequelize.transaction(async (transaction) => {
    // Lock the row (or the tutorial, before the first save) so two saves cannot both pass the check.
    await sequelize.query('SELECT id FROM tutorials WHERE id = :id FOR UPDATE', { replacements: { id: opts.tutorial.id }, transaction });
    const current = await Article.findByPk(opts.tutorial.id, { transaction, include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'] }] });
    const currentVersion = current?.version ?? 0;
    if (opts.version !== currentVersion) {
      throw new ConflictError(`Someone saved a newer version (${currentVersion}) while you were editing version ${opts.version}`, {
        code: 'stale',
        version: currentVersion,
        doc: current?.doc ?? EMPTY_DOC,
        updatedBy: current?.updatedBy ? { id: current.updatedBy.id, name: current.updatedBy.name } : null,
        updatedAt: current?.updatedAt ?? null,
      });
    }
    const version = currentVersion + 1;
    // Steps keep (or get) the ids comments anchor to, even from a client that does not send them.
    const doc = ensureStepIds(opts.doc, current?.doc);
    if (current) await current.update({ doc, version, updatedById: opts.user.id }, { transaction });
    else await Article.create({ tutorialId: opts.tutorial.id, doc, version, updatedById: opts.user.id }, { transaction });
    await keepRevision({
      tutorialId: opts.tutorial.id,
      userId: opts.user.id,
      doc,
      version,
      note: opts.note ?? '',
      fresh: opts.newRevision ?? false,
      transaction,
    });
    return { version, updatedAt: new Date(), doc };
  });
}

async function keepRevision(o: { tutorialId: string; userId: string; doc: DocJson; version: number; note: string; fresh: boolean; transaction: Transaction }) {
  if (!o.fresh) {
    const last = await Revision.findOne({ where: { tutorialId: o.tutorialId }, order: [['createdAt', 'DESC']], transaction: o.transaction });
    if (last && last.authorId === o.userId && !last.note && Date.now() - last.updatedAt.getTime() < REVISION_SESSION_MS) {
      await last.update({ doc: o.doc, version: o.version }, { transaction: o.transaction });
      return;
    }
  }
  await Revision.create({ tutorialId: o.tutorialId, version: o.version, doc: o.doc, authorId: o.userId, note: o.note }, { transaction: o.transaction });
}

/** The first draft from the newest recording's chapters, transcript and stills. */
export async function draftFor(tutorial: Tutorial): Promise<DocJson> {
  const rec = await newestRecording(tutorial.id);
  if (!rec) throw new ConflictError('Add a recording with chapters in the Footage section first; the draft is made from them');
  const [chapters, cues, stills] = await Promise.all([
    Chapter.findAll({ where: { recordingId: rec.id }, order: [['startMs', 'ASC']] }),
    Cue.findAll({ where: { recordingId: rec.id }, order: [['position', 'ASC']] }),
    Still.findAll({ where: { recordingId: rec.id }, order: [['atMs', 'ASC']] }),
  ]);
  if (chapters.length === 0) throw new ConflictError('Mark at least one chapter in the Footage section first: each chapter becomes a step');
  const doc = generateDraft({
    title: tutorial.title,
    chapters: chapters.map((c) => ({ id: c.id, title: c.title, startMs: c.startMs })),
    cues: cues.map((c) => ({ startMs: c.startMs, endMs: c.endMs, text: c.text })),
    stills: stills.map((s) => ({ id: s.id, atMs: s.atMs, url: stillUrl(s.id), caption: s.caption, alt: s.alt, width: s.width, height: s.height })),
    durationMs: rec.durationMs ?? undefined,
    defaultUnit: tutorial.defaultUnit,
  });
  return ensureStepIds(checkedDoc(doc));
}

/** Revisions newest first, without their documents, with their authors. */
export async function listRevisions(tutorial: Tutorial): Promise<Revision[]> {
  const rows = await Revision.findAll({
    where: { tutorialId: tutorial.id },
    order: [['createdAt', 'DESC']],
    attributes: ['id', 'version', 'note', 'createdAt', 'updatedAt'],
    include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
    limit: 200,
  });
  return rows;
}

/** A revision by id, or 404. */
export async function findRevision(id: string): Promise<Revision> {
  const rev = await Revision.findByPk(id);
  if (!rev) throw new NotFoundError('Revision');
  return rev;
}

/** Puts a revision's document back as a new save, noted as a restore so the history says so. */
export async function restoreRevision(o: { tutorial: Tutorial; user: User; revision: Revision; version: number }) {
  const rev = o.revision;
  const note = `Restored from version ${rev.version} (${rev.updatedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC)`;
  return saveArticle({ tutorial: o.tutorial, user: o.user, doc: checkedDoc(rev.doc), version: o.version, note, newRevision: true });
}

/** The first draft as a preview: not saved until the maker applies it. */
export async function previewDraft(tutorial: Tutorial) {
  const current = await getArticle(tutorial);
  return { doc: await draftFor(tutorial), replaces: !isEmptyDoc(current.doc), version: current.version };
}

/** Saves the first draft over the write-up; what it replaces is already kept as the newest revision. */
export async function applyDraft(o: { tutorial: Tutorial; user: User; version: number }) {
  const doc = await draftFor(o.tutorial);
  return saveArticle({ ...o, doc, note: 'First draft from the footage', newRevision: true });
}

/** Replaces the write-up with a Markdown file's content, checked against the editor's schema. */
export async function importMarkdown(o: { tutorial: Tutorial; user: User; markdown: string; version: number }) {
  const doc = checkedDoc(markdownToDoc(o.markdown));
  return saveArticle({ tutorial: o.tutorial, user: o.user, doc, version: o.version, note: 'Imported from Markdown', newRevision: true });
}

/**
 * Keeps the write-up's links to a chapter's time right: steps linked to a retimed chapter move to
 * its new time; steps linked to a deleted chapter keep their time in the video and stop following
 * it. Saved as a version of its own (so a person editing meanwhile gets the usual conflict, never
 * a silent overwrite). Returns how many steps changed.
 */
export async function followChapter(o: { tutorial: Tutorial; user: User; chapterId: string; title: string; startMs: number | null }): Promise<number> {
  const article = await getArticle(o.tutorial);
  let changed = 0;
  const walk = (nodes: JSONContent[] | undefined): JSONContent[] | undefined =>
    nodes?.map((n) => {
      if (n.type === 'step' && n.attrs?.chapterId === o.chapterId) {
        changed++;
        return { ...n, attrs: o.startMs === null ? { ...n.attrs, chapterId: null } : { ...n.attrs, atMs: o.startMs } };
      }
      return n.content ? { ...n, content: walk(n.content) } : n;
    });
  const doc = { ...article.doc, content: walk(article.doc.content as JSONContent[] | undefined) } as DocJson;
  if (changed === 0) return 0;
  const note = o.startMs === null ? `Chapter “${o.title}” deleted: its steps keep their time` : `Steps follow chapter “${o.title}” to its new time`;
  await saveArticle({ tutorial: o.tutorial, user: o.user, doc: checkedDoc(doc), version: article.version, note, newRevision: true });
  return changed;
}
