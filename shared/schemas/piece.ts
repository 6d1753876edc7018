import { z } from 'zod';
import { lengthTextProblem } from '../measure/bounds';
import { GRAINS, PIECE_SHAPES, ROUND_SHAPES, type CheckCode, type CheckSeverity, type Grain, type MentionKind, type PieceShape, type TagTop } from '../measure';
import { SHEET_GRAINS, type SheetGrain } from '../geometry/grain';

export type { Grain, PieceShape, SheetGrain, TagTop };

/**
 * A length as a person types or says it ("4 1/4", "ten and a half", "108 mm"); the same check
 * runs in the form and on the server, which then stores the exact value. Negative, zero and
 * out-of-bounds lengths are refused in words here; a bare number's bounds depend on the tutorial's
 * unit, which the server checks again when it reads the length (`readInputLength`).
 */
export const lengthText = z
  .string()
  .trim()
  .min(1, 'Enter a length')
  .max(80, 'Keep it shorter')
  .superRefine((s, ctx) => {
    const problem = lengthTextProblem(s);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });

export const scoreLineInput = z.object({
  axis: z.enum(['width', 'height']),
  at: lengthText,
  tab: z.boolean().optional(),
});

/**
 * A shape's own sizes, as typed. On a change, a field set to null is taken away, and a scallop size
 * and a scallop count replace each other (one decides the other).
 */
export const shapeParamsInput = z
  .object({
    cornerRadius: lengthText.nullable(),
    scallopSize: lengthText.nullable(),
    scallopCount: z.number().int('Use a whole number').min(2, 'At least 2 scallops').max(400, 'At most 400 scallops').nullable(),
    tagTop: z.enum(['clipped', 'rounded']).nullable(),
    tagCorner: lengthText.nullable(),
    holeDiameter: lengthText.nullable(),
    holeFromTop: lengthText.nullable(),
    depth: lengthText.nullable(),
    glueFlap: lengthText.nullable(),
  })
  .partial()
  .strict();
export type ShapeParamsInput = z.input<typeof shapeParamsInput>;

const pieceFields = {
  name: z.string().trim().min(1, 'Name the piece').max(120),
  material: z.string().trim().max(120),
  quantity: z.number().int('Use a whole number').min(1, 'At least 1').max(999, 'At most 999'),
  shape: z.enum(PIECE_SHAPES as [PieceShape, ...PieceShape[]]),
  params: shapeParamsInput,
  grain: z.enum(GRAINS as [Grain, ...Grain[]]),
  width: lengthText,
  height: lengthText.optional(),
  // a repeat said as "every 1/8 in" over a 12 x 12 sheet gives 95 lines
  scoreLines: z.array(scoreLineInput).max(200, 'At most 200 score lines'),
  matOnId: z.uuid().nullable(),
  notes: z.string().max(1000, 'Keep notes under 1000 characters'),
  // within PostgreSQL's integer column (2^31 - 1), so a huge value is a 400, not a 500
  saidAtMs: z.number().int().min(0).max(2_147_483_647, 'Too far into the video').nullable(),
};

export const createPieceSchema = z
  .object({
    ...pieceFields,
    material: pieceFields.material.default(''),
    quantity: pieceFields.quantity.default(1),
    shape: pieceFields.shape.default('rect'),
    params: pieceFields.params.optional(),
    // Left out: the server picks it (wrap strips and walls along their length, common practice).
    grain: pieceFields.grain.optional(),
    scoreLines: pieceFields.scoreLines.default([]),
    matOnId: pieceFields.matOnId.optional(),
    notes: pieceFields.notes.default(''),
    saidAtMs: pieceFields.saidAtMs.optional(),
    /** The transcript mention it was made from, so the mention shows where it went. */
    mentionKey: z.string().min(1).max(400).optional(),
  })
  .refine((p) => ROUND_SHAPES.includes(p.shape) || p.height !== undefined, { path: ['height'], message: 'Enter the length of the piece' })
  .refine((p) => p.shape !== 'rounded-rect' || Boolean(p.params?.cornerRadius), { path: ['params', 'cornerRadius'], message: 'Enter the corner radius' })
  .refine((p) => p.shape !== 'pillow-box' || Boolean(p.params?.depth), { path: ['params', 'depth'], message: 'Enter how deep the box is' });
export type CreatePieceInput = z.input<typeof createPieceSchema>;

export const updatePieceSchema = z
  .object(pieceFields)
  .partial()
  .extend({ position: z.number().int().min(0).max(100_000, 'At most 100,000').optional() })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdatePieceInput = z.input<typeof updatePieceSchema>;

/** What a material is; cardstock unless said otherwise. */
export const MATERIAL_KINDS = ['cardstock', 'patterned paper', 'paper', 'vellum', 'acetate', 'other'] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

