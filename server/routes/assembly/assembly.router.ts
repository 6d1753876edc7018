import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import { assemblyChoiceSchema, assemblyUndoSchema } from '@shared/schemas/assembly';
import { route } from '../../lib/route';
import { authorize } from '../../policies';
import { loadTutorial } from '../../services/access';
import { acceptProposals, dropProposals, loadAssembly, runAssembly, undoProposals } from '../../services/assembly';
import { presentAssembly } from '../../presenters/assembly.presenter';

const EDIT_ONLY = 'Only people who can edit this tutorial can assemble it';

/** "Assemble the tutorial": one action proposes chapters, stills, pieces, supplies and the first draft; each is accepted, dropped or undone. */
export function assemblyRouter() {
  const r = Router();

  r.get(
    '/tutorials/:id/assembly',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      res.json(presentAssembly(await loadAssembly(tutorial), abilities));
    }),
  );

  r.post(
    '/tutorials/:id/assembly',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      const { added, notes } = await runAssembly(tutorial);
      res.status(added > 0 ? 201 : 200).json(presentAssembly(await loadAssembly(tutorial, notes), abilities));
    }),
  );

  r.post(
    '/tutorials/:id/assembly/accept',
    route({ params: idParams, body: assemblyChoiceSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      const notes = await acceptProposals(tutorial, user, body.ids);
      res.json(presentAssembly(await loadAssembly(tutorial, notes), abilities));
    }),
  );

  r.post(
    '/tutorials/:id/assembly/drop',
    route({ params: idParams, body: assemblyChoiceSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      await dropProposals(tutorial, body.ids);
      res.json(presentAssembly(await loadAssembly(tutorial), abilities));
    }),
  );

  r.post(
    '/tutorials/:id/assembly/undo',
    route({ params: idParams, body: assemblyUndoSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      await undoProposals(tutorial, user, body.ids);
      res.json(presentAssembly(await loadAssembly(tutorial), abilities));
    }),
  );

  return r;
}
