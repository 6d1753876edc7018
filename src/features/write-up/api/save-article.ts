import type { JSONContent } from '@tiptap/core';
import { ApiError, api } from '@/lib/api-client';
import type { NewerArticleDto, SavedArticleDto } from '@shared/schemas/article';

/** Saves the write-up if `version` is still the current one; a stale save answers 409 (see `newerArticleOf`). */
export const saveArticle = (tutorialId: string, doc: JSONContent, version: number) =>
  api<SavedArticleDto>(`/tutorials/${tutorialId}/article`, { method: 'PUT', body: { doc, version } });

/** The newer write-up carried by a 409 "stale" answer, or null for any other failure. */
export function newerArticleOf(err: unknown): NewerArticleDto | null {
  if (!(err instanceof ApiError) || err.status !== 409 || err.body.code !== 'stale') return null;
  const b = err.body as Partial<NewerArticleDto>;
  if (typeof b.version !== 'number' || !b.doc || typeof b.doc !== 'object') return null;
  return { doc: b.doc as JSONContent, version: b.version, updatedBy: b.updatedBy ?? null, updatedAt: b.updatedAt ?? null };
}
