import { DEFAULT_DISCLOSURE, type DisclosureDto, type createSupplySchema, type updateSupplySchema } from '@shared/schemas/supply';
import type { z } from 'zod';
import { Supply, type Tutorial } from '../models';
import { NotFoundError } from '../lib/errors';
import { appendToList } from './positions';

/** The supplies in list order and, when any link is sponsored, the disclosure that goes with them. */
export async function loadSupplies(tutorial: Tutorial): Promise<{ rows: Supply[]; disclosure: DisclosureDto }> {
  const rows = await Supply.findAll({
    where: { tutorialId: tutorial.id },
    order: [
      ['position', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  const sponsored = rows.some((s) => s.sponsored && s.url);
  return {
    rows,
    disclosure: { required: sponsored, text: tutorial.disclosure ?? DEFAULT_DISCLOSURE, custom: tutorial.disclosure !== null },
  };
}

/** A supply by id, or 404. */
export async function findSupply(id: string): Promise<Supply> {
  const s = await Supply.findByPk(id);
  if (!s) throw new NotFoundError('Supply');
  return s;
}

/** Adds a supply at the end of the list. */
export async function addSupply(tutorial: Tutorial, input: z.output<typeof createSupplySchema>): Promise<Supply> {
  return appendToList(Supply, tutorial.id, (position, transaction) => Supply.create({ ...input, tutorialId: tutorial.id, position }, { transaction }));
}

/** Changes a supply's fields or its place in the list. */
export async function updateSupply(supply: Supply, changes: z.output<typeof updateSupplySchema>): Promise<Supply> {
  // An accepted shortfall was accepted for the count then stated: a new count asks again.
  const requote = changes.quantity !== undefined && changes.quantity !== supply.quantity && changes.acceptedSheetNeed === undefined;
  return supply.update(requote ? { ...changes, acceptedSheetNeed: null } : changes);
}

/** Removes one supply from the list. */
export async function deleteSupply(supply: Supply): Promise<void> {
  await supply.destroy();
}

/** The maker's own disclosure wording; empty goes back to the default. */
export async function setDisclosure(tutorial: Tutorial, text: string | null): Promise<DisclosureDto> {
  await tutorial.update({ disclosure: text || null });
  return (await loadSupplies(tutorial)).disclosure;
}
