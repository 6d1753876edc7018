import { Material, PieceRow, type Tutorial } from '../models';
import { parseLength, serializeLength } from '@shared/measure';

const L = (s: string) => serializeLength(parseLength(s)!);

/**
 * The demo tutorial's cut list, as a maker would build it from the transcript's mentions: two
 * circles, scored wall and rim strips with notched tabs, and a label with a mat on it. The mat is
 * read out as 2 7/8 in wide on a 3 in panel, so the margin check has something real to flag.
 */
export async function seedDemoCutList(tutorial: Tutorial): Promise<void> {
  if (await PieceRow.findOne({ where: { tutorialId: tutorial.id }, attributes: ['id'] })) return;
  await Material.bulkCreate([
    { tutorialId: tutorial.id, name: 'kraft cardstock', kind: 'cardstock', sheetWidth: L('12'), sheetHeight: L('12'), rotate: true },
    { tutorialId: tutorial.id, name: 'patterned paper', kind: 'patterned paper', sheetWidth: L('12'), sheetHeight: L('12'), rotate: false },
  ]);
  const rows = [
    { name: 'Base circle', material: 'kraft cardstock', quantity: 2, shape: 'circle' as const, width: '6 3/8', height: '6 3/8', saidAtMs: 6000, notes: 'One for the bottom, one to line the lid' },
    { name: 'Wall strip', material: 'kraft cardstock', quantity: 2, shape: 'rect' as const, width: '10 9/16', height: '2 1/2', saidAtMs: 14000, scoreLines: [{ axis: 'height' as const, at: L('1/2'), tab: true }], notes: 'Notch the tab every 1/2 in up to the score line' },
    { name: 'Lid circle', material: 'kraft cardstock', quantity: 1, shape: 'circle' as const, width: '6 7/16', height: '6 7/16', saidAtMs: 40000, notes: 'A little larger than the base so the lid slips over' },
    { name: 'Lid rim strip', material: 'kraft cardstock', quantity: 2, shape: 'rect' as const, width: '10 3/4', height: '1', saidAtMs: 44000, scoreLines: [{ axis: 'height' as const, at: L('1/4'), tab: true }], notes: 'Notch the tab like the wall' },
    { name: 'Label panel', material: 'kraft cardstock', quantity: 1, shape: 'rect' as const, width: '3', height: '2', saidAtMs: 48000, notes: '' },
    { name: 'Label mat', material: 'patterned paper', quantity: 1, shape: 'rect' as const, width: '2 7/8', height: '1 3/4', saidAtMs: 48000, notes: 'Grain runs with the print' },
  ];
  const made: PieceRow[] = [];
  for (const [i, r] of rows.entries()) {
    made.push(await PieceRow.create({ ...r, width: L(r.width), height: L(r.height), tutorialId: tutorial.id, position: i }));
  }
  await made[5].update({ matOnId: made[4].id });
}
