import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A supply line may list fewer sheets than the sheet plan on purpose (offcuts, circles nested by
 * hand). The plan's figure the crafter accepted is kept, so the warning stays quiet until the plan
 * needs more than that.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('supplies', 'accepted_sheet_need', { type: DataTypes.INTEGER, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('supplies', 'accepted_sheet_need');
}
