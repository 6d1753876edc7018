import { Router } from 'express';
import type { Request } from 'express';
import { UniqueConstraintError } from 'sequelize';
import { idParams } from '@shared/schemas/studio';
import { createPieceSchema, dismissMentionSchema, materialSchema, sheetPlanQuery, updateMaterialSchema, updatePieceSchema } from '@shared/schemas/piece';
import { inchesNumber, formatLength, type LengthUnit } from '@shared/measure';
import { planSheets } from '@shared/geometry';
import { Material, MentionDismissal, PieceRow, sequelize, type Tutorial } from '../../models';
import type { StoredScoreLine } from '../../models/piece';
import { validate } from '../../middlewares/validate';
import { requireUser } from '../../middlewares/authenticate';
import { authorize } from '../../policies';
import { HttpError, notFound } from '../../lib/http-error';
import { loadTutorial } from '../../services/access';
import { lengthDto, loadCutList, presentMaterial, stockOf, storeLength, tutorialMentions } from '../../services/cut-list';

type PieceBody = {
  name?: string;
  material?: string;
  quantity?: number;
  shape?: 'rect' | 'circle';
  width?: string;
  height?: string;
  scoreLines?: { axis: 'width' | 'height'; at: string; tab?: boolean }[];
  matOnId?: string | null;
  notes?: string;
  saidAtMs?: number | null;
  position?: number;
};

/** Turns typed lengths into exact stored ones; a circle's height is its diameter. */
function pieceChanges(body: PieceBody, unit: LengthUnit, current?: PieceRow) {
  const out: Partial<PieceRow> = {};
  for (const k of ['name', 'material', 'quantity', 'shape', 'matOnId', 'notes', 'saidAtMs', 'position'] as const) {
    if (body[k] !== undefined) (out as Record<string, unknown>)[k] = body[k];
  }
  if (body.width !== undefined) out.width = storeLength(body.width, unit, 'width');
  if (body.height !== undefined) out.height = storeLength(body.height, unit, 'height');
  const shape = body.shape ?? current?.shape ?? 'rect';
  if (shape === 'circle') out.height = out.width ?? current?.width ?? out.height;
  if (body.scoreLines) {
    out.scoreLines = body.scoreLines.map((s, i): StoredScoreLine => ({ axis: s.axis, at: storeLength(s.at, unit, `scoreLines.${i}.at`), ...(s.tab ? { tab: true } : {}) }));
  }
  return out;
}

async function checkMatTarget(tutorial: Tutorial, matOnId: string | null | undefined, selfId?: string) {
  if (!matOnId) return;
  if (matOnId === selfId) throw new HttpError(400, 'matOnId: A piece cannot sit on itself', { issues: [{ path: 'matOnId', message: 'A piece cannot sit on itself' }] });
  const base = await PieceRow.findOne({ where: { id: matOnId, tutorialId: tutorial.id }, attributes: ['id'] });
  if (!base) throw new HttpError(400, 'matOnId: That piece is not in this cut list', { issues: [{ path: 'matOnId', message: 'Not in this cut list' }] });
}

async function loadPieceRow(req: Request, id: string) {
  const row = await PieceRow.findByPk(id);
  if (!row) throw notFound('Piece');
  return { row, ...(await loadTutorial(req, row.tutorialId)) };
}

