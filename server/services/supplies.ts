import { DEFAULT_DISCLOSURE } from '@shared/schemas/supply';
import { Supply, type Tutorial } from '../models';

/** A supply as the API shows it. */
export const presentSupply = (s: Supply) => ({
  id: s.id,
  position: s.position,
  category: s.category,
  name: s.name,
  quantity: s.quantity,
  note: s.note,
  url: s.url,
  sponsored: s.sponsored,
  discountCode: s.discountCode,
});

/** The supplies and, when any link is sponsored, the disclosure that goes with them. */
export async function loadSupplies(tutorial: Tutorial) {
  const rows = await Supply.findAll({ where: { tutorialId: tutorial.id }, order: [['position', 'ASC'], ['createdAt', 'ASC']] });
  const sponsored = rows.some((s) => s.sponsored && s.url);
  return {
    supplies: rows.map(presentSupply),
    disclosure: { required: sponsored, text: tutorial.disclosure ?? DEFAULT_DISCLOSURE, custom: tutorial.disclosure !== null },
  };
}
