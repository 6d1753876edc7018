import type { JSONContent } from '@tiptap/core';

export type Person = { id: string; name: string };

/** GET /tutorials/:id/article. */
export type Article = {
  doc: JSONContent;
  version: number;
  updatedAt: string | null;
  updatedBy: Person | null;
  abilities: { update: boolean };
};

/** PUT /tutorials/:id/article. */
export type SavedArticle = { version: number; updatedAt: string };

/** The newer write-up a 409 answer carries, so the person can compare and choose. */
export type NewerArticle = { doc: JSONContent; version: number; updatedBy: Person | null; updatedAt: string | null };

/** POST /tutorials/:id/draft: a preview, not saved. */
export type DraftPreview = { doc: JSONContent; replaces: boolean; version: number };

export type RevisionSummary = { id: string; version: number; note: string; createdAt: string; savedAt: string; author: Person | null };
export type RevisionDetail = { id: string; version: number; note: string; createdAt: string; doc: JSONContent };

type LengthText = { display: string; mmDisplay: string; mm: number };

/** The part of a cut-list piece the live table shows. */
export type LivePiece = {
  id: string;
  name: string;
  material: string;
  quantity: number;
  shape: 'rect' | 'circle';
  width: LengthText;
  height: LengthText;
  scoreLines: { axis: 'width' | 'height'; at: { display: string }; tab: boolean }[];
  notes: string;
};

export type LiveSupply = {
  id: string;
  category: string;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
};

export type LiveSupplies = { supplies: LiveSupply[]; disclosure: { required: boolean; text: string } };

/** A still as the picker offers it. */
export type PickableStill = { id: string; atMs: number; url: string; caption: string | null; alt: string | null; width: number; height: number };
