import type { TutorialState } from './tutorial';
import type { PersonDto } from './tutorial';

// Response shapes (DTOs) of the review: history, checklist.

/** A comment still open when a tutorial was sent back, as it read then. */
export type OpenCommentDto = { id: string; body: string; where: string; author: string };

/** One move between states (who, when, from, to, note). `by` is null when the app moved it (a scheduled publish). */
export type StateChangeDto = {
  id: string;
  action: string;
  from: TutorialState;
  to: TutorialState;
  note: string;
  by: PersonDto | null;
  at: string;
  openComments: OpenCommentDto[];
  /** A move of a published tutorial's update (its changes since publishing); from and to are the update's states. */
  update: boolean;
};

/** GET /tutorials/:id/history: newest first. */
export type HistoryDto = { history: StateChangeDto[] };

export const CHECKLIST_ITEMS = ['stepPhotos', 'disclosure', 'cutList', 'chapters', 'dueDate'] as const;
export type ChecklistItemKey = (typeof CHECKLIST_ITEMS)[number];

/** One line of the review checklist: `ok` true, false, or null when it does not apply (no due date). */
export type ChecklistItemDto = {
  key: ChecklistItemKey;
  label: string;
  ok: boolean | null;
  detail: string;
  section: 'write-up' | 'supplies' | 'cut-list' | 'footage' | 'tutorial';
};

/** GET /tutorials/:id/checklist: what the coordinator and the maker both check before approval. */
export type ChecklistDto = { items: ChecklistItemDto[]; passed: number; total: number; openComments: number };
