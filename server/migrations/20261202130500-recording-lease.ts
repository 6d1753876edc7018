import type { QueryInterface } from 'sequelize';

/**
 * A processing run's heartbeat becomes a lease: each beat says how long the run vouches for itself
 * ("alive until"), so a process with a short staleness setting never takes over the work of one that
 * beats less often (they used to compare a bare heartbeat against their own window). A heartbeat
 * already written becomes a lease of the default 60 s.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.renameColumn('recordings', 'heartbeat_at', 'lease_until');
  await qi.sequelize.query(`UPDATE recordings SET lease_until = lease_until + interval '60 seconds' WHERE lease_until IS NOT NULL`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`UPDATE recordings SET lease_until = lease_until - interval '60 seconds' WHERE lease_until IS NOT NULL`);
  await qi.renameColumn('recordings', 'lease_until', 'heartbeat_at');
}
