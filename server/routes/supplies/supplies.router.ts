import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import { createSupplySchema, disclosureSchema, updateSupplySchema } from '@shared/schemas/supply';
import { route } from '../../lib/route';
import { authorize } from '../../policies';
import { loadTutorial } from '../../services/access';
import { addSupply, deleteSupply, findSupply, loadSupplies, setDisclosure, updateSupply } from '../../services/supplies';
import { presentSupplies, presentSupply } from '../../presenters/supply.presenter';
import { supplyChecks } from '../../services/supply-checks';
import type { SupplyChecksDto } from '@shared/schemas/supply';

/**
 * Supplies under /api. The model for every router: each handler parses (the `route` schemas),
 * loads (404), authorizes (403), calls a service and presents a DTO from shared/schemas.
 */
export function suppliesRouter() {
  const r = Router();

  r.get(
    '/tutorials/:id/supplies',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json(presentSupplies(await loadSupplies(tutorial), abilities));
    }),
  );

  // The supplies' sheet counts against the sheet plan (the Supplies and Publish sections' warnings).
  r.get(
    '/tutorials/:id/supply-checks',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'read');
      const answer: SupplyChecksDto = { ...(await supplyChecks(tutorial)), abilities: { update: abilities.update } };
      res.json(answer);
    }),
  );

  r.post(
    '/tutorials/:id/supplies',
    route({ params: idParams, body: createSupplySchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      res.status(201).json(presentSupply(await addSupply(tutorial, body)));
    }),
  );

  r.patch(
    '/supplies/:id',
    route({ params: idParams, body: updateSupplySchema }, async ({ params, body, user, res }) => {
      const supply = await findSupply(params.id);
      const { abilities } = await loadTutorial(user, supply.tutorialId);
      authorize(abilities, 'update');
      res.json(presentSupply(await updateSupply(supply, body)));
    }),
  );

  r.delete(
    '/supplies/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const supply = await findSupply(params.id);
      const { abilities } = await loadTutorial(user, supply.tutorialId);
      authorize(abilities, 'update');
      await deleteSupply(supply);
      res.status(204).end();
    }),
  );

  r.put(
    '/tutorials/:id/disclosure',
    route({ params: idParams, body: disclosureSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      res.json(await setDisclosure(tutorial, body.disclosure));
    }),
  );

  return r;
}
