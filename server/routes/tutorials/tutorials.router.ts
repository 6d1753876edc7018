import { Router } from 'express';
import { createTutorialSchema, TRANSITIONS, transitionSchema, updateTutorialSchema, type Transition } from '@shared/schemas/tutorial';
import { notifyStateChange } from '../../services/review';
import { idParams } from '@shared/schemas/studio';
import { Tutorial, User } from '../../models';
import { validate } from '../../middlewares/validate';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { authorize, tutorialAbilities } from '../../policies';
import { loadStudio, loadTutorial } from '../../services/access';
import { uniqueTutorialSlug } from '../../services/studios';
import { presentTutorial } from './tutorial.presenter';
import { HttpError } from '../../lib/http-error';
import { STATE_LABELS, type TutorialState } from '@shared/schemas/tutorial';

/** Create, read, rename and delete tutorials. */
export function tutorialsRouter() {
  const r = Router();
  r.use(requireUser);

  r.post('/', validate({ body: createTutorialSchema }), async (req, res) => {
    const { studio, actor, abilities } = await loadStudio(req, req.body.studioId);
    authorize(abilities, 'createTutorial', 'Only owners, coordinators and makers can create tutorials');
    const t = await Tutorial.create({
      studioId: studio.id,
      authorId: currentUser(req).id,
      title: req.body.title,
      slug: await uniqueTutorialSlug(studio.id, req.body.title),
      dueDate: req.body.dueDate ?? null,
    });
    res.status(201).json(presentTutorial(t, tutorialAbilities(actor, t)));
  });

  r.get('/:id', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read', 'This tutorial is not published yet');
    await tutorial.reload({ include: [{ model: User, as: 'author', attributes: ['id', 'name'] }] });
    res.json(presentTutorial(tutorial, abilities));
  });

  r.patch('/:id', validate({ params: idParams, body: updateTutorialSchema }), async (req, res) => {
    const { tutorial, actor, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update', 'You can only change tutorials you made');
    const changes = { ...req.body };
    if (changes.title && changes.title !== tutorial.title && tutorial.state !== 'published') {
      // A published tutorial keeps its public address; drafts follow their title.
      changes.slug = await uniqueTutorialSlug(tutorial.studioId, changes.title, tutorial.id);
    }
    await tutorial.update(changes);
    res.json(presentTutorial(tutorial, tutorialAbilities(actor, tutorial)));
  });

  r.post('/:id/state', validate({ params: idParams, body: transitionSchema }), async (req, res) => {
    const { tutorial, actor, abilities } = await loadTutorial(req, req.params.id as string);
    const action = req.body.action as Transition;
    const step = TRANSITIONS[action];
    if (!(step.from as readonly string[]).includes(tutorial.state)) {
      throw new HttpError(409, `A tutorial that is ${STATE_LABELS[tutorial.state as TutorialState]} cannot be moved with “${step.label}”`);
    }
    authorize(abilities, action, action === 'submit' ? 'Only the maker or a coordinator can send it for review' : 'Only coordinators and owners review and publish');
    const from = tutorial.state;
    await tutorial.update({ state: step.to, publishedAt: step.to === 'published' ? new Date() : tutorial.publishedAt });
    await notifyStateChange({ tutorial, from, by: currentUser(req), note: req.body.note });
    res.json(presentTutorial(tutorial, tutorialAbilities(actor, tutorial)));
  });

  r.delete('/:id', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'delete', 'Only the studio owner or the tutorial’s maker can delete it');
    await tutorial.destroy();
    res.status(204).end();
  });

  return r;
}
