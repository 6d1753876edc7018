/**
 * A Cardwright server for API benchmarks, in its own process so its memory can be read from
 * /proc. It uses a fresh `cardwright_bench` database and media folder, makes one maker with a
 * tutorial, and prints one JSON line: { port, pid, tutorialId, email, password, databaseUrl }.
 */
import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ensureDatabase, startCluster, PROJECT_ROOT } from '../../scripts/lib/cluster';

startCluster();
const databaseUrl = await ensureDatabase('cardwright_bench', { fresh: true });
const mediaDir = path.join(PROJECT_ROOT, 'bench/out/media');
rmSync(mediaDir, { recursive: true, force: true });
mkdirSync(mediaDir, { recursive: true });
Object.assign(process.env, {
  DATABASE_URL: databaseUrl,
  MEDIA_DIR: mediaDir,
  WORKERS: process.env.WORKERS === 'on' ? 'on' : 'off',
  BCRYPT_ROUNDS: '10',
  NODE_ENV: 'production',
  SMTP_PORT: '2799',
});

const { migrate } = await import('../../server/services/database');
await migrate();
const { Membership, Studio, Tutorial, User } = await import('../../server/models');
const { hashPassword } = await import('../../server/services/passwords');
const password = 'bench passphrase for the api';
const user = await User.create({ email: 'bench@example.com', name: 'Bench Maker', passwordHash: await hashPassword(password) });
const studio = await Studio.create({ name: 'Bench studio', slug: 'bench' });
await Membership.create({ userId: user.id, studioId: studio.id, role: 'maker' });
const tutorial = await Tutorial.create({ studioId: studio.id, authorId: user.id, title: 'Bench tutorial', slug: 'bench' });
const { startServer } = await import('../../server/index');
const port = Number(process.env.BENCH_PORT ?? 3950);
await startServer({ port });
console.log(JSON.stringify({ port, pid: process.pid, tutorialId: tutorial.id, email: user.email, password, databaseUrl }));
