/**
 * A queue worker in a process of its own, against the database in DATABASE_URL: it processes
 * recordings and takes back work left by workers that died. Prints one JSON line when ready;
 * SIGTERM stops it after the running job's grace period.
 *
 *   npx tsx server/jobs/worker-process.ts
 */
import { sequelize } from '../models';
import { startWorkers, stopQueue } from './index';

await sequelize.authenticate();
await startWorkers();
console.log(JSON.stringify({ ready: true, pid: process.pid }));
process.once('SIGTERM', () => {
  void stopQueue()
    .then(() => sequelize.close())
    .finally(() => process.exit(0));
});
