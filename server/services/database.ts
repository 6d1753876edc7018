import { Sequelize } from 'sequelize';
import { config } from '../config';
import { createMigrator } from '../migrator';

/**
 * Runs `fn` with a connection of its own, closed after, so migrating never closes the app's
 * shared connection pool (the server may start right after in the same process).
 */
async function withOwnConnection<T>(fn: (s: Sequelize) => Promise<T>): Promise<T> {
  const s = new Sequelize(config.databaseUrl, { dialect: 'postgres', logging: false, define: { underscored: true } });
  try {
    return await fn(s);
  } finally {
    await s.close();
  }
}

/** Applies pending migrations; returns their names. */
export function migrate(): Promise<string[]> {
  return withOwnConnection(async (s) => (await createMigrator(s).up()).map((m) => m.name));
}

/** Reverts every migration (used by db:reset). */
export function migrateDownAll(): Promise<void> {
  return withOwnConnection(async (s) => {
    await createMigrator(s).down({ to: 0 });
  });
}
