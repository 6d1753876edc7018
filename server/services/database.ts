import { sequelize } from '../models';
import { createMigrator } from '../migrator';

/** Applies pending migrations; returns their names. */
export async function migrate(): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}

/** Reverts every migration (used by db:reset). */
export async function migrateDownAll(): Promise<void> {
  await createMigrator(sequelize).down({ to: 0 });
}
