import { Router } from 'express';
import { createBriefSchema, listBriefsQuery, setTargetSchema, updateBriefSchema, type MonthlyTargetsDto } from '@shared/schemas/brief';
import { idParams, memberParams } from '@shared/schemas/studio';
import { route } from '../../lib/route';
import { authorize, briefAbilities, tutorialAbilities } from '../../policies';
import { loadBrief, loadStudio, loadTutorial } from '../../services/access';
import { assignableMakers, briefOfTutorial, createBrief, listBriefs, listTargets, setTarget, startTutorialFromBrief, updateBrief } from '../../services/briefs';
import { presentBrief, presentBriefList, presentTarget } from '../../presenters/brief.presenter';
import { presentTutorial } from '../../presenters/tutorial.presenter';

/** Briefs (a coordinator's assignments to makers) and each maker's monthly target. */
export function briefsRouter() {
  const r = Router();

  r.get(
    '/studios/:id/briefs',
    route({ params: idParams, query: listBriefsQuery }, async ({ params, query, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'readBoard', 'Briefs are for the studio’s makers and coordinators');
      const rows = await listBriefs(studio, { seeAll: abilities.createBrief, userId: user.id, ...query });
      const makers = abilities.createBrief ? await assignableMakers(studio) : [];
      res.json(
        presentBriefList(
          rows.map((brief) => ({ brief, abilities: briefAbilities(actor, brief) })),
          makers,
          { createBrief: abilities.createBrief, setTargets: abilities.setTargets },
        ),
      );
    }),
  );

  r.post(
    '/studios/:id/briefs',
    route({ params: idParams, body: createBriefSchema }, async ({ params, body, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'createBrief', 'Only coordinators and owners hand out briefs');
      const brief = await createBrief(studio, user, body);
      res.status(201).json(presentBrief(brief, briefAbilities(actor, brief)));
    }),
  );

  r.get(
    '/briefs/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { brief, abilities } = await loadBrief(user, params.id);
      authorize(abilities, 'read', 'This brief is for another maker');
      res.json(presentBrief(brief, abilities));
    }),
  );

  r.patch(
    '/briefs/:id',
    route({ params: idParams, body: updateBriefSchema }, async ({ params, body, user, res }) => {
      const { brief, actor, abilities } = await loadBrief(user, params.id);
      authorize(abilities, 'update', 'Only coordinators and owners change briefs');
      const b = await updateBrief(brief, user, body);
      res.json(presentBrief(b, briefAbilities(actor, b)));
    }),
  );

  r.delete(
    '/briefs/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { brief, abilities } = await loadBrief(user, params.id);
      authorize(abilities, 'delete', 'Only coordinators and owners withdraw briefs');
      // A tutorial started from it stays; it just no longer points at a brief.
      await brief.destroy();
      res.status(204).end();
    }),
  );

  r.post(
    '/briefs/:id/tutorial',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { brief, actor, abilities } = await loadBrief(user, params.id);
      authorize(abilities, 'startTutorial', 'Only the maker it is for, or a coordinator, starts this brief’s tutorial');
      const t = await startTutorialFromBrief(brief);
      res.status(201).json(presentTutorial(t, tutorialAbilities(actor, t)));
    }),
  );

  r.get(
    '/tutorials/:id/brief',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      // A brief's notes are the team's, like the workspace: a student reading the published tutorial does not see them.
      authorize(abilities, 'readDraft', 'The brief is for the people working on this tutorial');
      const brief = await briefOfTutorial(tutorial);
      res.json({ brief: brief ? presentBrief(brief, briefAbilities(actor, brief)) : null });
    }),
  );

  r.get(
    '/studios/:id/targets',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'readBoard', 'Targets are for the studio’s makers and coordinators');
      const answer: MonthlyTargetsDto = { targets: (await listTargets(studio)).map(presentTarget), abilities: { setTargets: abilities.setTargets } };
      res.json(answer);
    }),
  );

  r.put(
    '/studios/:id/targets/:userId',
    route({ params: memberParams, body: setTargetSchema }, async ({ params, body, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'setTargets', 'Only coordinators and owners set targets');
      res.json(presentTarget(await setTarget(studio, params.userId, body.perMonth)));
    }),
  );

  return r;
}
