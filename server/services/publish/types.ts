/**
 * What the publish renderers are handed: everything about one tutorial that goes out with it,
 * already loaded by the caller. The renderers touch no database and no network; they only
 * read the stills' files from disk.
 */
import type { JSONContent } from '@tiptap/core';
import type { Piece } from '@shared/measure';

/** Paper the handout and the template are printed on. */
export type { Paper } from '@shared/schemas/publish';

export interface PublishTutorial {
  title: string;
  slug: string;
  studioName: string;
  authorName: string;
  /** The published page, when there is one. */
  publicUrl: string | null;
  /** The video page, when there is one. */
  videoUrl: string | null;
  totalTimeMinutes?: number | null;
}

/** One supply as the Supplies section holds it. */
export interface PublishSupply {
  category: string;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
}

/** A named time in the video. */
export interface PublishChapter {
  title: string;
  startMs: number;
}

/** A frame pulled from the video. */
export interface PublishStill {
  id: string;
  atMs: number;
  caption: string;
  alt: string;
  width: number;
  height: number;
  /** The full-size JPEG: its absolute path on disk, or its bytes from object storage. */
  file: string | Buffer;
}

/** Everything the publish renderers need about one tutorial. */
export interface PublishBundle {
  tutorial: PublishTutorial;
  /** The Tiptap write-up (shared/editor schema). */
  doc: JSONContent;
  /** The cut list, with exact lengths. */
  pieces: Piece[];
  supplies: PublishSupply[];
  /** Non-null when a sponsored link needs it. */
  disclosure: string | null;
  chapters: PublishChapter[];
  stills: PublishStill[];
  /** The crafter's ruler: inch sizes of metric pieces are shown to the nearest 1/precision in. */
  precision: 8 | 16 | 32;
}