/** The cut list, its checks, materials, transcript mentions and sheet plan. */
export function piecesRouter() {
  const r = Router();
  r.use(['/tutorials', '/pieces', '/materials'], requireUser);

  r.get('/tutorials/:id/pieces', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const list = await loadCutList(tutorial);
    res.json({ pieces: list.presented, materials: list.materials.map(presentMaterial), precision: tutorial.precision, defaultUnit: tutorial.defaultUnit, abilities: { update: abilities.update } });
  });

  r.get('/tutorials/:id/checks', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const list = await loadCutList(tutorial);
    res.json({ checks: list.presented.flatMap((p) => p.checks.map((c) => ({ ...c, pieceId: p.id, pieceName: p.name }))) });
  });

  r.post('/tutorials/:id/pieces', validate({ params: idParams, body: createPieceSchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update', 'Only people who can edit this tutorial can change its cut list');
    const body = req.body as PieceBody;
    await checkMatTarget(tutorial, body.matOnId);
    const changes = pieceChanges(body, tutorial.defaultUnit);
    const last = (await PieceRow.max('position', { where: { tutorialId: tutorial.id } })) as number | null;
    const row = await PieceRow.create({ ...changes, tutorialId: tutorial.id, position: (last ?? -1) + 1, name: body.name!, width: changes.width!, height: changes.height! });
    const list = await loadCutList(tutorial);
    res.status(201).json(list.presented.find((p) => p.id === row.id));
  });

  r.patch('/pieces/:id', validate({ params: idParams, body: updatePieceSchema }), async (req, res) => {
    const { row, tutorial, abilities } = await loadPieceRow(req, req.params.id as string);
    authorize(abilities, 'update', 'Only people who can edit this tutorial can change its cut list');
    const body = req.body as PieceBody;
    await checkMatTarget(tutorial, body.matOnId, row.id);
    await row.update(pieceChanges(body, tutorial.defaultUnit, row));
    const list = await loadCutList(tutorial);
    res.json(list.presented.find((p) => p.id === row.id));
  });

  r.delete('/pieces/:id', validate({ params: idParams }), async (req, res) => {
    const { row, abilities } = await loadPieceRow(req, req.params.id as string);
    authorize(abilities, 'update');
    await row.destroy();
    res.status(204).end();
  });

  r.get('/tutorials/:id/mentions', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    res.json(await tutorialMentions(tutorial));
  });

  r.post('/tutorials/:id/mentions/dismiss', validate({ params: idParams, body: dismissMentionSchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const { key, dismissed } = req.body as { key: string; dismissed: boolean };
    if (dismissed) await MentionDismissal.findOrCreate({ where: { tutorialId: tutorial.id, mentionKey: key }, defaults: { tutorialId: tutorial.id, mentionKey: key } });
    else await MentionDismissal.destroy({ where: { tutorialId: tutorial.id, mentionKey: key } });
    res.json({ key, dismissed });
  });

  r.get('/tutorials/:id/materials', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const rows = await Material.findAll({ where: { tutorialId: tutorial.id }, order: [['name', 'ASC']] });
    res.json({ materials: rows.map(presentMaterial) });
  });

  r.post('/tutorials/:id/materials', validate({ params: idParams, body: materialSchema }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'update');
    const u = tutorial.defaultUnit;
    try {
      const m = await Material.create({
        tutorialId: tutorial.id,
        name: req.body.name,
        kind: req.body.kind,
        sheetWidth: storeLength(req.body.sheetWidth, u, 'sheetWidth'),
        sheetHeight: storeLength(req.body.sheetHeight, u, 'sheetHeight'),
        rotate: req.body.rotate,
      });
      res.status(201).json(presentMaterial(m));
    } catch (e) {
      if (e instanceof UniqueConstraintError) throw new HttpError(409, `There is already a material called “${req.body.name}”`, { issues: [{ path: 'name', message: 'Already in the list' }] });
      throw e;
    }
  });

  r.patch('/materials/:id', validate({ params: idParams, body: updateMaterialSchema }), async (req, res) => {
    const m = await Material.findByPk(req.params.id as string);
    if (!m) throw notFound('Material');
    const { tutorial, abilities } = await loadTutorial(req, m.tutorialId);
    authorize(abilities, 'update');
    const u = tutorial.defaultUnit;
    const b = req.body as { name?: string; kind?: string; sheetWidth?: string; sheetHeight?: string; rotate?: boolean };
    await sequelize.transaction(async (transaction) => {
      // Renaming a material carries its pieces along.
      if (b.name && b.name !== m.name) await PieceRow.update({ material: b.name }, { where: { tutorialId: tutorial.id, material: m.name }, transaction });
      await m.update(
        {
          ...(b.name ? { name: b.name } : {}),
          ...(b.kind ? { kind: b.kind } : {}),
          ...(b.sheetWidth ? { sheetWidth: storeLength(b.sheetWidth, u, 'sheetWidth') } : {}),
          ...(b.sheetHeight ? { sheetHeight: storeLength(b.sheetHeight, u, 'sheetHeight') } : {}),
          ...(b.rotate !== undefined ? { rotate: b.rotate } : {}),
        },
        { transaction },
      );
    });
    res.json(presentMaterial(m));
  });

  r.delete('/materials/:id', validate({ params: idParams }), async (req, res) => {
    const m = await Material.findByPk(req.params.id as string);
    if (!m) throw notFound('Material');
    const { abilities } = await loadTutorial(req, m.tutorialId);
    authorize(abilities, 'update');
    await m.destroy();
    res.status(204).end();
  });

  r.get('/tutorials/:id/sheet-plan', validate({ params: idParams, query: sheetPlanQuery }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const { kits, spares } = req.query as unknown as { kits: number; spares: number };
    res.json({ kits, spares, materials: await sheetPlans(tutorial, kits, spares) });
  });

  return r;
}

/** One sheet plan per material (pieces without a material are grouped as "unassigned"). */
export async function sheetPlans(tutorial: Tutorial, kits: number, spares: number) {
  const list = await loadCutList(tutorial);
  const groups = new Map<string, typeof list.pieces>();
  for (const p of list.pieces) groups.set(p.material, [...(groups.get(p.material) ?? []), p]);
  return [...groups.entries()].map(([name, pieces]) => {
    const { material: m, width, height, rotate } = stockOf(list.materials, name);
    const sheet = { width, height };
    // A circle is cut from its square on a trimmer, then by hand.
    const plan = planSheets({ sheet, rotate, kits, spares, pieces: pieces.map((p) => ({ name: p.name, width: p.width, height: p.height, qty: p.quantity })) });
    return {
      material: name || 'unassigned',
      materialId: m?.id ?? null,
      sheet: { width: lengthDto(sheet.width), height: lengthDto(sheet.height), label: `${formatLength(sheet.width)} x ${formatLength(sheet.height)}` },
      rotate,
      sheets: plan.sheets,
      areaLowerBound: plan.areaLowerBound,
      waste: plan.waste,
      placements: plan.placements.map((pl) => ({
        sheet: pl.sheet,
        name: pl.name,
        x: inchesNumber(pl.x),
        y: inchesNumber(pl.y),
        width: inchesNumber(pl.width),
        height: inchesNumber(pl.height),
        rotated: pl.rotated,
        shape: pieces[pl.piece]?.shape ?? 'rect',
      })),
      errors: plan.errors,
    };
  });
}
