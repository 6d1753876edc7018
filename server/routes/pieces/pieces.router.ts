import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import {
  createPieceSchema,
  dismissMentionSchema,
  makePiecesSchema,
  materialSchema,
  mentionScoreLinesSchema,
  sheetPlanQuery,
  updateMaterialSchema,
  updatePieceSchema,
  type MaterialsDto,
  type MentionDismissedDto,
} from '@shared/schemas/piece';
import { route } from '../../lib/route';
import { sheetPlanJson } from '../../services/sheet-plan';
import { authorize } from '../../policies';
import { loadTutorial } from '../../services/access';
import {
  addMaterial,
  addPiece,
  addScoreLinesFromMention,
  deleteMaterial,
  deletePiece,
  makePiecesFromMentions,
  findMaterial,
  findPiece,
  listMaterials,
  loadCutList,
  setMentionDismissed,
  tutorialMentions,
  updateMaterial,
  updatePiece,
} from '../../services/cut-list';
import { presentChecks, presentCutList, presentMadePieces, presentMaterial, presentMentions, presentPiece } from '../../presenters/cut-list.presenter';

const EDIT_ONLY = 'Only people who can edit this tutorial can change its cut list';

/** The cut list, its checks, materials, transcript mentions and sheet plan. */
export function piecesRouter() {
  const r = Router();

  r.get(
    '/tutorials/:id/pieces',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json(presentCutList(await loadCutList(tutorial), tutorial, abilities));
    }),
  );

  r.get(
    '/tutorials/:id/checks',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json(presentChecks(await loadCutList(tutorial)));
    }),
  );

  r.post(
    '/tutorials/:id/pieces',
    route({ params: idParams, body: createPieceSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      const row = await addPiece(tutorial, body);
      res.status(201).json(presentPiece(await loadCutList(tutorial), row.id));
    }),
  );

  r.patch(
    '/pieces/:id',
    route({ params: idParams, body: updatePieceSchema }, async ({ params, body, user, res }) => {
      const row = await findPiece(params.id);
      const { tutorial, abilities } = await loadTutorial(user, row.tutorialId);
      authorize(abilities, 'update', EDIT_ONLY);
      await updatePiece(tutorial, row, body);
      res.json(presentPiece(await loadCutList(tutorial), row.id));
    }),
  );

  r.delete(
    '/pieces/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const row = await findPiece(params.id);
      const { abilities } = await loadTutorial(user, row.tutorialId);
      authorize(abilities, 'update');
      await deletePiece(row);
      res.status(204).end();
    }),
  );

  r.get(
    '/tutorials/:id/mentions',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json(presentMentions(await tutorialMentions(tutorial)));
    }),
  );

  r.post(
    '/tutorials/:id/mentions/dismiss',
    route({ params: idParams, body: dismissMentionSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      await setMentionDismissed(tutorial, body.key, body.dismissed);
      res.json({ key: body.key, dismissed: body.dismissed } satisfies MentionDismissedDto);
    }),
  );

  r.post(
    '/tutorials/:id/mentions/pieces',
    route({ params: idParams, body: makePiecesSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      const made = await makePiecesFromMentions(tutorial, body);
      res.status(made.made.length > 0 ? 201 : 200).json(presentMadePieces(await loadCutList(tutorial), made));
    }),
  );

  r.post(
    '/tutorials/:id/mentions/score-lines',
    route({ params: idParams, body: mentionScoreLinesSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', EDIT_ONLY);
      const row = await addScoreLinesFromMention(tutorial, body);
      res.json(presentPiece(await loadCutList(tutorial), row.id));
    }),
  );

  r.get(
    '/tutorials/:id/materials',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ materials: (await listMaterials(tutorial)).map(presentMaterial) } satisfies MaterialsDto);
    }),
  );

  r.post(
    '/tutorials/:id/materials',
    route({ params: idParams, body: materialSchema }, async ({ params, body, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update');
      res.status(201).json(presentMaterial(await addMaterial(tutorial, body)));
    }),
  );

  r.patch(
    '/materials/:id',
    route({ params: idParams, body: updateMaterialSchema }, async ({ params, body, user, res }) => {
      const m = await findMaterial(params.id);
      const { tutorial, abilities } = await loadTutorial(user, m.tutorialId);
      authorize(abilities, 'update');
      res.json(presentMaterial(await updateMaterial(tutorial, m, body)));
    }),
  );

  r.delete(
    '/materials/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const m = await findMaterial(params.id);
      const { abilities } = await loadTutorial(user, m.tutorialId);
      authorize(abilities, 'update');
      await deleteMaterial(m);
      res.status(204).end();
    }),
  );

  r.get(
    '/tutorials/:id/sheet-plan',
    route({ params: idParams, query: sheetPlanQuery }, async ({ params, query, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      // already JSON: a large plan is planned and serialized in the planning thread
      res.type('application/json').send(await sheetPlanJson(tutorial, query.kits, query.spares));
    }),
  );

  return r;
}
