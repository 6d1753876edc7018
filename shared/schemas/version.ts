import { z } from 'zod';
import type { PersonDto, UpdateState } from './tutorial';

/**
 * Versions of a tutorial and the comparison of two (DESIGN.md T4: what is published stays as
 * approved; a comparison of two versions).
 */

/** Why a version was kept: approved, published or sent back. */
export const VERSION_KINDS = ['published', 'approved', 'sent_back'] as const;
export type VersionKind = (typeof VERSION_KINDS)[number];

/**
 * ?from=&to= of the comparison. `from`: the version readers see (`published`, the default), the
 * latest one sent back or approved, or a version's id. `to`: the draft (the default) or a version's id.
 */
export const compareQuery = z.object({
  from: z.union([z.enum(VERSION_KINDS), z.uuid()], 'Compare from published, sent_back, approved or a version id').default('published'),
  to: z.union([z.literal('draft'), z.uuid()], 'Compare to draft or a version id').default('draft'),
});
export type CompareQuery = z.output<typeof compareQuery>;

// Response shapes (DTOs).

/** One kept version, without its content. */
export type VersionDto = { id: string; kind: VersionKind; createdAt: string; by: PersonDto | null; note: string; live: boolean };

/** GET /tutorials/:id/versions: newest first, with the update's state. */
export type VersionsDto = { versions: VersionDto[]; updateState: UpdateState | null; pendingUpdate: boolean };

/** One side of a comparison: a kept version, or the draft as it is now. */
export type VersionRefDto = { kind: VersionKind | 'draft'; id: string | null; label: string; at: string | null };

export type ChangeStatus = 'same' | 'added' | 'removed' | 'changed';

/** A run of words of a changed block: in both, only before (`removed`) or only after (`added`). */
export type TextPartDto = { text: string; added?: boolean; removed?: boolean };

/** One block of the write-up (a paragraph, a step's title, a photo's caption ...) side by side. */
export type TextRowDto = {
  status: ChangeStatus;
  /** Where it sits: "Introduction", "Step 3", "Step 3 · photo", "Tip". */
  label: string;
  before: string | null;
  after: string | null;
  /** Word by word, for a changed block. */
  beforeParts?: TextPartDto[];
  afterParts?: TextPartDto[];
};

/** One field of a row that changed, in the crafter's words ("4 1/4 x 5 1/2 in"). */
export type FieldChangeDto = { field: string; label: string; before: string; after: string };

/** One row of a list (a piece, a supply, a chapter) side by side. */
export type RowChangeDto = {
  id: string;
  status: ChangeStatus;
  /** The row's name after (before, for a removed one). */
  name: string;
  before: Record<string, string> | null;
  after: Record<string, string> | null;
  /** The fields that differ (changed rows only). */
  changes: FieldChangeDto[];
};

/** A section's comparison: every row in order, and the added, removed and changed ones apart. */
export type SectionCompareDto<Row> = { rows: Row[]; added: Row[]; removed: Row[]; changed: Row[]; unchanged: number };

/** The fields a row section shows, in order. */
export type FieldDto = { key: string; label: string };

export type RowSectionDto = SectionCompareDto<RowChangeDto> & { fields: FieldDto[] };
export type TextSectionDto = SectionCompareDto<TextRowDto>;

/** GET /tutorials/:id/compare: two versions of the write-up, cut list, supplies and the rest, side by side. */
export type CompareDto = {
  from: VersionRefDto;
  to: VersionRefDto;
  /** True when readers would see no difference. */
  identical: boolean;
  /** Title, video address, ruler, sponsorship disclosure. */
  details: RowSectionDto;
  writeUp: TextSectionDto;
  cutList: RowSectionDto;
  supplies: RowSectionDto;
  /** Chapters and stills the outputs use. */
  footage: RowSectionDto;
};

/** GET /tutorials/:id/published: the version readers see, rendered for the reader's view. */
export type PublishedTutorialDto = {
  id: string;
  title: string;
  authorName: string;
  studioName: string;
  publishedAt: string | null;
  videoUrl: string | null;
  /** The article as the public page shows it (safe markup from the server's renderer, no scripts). */
  html: string;
  /** How many pages the SVG cutting template takes on Letter (0: no pieces). */
  templatePages: number;
};