// Defaults only where a record is made: a partial update must not fill in fields it was not given.
const materialFields = {
  name: z.string().trim().min(1, 'Name the material').max(120),
  kind: z.enum(MATERIAL_KINDS),
  sheetWidth: lengthText,
  sheetHeight: lengthText,
  rotate: z.boolean(),
  grain: z.enum(SHEET_GRAINS as [SheetGrain, ...SheetGrain[]]),
};
export const materialSchema = z.object({
  ...materialFields,
  kind: materialFields.kind.default('cardstock'),
  rotate: materialFields.rotate.default(true),
  grain: materialFields.grain.default('none'),
});
export const updateMaterialSchema = z
  .object(materialFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

// The sheet plan's query and limits live with its DTOs.
export { sheetPlanQuery } from './sheet-plan';

export const dismissMentionSchema = z.object({ key: z.string().min(1).max(400), dismissed: z.boolean().default(true) });

/**
 * POST /tutorials/:id/mentions/pieces: finished pieces from size mentions. Without keys, every
 * size mention still to go through ("Make pieces from all"); `again` makes a second piece from a
 * mention already used.
 */
export const makePiecesSchema = z.object({
  keys: z.array(z.string().min(1).max(400)).min(1, 'Choose a mention').max(500).optional(),
  again: z.boolean().default(false),
});

/** POST /tutorials/:id/mentions/score-lines: a score mention's lines onto a piece, on one side. */
export const mentionScoreLinesSchema = z.object({
  key: z.string().min(1).max(400),
  pieceId: z.uuid(),
  axis: z.enum(['width', 'height']),
  again: z.boolean().default(false),
});

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/** A length as the API sends it: exact stored form, numbers for drawing, and display texts. */
export type LengthDto = { value: string; inches: number; mm: number; display: string; mmDisplay: string };

export type ScoreLineDto = { axis: 'width' | 'height'; at: LengthDto; tab: boolean };

/** One check of a piece, in words, with the nearest ruler mark when it is about precision. */
export type PieceCheckDto = { code: CheckCode; severity: CheckSeverity; reason: string; field: string | null; nearest: LengthDto | null };

/** A shape's own sizes, each length as the API sends lengths. */
export type ShapeParamsDto = {
  cornerRadius?: LengthDto;
  scallopSize?: LengthDto;
  scallopCount?: number;
  tagTop?: TagTop;
  tagCorner?: LengthDto;
  holeDiameter?: LengthDto;
  holeFromTop?: LengthDto;
  depth?: LengthDto;
  glueFlap?: LengthDto;
};

export type PieceDto = {
  id: string;
  position: number;
  name: string;
  material: string;
  quantity: number;
  shape: PieceShape;
  params: ShapeParamsDto;
  /** In words: "1/4 in corners", "44 scallops of 1/2 in", "1 in deep; blank 6 1/2 x 6 in". Empty for plain shapes. */
  shapeSummary: string;
  /** The cut line as SVG path data in inches from the top-left corner (null when the sizes cannot make the shape). */
  outline: string | null;
  grain: Grain;
  width: LengthDto;
  height: LengthDto;
  /** The size it is cut from: a pillow box's flat blank, otherwise its width and height. */
  extent: { width: LengthDto; height: LengthDto };
  scoreLines: ScoreLineDto[];
  matOnId: string | null;
  notes: string;
  saidAtMs: number | null;
  /** The transcript mention it was made from, if any. */
  mentionKey: string | null;
  checks: PieceCheckDto[];
};

export type MaterialDto = {
  id: string;
  name: string;
  kind: MaterialKind;
  sheetWidth: LengthDto;
  sheetHeight: LengthDto;
  rotate: boolean;
  grain: SheetGrain;
  /** Price of one stock sheet in minor units (kit planner); null when not priced. */
  sheetPriceCents: number | null;
  sheetPriceCurrency: string | null;
};

/** GET /tutorials/:id/pieces: the Cut list section, and the write-up's live cut list. */
export type CutListDto = {
  pieces: PieceDto[];
  materials: MaterialDto[];
  precision: 8 | 16 | 32;
  defaultUnit: 'in' | 'mm' | 'cm';
  abilities: { update: boolean };
};

/** GET /tutorials/:id/checks: every piece's checks in one list. */
export type ChecksDto = { checks: (PieceCheckDto & { pieceId: string; pieceName: string })[] };

export type MentionDto = {
  key: string;
  kind: MentionKind;
  text: string;
  approx: boolean;
  corrected: boolean;
  startMs: number;
  endMs: number;
  /** Low and high end for a range; the first line for repeated score lines. */
  values: LengthDto[];
  /** Repeated score lines: the step between them ("every 1/4 in"). */
  every: LengthDto | null;
  /** How many were said before it ("three 4 by 6 mats"): the quantity of a piece made from it. */
  count: number | null;
  dismissed: boolean;
  /** The finished piece "Make a piece" makes from a size or a diameter: named from the words said, material, quantity, score lines. */
  proposal: PieceProposalDto | null;
  /** A score list said next to a size: that size's key (its lines go into the size's piece). */
  scoreOf: string | null;
  /** Where it went: the piece made from it, or the piece its score lines were added to. */
  uses: { pieceId: string; pieceName: string; as: 'piece' | 'score' }[];
};

export type PieceProposalDto = {
  name: string;
  /** False when nobody named the piece in the talk and the name is only its time. */
  nameSaid: boolean;
  material: string;
  quantity: number;
  shape: 'rect' | 'circle';
  width: LengthDto;
  height: LengthDto;
  scoreLines: { axis: 'width' | 'height'; at: LengthDto }[];
  scoreKey: string | null;
  notes: string;
};

/** GET /tutorials/:id/mentions: the measurements said in the newest recording; `toGoThrough` counts those neither used nor dismissed. */
export type MentionsDto = { recordingId: string | null; mentions: MentionDto[]; toGoThrough: number };

/** POST /tutorials/:id/mentions/pieces: the pieces made, for review, and the mentions left alone with why. */
export type MadePiecesDto = { pieces: PieceDto[]; skipped: { key: string; text: string; reason: string }[] };

/** GET /tutorials/:id/sheet-plan: its shapes live with its query and limits. */
export type { SheetPlanDto } from './sheet-plan';

/** GET /tutorials/:id/materials. */
export type MaterialsDto = { materials: MaterialDto[] };
/** POST /tutorials/:id/mentions/dismiss. */
export type MentionDismissedDto = { key: string; dismissed: boolean };
