import type { Model, ModelStatic, Transaction } from 'sequelize';
import { sequelize } from '../db';
import { Article } from './article';
import { Chapter } from './chapter';
import { Material } from './material';
import { PieceRow } from './piece';
import { Recording } from './recording';
import { Still } from './still';
import { Supply } from './supply';
import { Tutorial } from './tutorial';

/**
 * An edit to anything readers see of a published tutorial starts an update (DESIGN.md T4): the
 * tutorial stays published, readers keep the approved version, and `update_state` becomes
 * "draft" until the update is sent for review. Watching the rows here, rather than calling a
 * function from every service and router that writes them, means a new way of editing cannot
 * forget it. One UPDATE on the tutorial's primary key, in the writer's own transaction (the
 * write-up's save already holds the tutorial's row lock).
 */
const START_UPDATE = `UPDATE tutorials SET update_state = 'draft', updated_at = now() WHERE state = 'published' AND update_state IS NULL AND id = `;

async function startUpdate(tutorialId: string | null | undefined, transaction: Transaction | null | undefined): Promise<void> {
  if (!tutorialId) return;
  await sequelize.query(`${START_UPDATE}:id`, { replacements: { id: tutorialId }, transaction: transaction ?? undefined });
}

async function startUpdateByRecording(recordingId: string | null | undefined, transaction: Transaction | null | undefined): Promise<void> {
  if (!recordingId) return;
  await sequelize.query(`${START_UPDATE}(SELECT tutorial_id FROM recordings WHERE id = :id)`, {
    replacements: { id: recordingId },
    transaction: transaction ?? undefined,
  });
}

type Options = { transaction?: Transaction | null; where?: unknown };

/** Calls `onEdit` after a row is created, destroyed, or updated in one of `fields` (any field when omitted). */
function watch<M extends Model>(model: ModelStatic<M>, owner: (row: M, o: Options) => Promise<void>, fields?: readonly string[]): void {
  const changedWatched = (row: M) => {
    const changed = row.changed();
    if (!changed) return false;
    return !fields || changed.some((f) => fields.includes(f));
  };
  model.addHook('afterCreate', (row: M, o: Options) => owner(row, o));
  model.addHook('afterDestroy', (row: M, o: Options) => owner(row, o));
  model.addHook('afterUpdate', async (row: M, o: Options) => {
    if (changedWatched(row)) await owner(row, o);
  });
  // Bulk changes scoped to one tutorial (a material renamed renames its pieces' material).
  const bulk = async (o: Options) => {
    const where = o.where as { tutorialId?: unknown } | undefined;
    if (typeof where?.tutorialId === 'string') await startUpdate(where.tutorialId, o.transaction);
  };
  model.addHook('afterBulkUpdate', bulk);
  model.addHook('afterBulkDestroy', bulk);
}

let installed = false;

/** Installs the hooks once (models/index.ts calls it after the models are set up). */
export function watchReaderEdits(): void {
  if (installed) return;
  installed = true;
  const byTutorial = (row: { tutorialId: string }, o: Options) => startUpdate(row.tutorialId, o.transaction);
  const byRecording = (row: { recordingId: string }, o: Options) => startUpdateByRecording(row.recordingId, o.transaction);
  watch(Article, byTutorial, ['doc']);
  watch(PieceRow, byTutorial, ['name', 'material', 'quantity', 'shape', 'params', 'grain', 'width', 'height', 'scoreLines', 'matOnId', 'notes', 'position']);
  // A sheet's price is the kit planner's business, not the readers'.
  watch(Material, byTutorial, ['name', 'kind', 'sheetWidth', 'sheetHeight', 'rotate', 'grain']);
  watch(Supply, byTutorial);
  watch(Chapter, byRecording, ['title', 'startMs']);
  watch(Still, byRecording, ['caption', 'alt']);
  // A new recording (or the newest one removed) changes the chapters and stills the outputs use.
  Recording.addHook('afterCreate', (row: Recording, o: Options) => startUpdate(row.tutorialId, o.transaction));
  Recording.addHook('afterDestroy', (row: Recording, o: Options) => startUpdate(row.tutorialId, o.transaction));
  Tutorial.addHook('afterUpdate', async (t: Tutorial, o: Options) => {
    const changed = t.changed() || [];
    if (!changed.some((f) => ['title', 'videoUrl', 'precision', 'disclosure'].includes(f))) return;
    await startUpdate(t.id, o.transaction);
    // The caller answers with this instance: let it say what the row now says.
    if (t.state === 'published' && !t.updateState) t.setDataValue('updateState', 'draft');
  });
}
