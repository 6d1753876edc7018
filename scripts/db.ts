/** Database chores: `npm run db:start|db:stop|db:migrate|db:reset|db:seed`, and `db:migration -- --name add-x-to-y`. */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { APP_NEEDS, ensureDebianPackages } from './lib/system';
import { PROJECT_ROOT, ensureDatabase, startCluster, stopCluster } from './lib/cluster';
import { appEnv } from './lib/env';

const [command, ...rest] = process.argv.slice(2);

async function withDatabase<T>(fn: () => Promise<T>): Promise<T> {
  ensureDebianPackages(APP_NEEDS);
  startCluster();
  await ensureDatabase('cardwright');
  Object.assign(process.env, appEnv('dev', Number(process.env.PORT ?? 3000)));
  const { sequelize } = await import('../server/models');
  try {
    return await fn();
  } finally {
    await sequelize.close();
  }
}

const template = `import { DataTypes, type QueryInterface } from 'sequelize';

/** TODO: say what this migration changes and why. */
export async function up({ context: qi }: { context: QueryInterface }) {
  void qi;
  void DataTypes;
}

export async function down({ context: qi }: { context: QueryInterface }) {
  void qi;
}
`;

switch (command) {
  case 'start':
    ensureDebianPackages(APP_NEEDS);
    startCluster();
    console.log('PostgreSQL is running on 127.0.0.1.');
    break;
  case 'stop':
    stopCluster();
    break;
  case 'migrate':
    await withDatabase(async () => {
      const { migrate } = await import('../server/services/database');
      const done = await migrate();
      console.log(done.length ? `Applied: ${done.join(', ')}` : 'Nothing to migrate.');
    });
    break;
  case 'seed':
    await withDatabase(async () => {
      const { migrate } = await import('../server/services/database');
      await migrate();
      const { seedDemo } = await import('../server/seed');
      await seedDemo(console.log);
    });
    break;
  case 'reset':
    await withDatabase(async () => {
      const { migrate, migrateDownAll } = await import('../server/services/database');
      await migrateDownAll();
      // Media files belong to the rows just dropped.
      const { config } = await import('../server/config');
      const { rm } = await import('node:fs/promises');
      await rm(path.join(config.mediaDir, 'recordings'), { recursive: true, force: true });
      await migrate();
      const { seedDemo } = await import('../server/seed');
      await seedDemo(console.log);
      console.log('The development database was reset and seeded.');
    });
    break;
  case 'new-migration': {
    const { values } = parseArgs({ args: rest, options: { name: { type: 'string' } } });
    if (!values.name || !/^[a-z0-9-]+$/.test(values.name)) {
      console.error('Give a kebab-case name: npm run db:migration -- --name add-notes-to-pieces');
      process.exit(2);
    }
    const stamp = new Date().toISOString().replace(/\D/g, '').slice(0, 14);
    const file = path.join(PROJECT_ROOT, 'server/migrations', `${stamp}-${values.name}.ts`);
    writeFileSync(file, template, { flag: 'wx' });
    console.log(`Created ${path.relative(PROJECT_ROOT, file)}`);
    break;
  }
  default:
    console.error('Usage: tsx scripts/db.ts start|stop|migrate|seed|reset|new-migration --name x');
    process.exit(2);
}
