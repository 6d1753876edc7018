import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * When a worker last said it was still processing a recording. A recording left "processing"
 * with an old heartbeat was being worked on by a process that died: it is queued again.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('recordings', 'heartbeat_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('recordings', 'heartbeat_at');
}
