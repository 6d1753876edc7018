import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import { createSupplySchema, disclosureSchema, updateSupplySchema } from '@shared/schemas/supply';
import { Supply } from '../../models';
import { loadSupplies, presentSupply } from '../../services/supplies';
import { validate } from '../../middlewares/validate';
import { requireUser } from '../../middlewares/authenticate';
import { authorize } from '../../policies';
import { notFound } from '../../lib/http-error';
import { loadTutorial } from '../../services/access';

/** Supplies CRUD under /api. */
export function suppliesRouter() {
  const r = Router();
  r.use(['/tutorials', '/supplies'], requireUser);

  r.get('/tutorials/:id/supplies', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    res.json({ ...(await loadSupplies(tutorial)), abilities: { update: abilities.update } });
  });

  r.post('/tutorials/:id/supplies', validate({ params: idParams, body: createSupplySchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const last = (await Supply.max('position', { where: { tutorialId: tutorial.id } })) as number | null;
    const s = await Supply.create({ ...req.body, tutorialId: tutorial.id, position: (last ?? -1) + 1 });
    res.status(201).json(presentSupply(s));
  });

  r.patch('/supplies/:id', validate({ params: idParams, body: updateSupplySchema }), async (req, res) => {
    const s = await Supply.findByPk(req.params.id as string);
    if (!s) throw notFound('Supply');
    const { abilities } = await loadTutorial(req, s.tutorialId);
    authorize(abilities, 'update');
    await s.update(req.body);
    res.json(presentSupply(s));
  });

  r.delete('/supplies/:id', validate({ params: idParams }), async (req, res) => {
    const s = await Supply.findByPk(req.params.id as string);
    if (!s) throw notFound('Supply');
    const { abilities } = await loadTutorial(req, s.tutorialId);
    authorize(abilities, 'update');
    await s.destroy();
    res.status(204).end();
  });

  r.put('/tutorials/:id/disclosure', validate({ params: idParams, body: disclosureSchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    await tutorial.update({ disclosure: req.body.disclosure || null });
    res.json((await loadSupplies(tutorial)).disclosure);
  });

  return r;
}
