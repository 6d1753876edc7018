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
  .extend({ position: z.number().int().min(0).optional() })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const disclosureSchema = z.object({ disclosure: z.string().trim().max(1000).nullable() });
