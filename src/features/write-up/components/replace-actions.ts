import type { JSONContent } from '@tiptap/core';

/** What the draft, restore and import actions need from the page to replace the write-up safely. */
export type ReplaceActions = {
  /** Saves pending edits first, so the write-up being replaced is kept as a revision; false when it could not. */
  prepare: () => Promise<boolean>;
  /** The version the server holds (after prepare). */
  baseVersion: () => number;
  /** Puts the server's new write-up in the editor. */
  replaced: (doc: JSONContent, version: number) => void;
};

/** Why a replace could not start: the edits in the editor are not on the server. */
export const UNSAVED_FIRST = 'Your latest changes are not saved yet, so nothing was replaced. Wait for "Saved" (or resolve the newer version) and try again.';
