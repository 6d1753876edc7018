import type { ArticleDto, ReplacedArticleDto, RevisionDetailDto, RevisionsDto, SavedArticleDto } from '@shared/schemas/article';
import type { Revision } from '../models';
import type { TutorialAbilities } from '../policies';
import type { StoredArticle } from '../services/write-up';

/** The write-up with whether the caller may edit it. */
export function presentArticle(a: StoredArticle, abilities: TutorialAbilities): ArticleDto {
  return {
    doc: a.doc,
    version: a.version,
    updatedAt: a.updatedAt?.toISOString() ?? null,
    updatedBy: a.updatedBy,
    abilities: { update: abilities.update, readRevisions: abilities.readRevisions },
  };
}

export const presentSaved = (s: { version: number; updatedAt: Date }): SavedArticleDto => ({ version: s.version, updatedAt: s.updatedAt.toISOString() });

/** A save that replaced the document: the new version and the document itself. */
export const presentReplaced = (s: { version: number; updatedAt: Date; doc: ArticleDto['doc'] }): ReplacedArticleDto => ({ ...presentSaved(s), doc: s.doc });

export function presentRevisions(rows: Revision[]): RevisionsDto {
  return {
    revisions: rows.map((r) => ({
      id: r.id,
      version: r.version,
      note: r.note,
      createdAt: r.createdAt.toISOString(),
      savedAt: r.updatedAt.toISOString(),
      author: r.author ? { id: r.author.id, name: r.author.name } : null,
    })),
  };
}

export const presentRevision = (r: Revision): RevisionDetailDto => ({
  id: r.id,
  version: r.version,
  note: r.note,
  createdAt: r.createdAt.toISOString(),
  doc: r.doc,
});
