import { Router } from 'express';
import { createTutorialSchema, transitionSchema, updateTutorialSchema } from '@shared/schemas/tutorial';
import { idParams } from '@shared/schemas/studio';
import { route } from '../../lib/route';
import { authorize, tutorialAbilities } from '../../policies';
import { loadStudio, loadTutorial } from '../../services/access';
import { moveTutorial, stateHistory } from '../../services/review';
import { checklistFor } from '../../services/review-checklist';
import { presentHistory } from '../../presenters/review.presenter';
import { createTutorial, deleteTutorial, updateTutorial } from '../../services/tutorials';
import { presentTutorial } from '../../presenters/tutorial.presenter';

/** Create, read, rename, move through review and delete tutorials. */
export function tutorialsRouter() {
  const r = Router();

  r.post(
    '/',
    route({ body: createTutorialSchema }, async ({ body, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, body.studioId);
      authorize(abilities, 'createTutorial', 'Only owners, coordinators and makers can create tutorials');
      const t = await createTutorial(studio, user, body);
      res.status(201).json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  r.get(
    '/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id, { withAuthor: true });
      authorize(abilities, 'read', 'This tutorial is not published yet');
      res.json(presentTutorial(tutorial, abilities));
    }),
  );

  r.patch(
    '/:id',
    route({ params: idParams, body: updateTutorialSchema }, async ({ params, body, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', 'You can only change tutorials you made');
      const t = await updateTutorial(tutorial, body);
      res.json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  r.post(
    '/:id/state',
    route({ params: idParams, body: transitionSchema }, async ({ params, body, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      const t = await moveTutorial({ tutorial, abilities, action: body.action, by: user, note: body.note, confirmWarnings: body.confirmWarnings });
      res.json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  // Every state move: who, when, from, to and their note (shown on the tutorial's Publish section).
  r.get(
    '/:id/history',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readComments', 'The review history is for the studio’s makers and coordinators');
      res.json(presentHistory(await stateHistory(tutorial.id)));
    }),
  );

  // What the maker and the coordinator check before approval.
  r.get(
    '/:id/checklist',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readComments', 'The review checklist is for the studio’s makers and coordinators');
      res.json(await checklistFor(tutorial));
    }),
  );

  r.delete(
    '/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'delete', 'Only the studio owner or the tutorial’s maker can delete it');
      await deleteTutorial(tutorial);
      res.status(204).end();
    }),
  );

  return r;
}
