import { pathToFileURL } from 'node:url';
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';

type Step = (args: { context: QueryInterface }) => Promise<void>;

/** Migrations are files in server/migrations, run in name order and recorded in SequelizeMeta. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: {
      glob: ['migrations/*.ts', { cwd: import.meta.dirname }],
      // The default resolver only knows CommonJS; ours are ES modules loaded through tsx or Vite.
      resolve: ({ name, path: file }) => ({
        name,
        up: async (args) => ((await import(pathToFileURL(file!).href)) as { up: Step }).up(args),
        down: async (args) => ((await import(pathToFileURL(file!).href)) as { down: Step }).down(args),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}
