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
export const transitionSchema = z.object({ action: z.enum(Object.keys(TRANSITIONS) as [Transition, ...Transition[]]), note: z.string().trim().max(2000).optional() });
