/**
 * One app server (HTTP and, unless WORKERS=off, the queue workers) against the database in
 * DATABASE_URL, on PORT: what a load balancer puts several of side by side. Prints one JSON line
 * when it listens; SIGTERM stops it after the running job's grace period.
 *
 *   PORT=3010 npx tsx server/app-process.ts
 */
import { startServer } from './index';

const app = await startServer();
console.log(JSON.stringify({ ready: true, pid: process.pid }));
process.once('SIGTERM', () => {
  void app.stop().finally(() => process.exit(0));
});
