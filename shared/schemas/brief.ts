import { z } from 'zod';
import { uuidSchema } from './studio';
import type { PersonDto, TutorialState } from './tutorial';

const dueDate = z.iso.date('Use a date like 2027-01-31');

/**
 * The products or papers a brief asks to feature: a list, or the lines of a text box (one a
 * line, blank lines left out), so the form and outside tools send either.
 */
const features = z.preprocess(
  (v) => (typeof v === 'string' ? v.split(/\r?\n/) : v),
  z
    .array(z.string().trim().max(200, 'Keep each product under 200 characters'))
    .transform((list) => list.filter(Boolean))
    .pipe(z.array(z.string()).max(30, 'At most 30 products or papers')),
);

const fields = {
  title: z.string().trim().min(1, 'Say what to make, e.g. “Easel card with the floral papers”').max(160, 'Keep the title under 160 characters'),
  makerId: z.uuid('Pick the maker'),
  dueDate,
  features,
  notes: z.string().trim().max(4000, 'Keep the notes under 4000 characters'),
};

/** POST /studios/:id/briefs: a coordinator's assignment to a maker. */
export const createBriefSchema = z.object({
  ...fields,
  features: fields.features.default([]),
  notes: fields.notes.default(''),
});
export type CreateBriefInput = z.input<typeof createBriefSchema>;

/** PATCH /briefs/:id: any field; a new maker hears about it. */
export const updateBriefSchema = z
  .object(fields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

/** A month as YYYY-MM (the board's and the brief list's filter). */
export const monthSchema = z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'Use a month like 2027-01');

/** GET /studios/:id/briefs. */
export const listBriefsQuery = z.object({
  makerId: uuidSchema.optional(),
  month: monthSchema.optional(),
  status: z.enum(['open', 'started']).optional(),
});

/** PUT /studios/:id/targets/:userId: projects a month, or null for no target. */
export const setTargetSchema = z.object({
  perMonth: z.number().int('Use a whole number').min(1, 'At least 1 a month (clear it for no target)').max(100, 'At most 100 a month').nullable(),
});

// Response shapes (DTOs)

export type BriefAbilitiesDto = { update: boolean; delete: boolean; startTutorial: boolean };

/** A brief with the tutorial started from it, if any. */
export type BriefDto = {
  id: string;
  studioId: string;
  title: string;
  maker: PersonDto;
  createdBy: PersonDto | null;
  dueDate: string;
  features: string[];
  notes: string;
  tutorial: { id: string; title: string; state: TutorialState } | null;
  createdAt: string;
  updatedAt: string;
  abilities: BriefAbilitiesDto;
};

/** GET /studios/:id/briefs: makers see their own, coordinators and owners all. `makers` are whom a brief can go to. */
export type BriefListDto = { briefs: BriefDto[]; makers: PersonDto[]; abilities: { createBrief: boolean; setTargets: boolean } };

/** One member's monthly target (null: none set). */
export type MonthlyTargetDto = { userId: string; name: string; perMonth: number | null };
export type MonthlyTargetsDto = { targets: MonthlyTargetDto[]; abilities: { setTargets: boolean } };
