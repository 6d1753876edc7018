import type { JSONContent } from '@tiptap/core';
import { reviewChecklist } from '@shared/review/checklist';
import type { ChecklistDto } from '@shared/schemas/review';
import { Article, Chapter, Comment, StateChange, type Tutorial } from '../models';
import { loadCutList } from './cut-list';
import { newestRecording } from './recordings';
import { loadSupplies } from './supplies';

const day = (d: Date) => d.toISOString().slice(0, 10);

/** The review checklist for one tutorial, from its saved write-up, supplies, cut list, footage and history. */
export async function checklistFor(tutorial: Tutorial, now = new Date()): Promise<ChecklistDto> {
  const [article, supplies, cutList, recording, openComments, lastSubmit] = await Promise.all([
    Article.findByPk(tutorial.id, { attributes: ['doc'] }),
    loadSupplies(tutorial),
    loadCutList(tutorial),
    newestRecording(tutorial.id),
    Comment.count({ where: { tutorialId: tutorial.id, parentId: null, resolvedAt: null } }),
    StateChange.findOne({ where: { tutorialId: tutorial.id, action: 'submit' }, order: [['createdAt', 'DESC']], attributes: ['createdAt'] }),
  ]);
  const chapters = recording ? await Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs'] }) : null;
  const names = new Map(cutList.rows.map((r) => [r.id, r.name]));
  const waiting = tutorial.state === 'draft' || tutorial.state === 'needs_changes';
  return reviewChecklist({
    doc: (article?.doc as JSONContent | undefined) ?? null,
    sponsoredLinks: supplies.rows.filter((s) => s.sponsored && s.url).length,
    disclosureText: supplies.disclosure.text,
    pieces: cutList.rows.length,
    failedChecks: cutList.checks.map((c) => ({ pieceName: names.get(c.pieceId) ?? 'A piece', reason: c.reason })),
    chapterStarts: chapters ? chapters.map((c) => c.startMs) : null,
    dueDate: tutorial.dueDate ?? null,
    sentOn: !waiting && lastSubmit ? day(lastSubmit.createdAt) : null,
    today: day(now),
    openComments,
  });
}
