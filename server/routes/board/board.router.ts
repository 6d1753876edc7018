import { Router } from 'express';
import { boardQuery, schedulePublishSchema } from '@shared/schemas/board';
import { idParams } from '@shared/schemas/studio';
import { route } from '../../lib/route';
import { authorize, tutorialAbilities } from '../../policies';
import { loadStudio, loadTutorial } from '../../services/access';
import { loadBoard } from '../../services/board';
import { cancelSchedule, schedulePublish } from '../../services/schedule';
import { presentBoard } from '../../presenters/board.presenter';
import { presentTutorial } from '../../presenters/tutorial.presenter';

/** The studio board, and scheduled publishing of approved tutorials. */
export function boardRouter() {
  const r = Router();

  r.get(
    '/studios/:id/board',
    route({ params: idParams, query: boardQuery }, async ({ params, query, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'readBoard', 'The board is for the studio’s makers and coordinators');
      res.json(presentBoard(await loadBoard(studio, actor, query), abilities));
    }),
  );

  r.put(
    '/tutorials/:id/schedule',
    route({ params: idParams, body: schedulePublishSchema }, async ({ params, body, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      const t = await schedulePublish({ tutorial, abilities, by: user, input: body });
      res.json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  r.delete(
    '/tutorials/:id/schedule',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'read', 'This tutorial is not published yet');
      const t = await cancelSchedule({ tutorial, abilities });
      res.json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  return r;
}
