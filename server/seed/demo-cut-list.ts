import { Material, PieceRow, type Tutorial } from '../models';
import { defaultGrain } from '@shared/geometry';
import { parseLength, serializeLength } from '@shared/measure';
import { DEMO_MATERIALS, DEMO_PIECE_ROWS } from './demo-pieces';

const L = (s: string) => serializeLength(parseLength(s)!);

/** Seeds the demo tutorial's materials and cut list (once). */
export async function seedDemoCutList(tutorial: Tutorial): Promise<void> {
  if (await PieceRow.findOne({ where: { tutorialId: tutorial.id }, attributes: ['id'] })) return;
  await Material.bulkCreate(DEMO_MATERIALS.map((m) => ({ ...m, tutorialId: tutorial.id })));
  const rows = DEMO_PIECE_ROWS;
  const made: PieceRow[] = [];
  for (const [i, r] of rows.entries()) {
    made.push(await PieceRow.create({ ...r, grain: defaultGrain(r), width: L(r.width), height: L(r.height), tutorialId: tutorial.id, position: i }));
  }
  await made[5].update({ matOnId: made[4].id });
}
