import { z } from 'zod';
import { parseLength } from '../measure/parse-length';

/**
 * A length as a person types or says it ("4 1/4", "ten and a half", "108 mm"); the same check
 * runs in the form and on the server, which then stores the exact value.
 */
export const lengthText = z
  .string()
  .trim()
  .min(1, 'Enter a length')
  .max(80, 'Keep it shorter')
  .refine((s) => parseLength(s) !== null, 'Could not read this as a length; try “4 1/4”, “ten and a half” or “108 mm”');

export const scoreLineInput = z.object({
  axis: z.enum(['width', 'height']),
  at: lengthText,
  tab: z.boolean().optional(),
});

const pieceFields = {
  name: z.string().trim().min(1, 'Name the piece').max(120),
  material: z.string().trim().max(120),
  quantity: z.number().int('Use a whole number').min(1, 'At least 1').max(999, 'At most 999'),
  shape: z.enum(['rect', 'circle']),
  width: lengthText,
  height: lengthText.optional(),
  scoreLines: z.array(scoreLineInput).max(40, 'At most 40 score lines'),
  matOnId: z.uuid().nullable(),
  notes: z.string().max(1000, 'Keep notes under 1000 characters'),
  saidAtMs: z.number().int().min(0).nullable(),
};

export const createPieceSchema = z
  .object({
    ...pieceFields,
    material: pieceFields.material.default(''),
    quantity: pieceFields.quantity.default(1),
    shape: pieceFields.shape.default('rect'),
    scoreLines: pieceFields.scoreLines.default([]),
    matOnId: pieceFields.matOnId.optional(),
    notes: pieceFields.notes.default(''),
    saidAtMs: pieceFields.saidAtMs.optional(),
  })
  .refine((p) => p.shape === 'circle' || p.height !== undefined, { path: ['height'], message: 'Enter the length of the piece' });
export type CreatePieceInput = z.input<typeof createPieceSchema>;

export const updatePieceSchema = z
  .object(pieceFields)
  .partial()
  .extend({ position: z.number().int().min(0).optional() })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdatePieceInput = z.input<typeof updatePieceSchema>;

// Defaults only where a record is made: a partial update must not fill in fields it was not given.
const materialFields = {
  name: z.string().trim().min(1, 'Name the material').max(120),
  kind: z.enum(['cardstock', 'patterned paper', 'paper', 'vellum', 'acetate', 'other']),
  sheetWidth: lengthText,
  sheetHeight: lengthText,
  rotate: z.boolean(),
};
export const materialSchema = z.object({ ...materialFields, kind: materialFields.kind.default('cardstock'), rotate: materialFields.rotate.default(true) });
export const updateMaterialSchema = z
  .object(materialFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const sheetPlanQuery = z.object({
  kits: z.coerce.number().int().min(1, 'At least 1 kit').max(500, 'At most 500 kits').default(1),
  spares: z.coerce.number().int().min(0).max(100).default(0),
});

export const dismissMentionSchema = z.object({ key: z.string().min(1).max(400), dismissed: z.boolean().default(true) });
