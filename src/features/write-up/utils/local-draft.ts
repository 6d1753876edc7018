import type { JSONContent } from '@tiptap/core';
import { fitsSchema, sameDoc } from './same-doc';

/** What this device keeps of edits the server does not have yet. */
export type LocalDraft = {
  /** The server version the edits were made on. */
  baseVersion: number;
  doc: JSONContent;
  /** When the last of these edits was made (ms since the epoch, this device's clock). */
  editedAt: number;
};

/** The part of the Web Storage API used here, so tests can hand in a Map-backed one. */
export type StorageLike = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

/** One key per tutorial, so two write-ups open in two tabs never share unsaved edits. */
export const localDraftKey = (tutorialId: string) => `cardwright:write-up:${tutorialId}`;

/** The unsaved edits kept for a tutorial, or null; anything unreadable counts as nothing. */
export function readLocalDraft(storage: StorageLike | null, tutorialId: string): LocalDraft | null {
  if (!storage) return null;
  try {
    const raw = storage.getItem(localDraftKey(tutorialId));
    if (!raw) return null;
    const v = JSON.parse(raw) as Partial<LocalDraft>;
    if (!Number.isInteger(v.baseVersion) || (v.baseVersion as number) < 0 || typeof v.editedAt !== 'number' || !fitsSchema(v.doc)) return null;
    return { baseVersion: v.baseVersion as number, doc: v.doc as JSONContent, editedAt: v.editedAt };
  } catch {
    return null;
  }
}

/** Keeps the edits on this device; false when storage is full or turned off (the caller says so). */
export function writeLocalDraft(storage: StorageLike | null, tutorialId: string, draft: LocalDraft): boolean {
  if (!storage) return false;
  try {
    storage.setItem(localDraftKey(tutorialId), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

/** Forgets the kept edits once the server has them. */
export function clearLocalDraft(storage: StorageLike | null, tutorialId: string): void {
  try {
    storage?.removeItem(localDraftKey(tutorialId));
  } catch {
    // Storage turned off: there was nothing kept either.
  }
}

/** How the editor starts, given the server's write-up and what this device kept. */
export type StartPlan =
  /** Nothing kept, or the server already has it: start from the server's write-up. */
  | { kind: 'server' }
  /** Edits made on the server's current version: put them back and save them. */
  | { kind: 'restore'; draft: LocalDraft }
  /** Edits made on an older version, while someone saved a newer one: the person compares and chooses. */
  | { kind: 'compare'; draft: LocalDraft };

/** Decides between the server's write-up and the edits this device kept (see StartPlan). */
export function planStart(server: { doc: JSONContent; version: number }, draft: LocalDraft | null): StartPlan {
  if (!draft || sameDoc(draft.doc, server.doc)) return { kind: 'server' };
  return draft.baseVersion === server.version ? { kind: 'restore', draft } : { kind: 'compare', draft };
}
