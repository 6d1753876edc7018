import { z } from 'zod';
import { uuidSchema } from './studio';

export const TUTORIAL_STATES = ['draft', 'in_review', 'needs_changes', 'approved', 'published'] as const;
export const tutorialStateSchema = z.enum(TUTORIAL_STATES);
export type TutorialState = z.infer<typeof tutorialStateSchema>;

/** The words the interface shows for each state (DESIGN.md vocabulary). */
export const STATE_LABELS: Record<TutorialState, string> = {
  draft: 'draft',
  in_review: 'in review',
  needs_changes: 'needs changes',
  approved: 'approved',
  published: 'published',
};

/** The words for a state, as sentences use them ("in review"). */
export const stateLabel = (state: TutorialState): string => STATE_LABELS[state];

/**
 * The review state of an update: the changes made to a published tutorial, which readers do not
 * see until the update is approved and published (DESIGN.md T4). The tutorial stays "published"
 * meanwhile; null means there are no such changes.
 */
export const UPDATE_STATES = ['draft', 'in_review', 'needs_changes', 'approved'] as const;
export type UpdateState = (typeof UPDATE_STATES)[number];

/**
 * The state the review moves act on: the update's while a published tutorial has one, the
 * tutorial's own otherwise. "Send for review" of a published tutorial sends its update.
 */
export const reviewState = (t: { state: TutorialState; updateState?: UpdateState | null }): TutorialState =>
  t.state === 'published' && t.updateState ? t.updateState : t.state;

export const precisionSchema = z.union([z.literal(8), z.literal(16), z.literal(32)]);

const title = z.string().trim().min(1, 'Give the tutorial a title').max(160, 'Keep the title under 160 characters');

export const createTutorialSchema = z.object({
  studioId: uuidSchema,
  title,
  dueDate: z.iso.date('Use a date like 2027-01-31').nullable().optional(),
});
export type CreateTutorialInput = z.infer<typeof createTutorialSchema>;

export const updateTutorialSchema = z
  .object({
    title,
    dueDate: z.iso.date('Use a date like 2027-01-31').nullable(),
    precision: precisionSchema,
    defaultUnit: z.enum(['in', 'mm', 'cm']),
    videoUrl: z
      .string()
      .trim()
      .max(2000)
      .refine((s) => /^https?:\/\/\S+$/i.test(s), 'Use the full address of the video, starting with https://')
      .nullable(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdateTutorialInput = z.infer<typeof updateTutorialSchema>;

export const listTutorialsQuery = z.object({
  state: tutorialStateSchema.optional(),
  q: z.string().trim().max(160).optional(),
});

/** Moves between review states (DESIGN.md T2); the server checks who may make each one. */
export const TRANSITIONS = {
  submit: { from: ['draft', 'needs_changes'], to: 'in_review', label: 'Send for review' },
  approve: { from: ['in_review'], to: 'approved', label: 'Approve' },
  sendBack: { from: ['in_review', 'approved'], to: 'needs_changes', label: 'Send back' },
  publish: { from: ['approved'], to: 'published', label: 'Publish' },
  unpublish: { from: ['published'], to: 'approved', label: 'Unpublish' },
} as const satisfies Record<string, { from: readonly TutorialState[]; to: TutorialState; label: string }>;
export type Transition = keyof typeof TRANSITIONS;
export const transitionSchema = z.object({
  action: z.enum(Object.keys(TRANSITIONS) as [Transition, ...Transition[]]),
  note: z.string().trim().max(2000).optional(),
  /** Publish although cross-check warnings are open (the caller has shown them and the person confirmed). */
  confirmWarnings: z.boolean().optional(),
});

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/** What the caller may do with one tutorial (server/policies/tutorial.policy.ts decides). */
export type TutorialAbilitiesDto = {
  visible: boolean;
  read: boolean;
  update: boolean;
  delete: boolean;
  submit: boolean;
  approve: boolean;
  sendBack: boolean;
  publish: boolean;
  unpublish: boolean;
  /** The workspace: the live draft of the write-up, cut list, supplies and footage (staff and makers; students read the published version). */
  readDraft: boolean;
  schedulePublish: boolean;
  readComments: boolean;
  comment: boolean;
  scheduleClass: boolean;
  readPublicPage: boolean;
  readExports: boolean;
  readMedia: boolean;
};

export type PersonDto = { id: string; name: string };

/** A tutorial as the API sends it, with the caller's abilities. */
export type TutorialDto = {
  id: string;
  studioId: string;
  authorId: string | null;
  author?: PersonDto;
  title: string;
  slug: string;
  state: TutorialState;
  dueDate: string | null;
  precision: 8 | 16 | 32;
  defaultUnit: 'in' | 'mm' | 'cm';
  /** When the version readers see went out (the first publication, or the latest update published since). */
  publishedAt: string | null;
  /** The review state of the changes made since it was published; null when readers see the draft as it is. */
  updateState: UpdateState | null;
  /** True while a published tutorial has changes readers do not see yet. */
  pendingUpdate: boolean;
  videoUrl: string | null;
  /** The brief it was started from. */
  briefId: string | null;
  /** A scheduled publish (approved tutorials): the time, and the zone it was picked in. */
  publishAt: string | null;
  publishTimeZone: string | null;
  createdAt: string;
  updatedAt: string;
  abilities: TutorialAbilitiesDto;
};

/** GET /studios/:id/tutorials, with the caller's studio abilities that the list needs. */
export type TutorialListDto = {
  tutorials: TutorialDto[];
  /** seeAllTutorials: false for a student, who sees the published ones only (the list offers no other state). */
  abilities: { createTutorial: boolean; manageMembers: boolean; seeAllTutorials: boolean };
};
