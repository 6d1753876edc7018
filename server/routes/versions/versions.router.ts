import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import { compareQuery } from '@shared/schemas/version';
import { openRoute, route } from '../../lib/route';
import { authorize } from '../../policies';
import { loadExportable, loadTutorial } from '../../services/access';
import { compareVersions } from '../../services/versions/compare';
import { readerView } from '../../services/versions/reader';
import { listVersions } from '../../services/versions/versions';
import { presentVersions } from '../../presenters/version.presenter';

/**
 * What is published stays as approved (DESIGN.md T4), mounted at /api/tutorials: the version
 * readers see (the reader's view), the kept versions, and two of them compared side by side.
 */
export function versionsRouter() {
  const r = Router();

  // Anyone who may read the published tutorial: it is public, like its page.
  r.get(
    '/:id/published',
    openRoute({ params: idParams }, async ({ params, user, res }) => {
      const tutorial = await loadExportable(user, params.id);
      res.json(await readerView(tutorial));
    }),
  );

  r.get(
    '/:id/versions',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Only the people working on this tutorial see its versions');
      res.json(presentVersions(tutorial, await listVersions(tutorial)));
    }),
  );

  r.get(
    '/:id/compare',
    route({ params: idParams, query: compareQuery }, async ({ params, query, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Only the people working on this tutorial compare its versions');
      res.json(await compareVersions(tutorial, query));
    }),
  );

  return r;
}
