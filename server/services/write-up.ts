import type { JSONContent } from '@tiptap/core';
import type { Transaction } from 'sequelize';
import { validateDoc } from '@shared/editor';
import { generateDraft } from '@shared/draft';
import { Article, Chapter, Cue, Recording, Revision, Still, User, sequelize, type Tutorial } from '../models';
import type { DocJson } from '../models/article';
import { HttpError } from '../lib/http-error';

/** What the editor starts from: the schema needs one block, so an empty paragraph. */
export const EMPTY_DOC: DocJson = { type: 'doc', content: [{ type: 'paragraph' }] };

/** Saves within this long of the same person's last revision update it instead of adding one. */
const REVISION_SESSION_MS = 10 * 60_000;

/** True for a write-up with nothing in it yet. */
export const isEmptyDoc = (d: DocJson) => !d.content || d.content.length === 0 || (d.content.length === 1 && !(d.content[0] as JSONContent).content?.length);

/** The current write-up, or an empty one at version 0 when nothing was saved yet. */
export async function getArticle(tutorial: Tutorial) {
  const a = await Article.findByPk(tutorial.id, { include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'] }] });
  if (!a) return { doc: EMPTY_DOC, version: 0, updatedAt: null, updatedBy: null };
  return { doc: a.doc, version: a.version, updatedAt: a.updatedAt, updatedBy: a.updatedBy ? { id: a.updatedBy.id, name: a.updatedBy.name } : null };
}

/** Validates a submitted document against the shared schema; 400 names what is wrong. */
export function checkedDoc(json: unknown): DocJson {
  const r = validateDoc(json);
  if (!r.ok) throw new HttpError(400, `doc: ${r.error}`, { issues: [{ path: 'doc', message: r.error }] });
  return r.doc as DocJson;
}

/**
 * Saves a write-up if it is based on the current version. A stale save answers 409 with the newer
 * document, so the person can compare and choose; nothing is overwritten silently. Each save keeps
 * a revision: the same person's saves within ten minutes update one revision (an editing session).
 */
export async function saveArticle(opts: { tutorial: Tutorial; user: User; doc: DocJson; version: number; note?: string; newRevision?: boolean }) {
  return sequelize.transaction(async (transaction) => {
    // Lock the row (or the tutorial, before the first save) so two saves cannot both pass the check.
    await sequelize.query('SELECT id FROM tutorials WHERE id = :id FOR UPDATE', { replacements: { id: opts.tutorial.id }, transaction });
    const current = await Article.findByPk(opts.tutorial.id, { transaction, include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'] }] });
    const currentVersion = current?.version ?? 0;
    if (opts.version !== currentVersion) {
      throw new HttpError(409, `Someone saved a newer version (${currentVersion}) while you were editing version ${opts.version}`, {
        code: 'stale',
        version: currentVersion,
        doc: current?.doc ?? EMPTY_DOC,
        updatedBy: current?.updatedBy ? { id: current.updatedBy.id, name: current.updatedBy.name } : null,
        updatedAt: current?.updatedAt ?? null,
      });
    }
    const version = currentVersion + 1;
    if (current) await current.update({ doc: opts.doc, version, updatedById: opts.user.id }, { transaction });
    else await Article.create({ tutorialId: opts.tutorial.id, doc: opts.doc, version, updatedById: opts.user.id }, { transaction });
    await keepRevision({ tutorialId: opts.tutorial.id, userId: opts.user.id, doc: opts.doc, version, note: opts.note ?? '', fresh: opts.newRevision ?? false, transaction });
    return { version, updatedAt: new Date() };
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
  const rec = await Recording.findOne({ where: { tutorialId: tutorial.id }, order: [['createdAt', 'DESC']] });
  if (!rec) throw new HttpError(409, 'Add a recording with chapters in the Footage section first; the draft is made from them');
  const [chapters, cues, stills] = await Promise.all([
    Chapter.findAll({ where: { recordingId: rec.id }, order: [['startMs', 'ASC']] }),
    Cue.findAll({ where: { recordingId: rec.id }, order: [['position', 'ASC']] }),
    Still.findAll({ where: { recordingId: rec.id }, order: [['atMs', 'ASC']] }),
  ]);
  if (chapters.length === 0) throw new HttpError(409, 'Mark at least one chapter in the Footage section first: each chapter becomes a step');
  const doc = generateDraft({
    title: tutorial.title,
    chapters: chapters.map((c) => ({ id: c.id, title: c.title, startMs: c.startMs })),
    cues: cues.map((c) => ({ startMs: c.startMs, endMs: c.endMs, text: c.text })),
    stills: stills.map((s) => ({ id: s.id, atMs: s.atMs, url: `/media/stills/${s.id}.jpg`, caption: s.caption, alt: s.alt, width: s.width, height: s.height })),
    durationMs: rec.durationMs ?? undefined,
    defaultUnit: tutorial.defaultUnit,
  });
  return checkedDoc(doc);
}

/** Revisions newest first, without their documents. */
export async function listRevisions(tutorial: Tutorial) {
  const rows = await Revision.findAll({
    where: { tutorialId: tutorial.id },
    order: [['createdAt', 'DESC']],
    attributes: ['id', 'version', 'note', 'createdAt', 'updatedAt'],
    include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
    limit: 200,
  });
  return rows.map((r) => ({ id: r.id, version: r.version, note: r.note, createdAt: r.createdAt, savedAt: r.updatedAt, author: r.author ? { id: r.author.id, name: r.author.name } : null }));
}

