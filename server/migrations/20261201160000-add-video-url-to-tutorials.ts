import { DataTypes, type QueryInterface } from 'sequelize';

/** The address of the published video (on whichever video site the maker uses), for handouts and descriptions. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('tutorials', 'video_url', { type: DataTypes.TEXT, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('tutorials', 'video_url');
}
