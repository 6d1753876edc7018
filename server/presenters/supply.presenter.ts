import type { DisclosureDto, SuppliesDto, SupplyCategory, SupplyDto } from '@shared/schemas/supply';
import type { Supply } from '../models';
import type { TutorialAbilities } from '../policies';

/** A supply as the API shows it. */
export function presentSupply(s: Supply): SupplyDto {
  return {
    id: s.id,
    position: s.position,
    category: s.category as SupplyCategory,
    name: s.name,
    quantity: s.quantity,
    note: s.note,
    url: s.url,
    sponsored: s.sponsored,
    discountCode: s.discountCode,
    acceptedSheetNeed: s.acceptedSheetNeed ?? null,
  };
}

/** The Supplies section's read: the list, its disclosure and whether the caller may edit. */
export function presentSupplies(list: { rows: Supply[]; disclosure: DisclosureDto }, abilities: TutorialAbilities): SuppliesDto {
  return { supplies: list.rows.map(presentSupply), disclosure: list.disclosure, abilities: { update: abilities.update } };
}
