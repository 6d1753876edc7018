import type { SUPPLY_CATEGORIES } from '@shared/schemas/supply';

export type SupplyCategory = (typeof SUPPLY_CATEGORIES)[number];

export type Supply = {
  id: string;
  position: number;
  category: SupplyCategory;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
};

/** `required` is true when any supply with a link is sponsored; `text` falls back to the default wording. */
export type Disclosure = { required: boolean; text: string; custom: boolean };

export type SuppliesResponse = { supplies: Supply[]; disclosure: Disclosure; abilities: { update: boolean } };

/** What can change on a supply: any of its fields, and its place in the list. */
export type SupplyChange = Partial<Omit<Supply, 'id'>>;
