import type { ModelStatic, Model, Transaction } from 'sequelize';
import { sequelize } from '../models';

type Positioned = Model & { position: number; tutorialId: string };

/** The position after the last row of a tutorial's list (0 for the first), so a new row goes at the end. */
export async function endPosition<M extends Positioned>(model: ModelStatic<M>, tutorialId: string, transaction?: Transaction): Promise<number> {
  const last = (await model.max('position', { where: { tutorialId } as never, transaction })) as number | null;
  return (last ?? -1) + 1;
}

/** Takes the list's advisory lock for the rest of the transaction (see `appendToList`). */
export async function lockList<M extends Positioned>(model: ModelStatic<M>, tutorialId: string, transaction: Transaction): Promise<void> {
  await sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `${model.tableName}:${tutorialId}` }, transaction });
}

/**
 * Creates a row at the end of a tutorial's list. Two adds at the same moment would both read the
 * same last position, so the read and the insert run under a transaction-scoped advisory lock on
 * the list (table and tutorial): the second waits for the first and lands after it. The lock does
 * not touch the tutorial's row, so saves of the tutorial itself never wait on it.
 */
export function appendToList<M extends Positioned>(
  model: ModelStatic<M>,
  tutorialId: string,
  create: (position: number, transaction: Transaction) => Promise<M>,
): Promise<M> {
  return sequelize.transaction(async (transaction) => {
    await lockList(model, tutorialId, transaction);
    return create(await endPosition(model, tutorialId, transaction), transaction);
  });
}
