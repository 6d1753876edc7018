/**
 * A Cardwright app process for the load bench. The first one (`LOAD_FRESH=1`) makes a fresh
 * `cardwright_load` database and media folder and seeds the demo studio (its published tutorial has
 * footage, stills, a cut list and a write-up, so the public page does real work); later ones join
 * the same database. Prints one JSON line: { port, pid, tutorialId, studioId, publicPath }.
 */
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ensureDatabase, startCluster, PROJECT_ROOT } from '../../scripts/lib/cluster';

const fresh = process.env.LOAD_FRESH === '1';
startCluster();
const databaseUrl = await ensureDatabase('cardwright_load', { fresh });
const mediaDir = path.join(PROJECT_ROOT, 'bench/out/load-media');
if (fresh) {
  rmSync(mediaDir, { recursive: true, force: true });
  mkdirSync(mediaDir, { recursive: true });
}
Object.assign(process.env, { DATABASE_URL: databaseUrl, MEDIA_DIR: mediaDir, WORKERS: 'off', NODE_ENV: 'production', SMTP_PORT: '2799' });

if (fresh) {
  const { migrate } = await import('../../server/services/database');
  await migrate();
  const { seedDemo } = await import('../../server/seed');
  await seedDemo();
}
const { Studio, Tutorial } = await import('../../server/models');
const studio = (await Studio.findOne({ where: { slug: 'juniper-lane' } }))!;
const tutorial = (await Tutorial.findOne({ where: { studioId: studio.id, slug: 'round-keepsake-box' } }))!;
// The profile script counts the SQL statements each request costs: Sequelize, the session store and
// the health check all go through pg's Client.
let queries = 0;
if (process.env.LOAD_COUNT_QUERIES === '1') {
  const pg = (await import('pg')).default;
  const original = pg.Client.prototype.query;
  pg.Client.prototype.query = function (this: unknown, ...args: unknown[]) {
    queries++;
    return Reflect.apply(original, this, args) as never;
  } as typeof original;
}
// The monotonic clock in microseconds, the one V8's profile timestamps use: the profile script reads
// only the samples taken while it loaded the server.
const micros = () => Number(process.hrtime.bigint() / 1000n);
process.on('message', (m) => {
  if (m === 'queries') process.send?.({ queries, micros: micros() });
});
// A clean exit on SIGTERM, so `--cpu-prof` writes its profile.
process.once('SIGTERM', () => process.exit(0));
const { startServer } = await import('../../server/index');
const port = Number(process.env.BENCH_PORT ?? 3960);
await startServer({ port });
console.log(JSON.stringify({ port, pid: process.pid, tutorialId: tutorial.id, studioId: studio.id, publicPath: `/t/${studio.slug}/${tutorial.slug}` }));
