import { z } from 'zod';
import type { JSONContent } from '@tiptap/core';
import type { PersonDto } from './tutorial';

// Inputs of the write-up (the article) routes.

const version = z.number().int().min(0);
/** PUT /tutorials/:id/article: the whole document and the version it was based on. */
export const saveArticleSchema = z.object({ doc: z.record(z.string(), z.unknown()), version });
/** Moves that replace the write-up (apply a draft, restore a revision) name the version they replace. */
export const versionOnlySchema = z.object({ version });
export const markdownImportSchema = z.object({ markdown: z.string().max(2_000_000, 'The Markdown is too long'), version });

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/** GET /tutorials/:id/article. */
export type ArticleDto = {
  doc: JSONContent;
  version: number;
  updatedAt: string | null;
  updatedBy: PersonDto | null;
  abilities: { update: boolean; readRevisions: boolean };
};

/** PUT /tutorials/:id/article. */
export type SavedArticleDto = { version: number; updatedAt: string };

/** A save that replaced the document (draft, restore, Markdown import) also sends the new document. */
export type ReplacedArticleDto = SavedArticleDto & { doc: JSONContent };

/** The newer write-up a 409 answer carries, so the person can compare and choose. */
export type NewerArticleDto = { doc: JSONContent; version: number; updatedBy: PersonDto | null; updatedAt: string | null };

/** POST /tutorials/:id/draft: a preview, not saved. */
export type DraftPreviewDto = { doc: JSONContent; replaces: boolean; version: number };

export type RevisionSummaryDto = { id: string; version: number; note: string; createdAt: string; savedAt: string; author: PersonDto | null };
export type RevisionsDto = { revisions: RevisionSummaryDto[] };
export type RevisionDetailDto = { id: string; version: number; note: string; createdAt: string; doc: JSONContent };
