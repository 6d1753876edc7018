import { z } from 'zod';

export const SUPPLY_CATEGORIES = ['paper', 'cardstock', 'embellishment', 'adhesive', 'tool', 'other'] as const;
export const SUPPLY_CATEGORY_LABELS: Record<(typeof SUPPLY_CATEGORIES)[number], string> = {
  paper: 'Paper',
  cardstock: 'Cardstock',
  embellishment: 'Embellishment',
  adhesive: 'Adhesive',
  tool: 'Tool',
  other: 'Other',
};

/** The disclosure used when a link is sponsored and the maker has not written their own. */
export const DEFAULT_DISCLOSURE =
  'Some links in this tutorial are sponsored or affiliate links: if you buy through them, the shop may pay me a small commission at no extra cost to you. I only list supplies I use.';

// Shop links must be web addresses; anything else (javascript:, data:) is refused.
const shopUrl = z
  .string()
  .trim()
  .max(2000)
  .refine((s) => /^https?:\/\/[^\s]+$/i.test(s), 'Use a full web address starting with https://');

const fields = {
  category: z.enum(SUPPLY_CATEGORIES),
  name: z.string().trim().min(1, 'Name the supply').max(200),
  quantity: z.string().trim().max(60),
  note: z.string().trim().max(500),
  url: shopUrl.nullable(),
  sponsored: z.boolean(),
  discountCode: z.string().trim().max(60).nullable(),
};

export const createSupplySchema = z.object({
  ...fields,
  quantity: fields.quantity.default(''),
  note: fields.note.default(''),
  url: fields.url.optional(),
  sponsored: fields.sponsored.default(false),
  discountCode: fields.discountCode.optional(),
});
export type CreateSupplyInput = z.input<typeof createSupplySchema>;
export const updateSupplySchema = z
  .object(fields)
  .partial()
  // within PostgreSQL's integer column, so a huge value is a 400, not a 500
  .extend({
    position: z.number().int().min(0).max(100_000, 'At most 100,000').optional(),
    // The sheet plan's figure a lower count is accepted against (null takes the acceptance back).
    acceptedSheetNeed: z.number().int('Use a whole number of sheets').min(1).max(100_000).nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const disclosureSchema = z.object({ disclosure: z.string().trim().max(1000).nullable() });

// Response shapes (DTOs): the server's presenters return them, the client reads them.

export type SupplyCategory = (typeof SUPPLY_CATEGORIES)[number];

/** One supply as the API sends it. */
export type SupplyDto = {
  id: string;
  position: number;
  category: SupplyCategory;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
  /** The sheet plan's figure a lower sheet count was accepted against, or null. */
  acceptedSheetNeed: number | null;
};

/** `required` is true when any supply with a link is sponsored; `text` falls back to the default wording. */
export type DisclosureDto = { required: boolean; text: string; custom: boolean };

/** GET /tutorials/:id/supplies. */
export type SuppliesDto = { supplies: SupplyDto[]; disclosure: DisclosureDto; abilities: { update: boolean } };

/** What the client may send to change a supply (any field, or its place in the list). */
export type UpdateSupplyInput = z.input<typeof updateSupplySchema>;

/** One supply line checked against the sheet plan of the material it names (shared/supplies/sheet-checks). */
export type SupplySheetCheckDto = {
  supplyId: string;
  supplyName: string;
  material: string;
  sheetLabel: string;
  stated: number;
  needed: number;
  /** ok: enough sheets; short: fewer than the plan needs; accepted: fewer, on purpose. */
  status: 'ok' | 'short' | 'accepted';
  message: string;
  /** The quantity that agrees with the plan, in the line's own wording; null when it already does. */
  fix: { quantity: string } | null;
};

/** GET /tutorials/:id/supply-checks: the cross-checks and the warnings still open (what publishing asks to confirm). */
export type SupplyChecksDto = { checks: SupplySheetCheckDto[]; unresolved: string[]; abilities: { update: boolean } };
