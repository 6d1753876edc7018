import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Which transcript mention made a piece, and which score mentions added its score lines: a used
 * mention shows where it went, stops counting as "to go through", and is not made twice by
 * "Make pieces from all" or by assembling the tutorial again.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('pieces', 'mention_key', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('pieces', 'score_mention_keys', { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
  await qi.addIndex('pieces', ['tutorial_id', 'mention_key'], { name: 'pieces_tutorial_mention_key' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('pieces', 'pieces_tutorial_mention_key');
  await qi.removeColumn('pieces', 'score_mention_keys');
  await qi.removeColumn('pieces', 'mention_key');
}
