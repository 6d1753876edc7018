import PgBoss from 'pg-boss';
import { config } from '../config';

let boss: PgBoss | null = null;
let starting: Promise<PgBoss> | null = null;

// QUEUE_PROCESS_RECORDING and QUEUE_PUBLISH_TUTORIAL give a test its own queue, so workers of other tests never take its jobs.
export const QUEUES = {
  processRecording: process.env.QUEUE_PROCESS_RECORDING || 'process-recording',
  publishTutorial: process.env.QUEUE_PUBLISH_TUTORIAL || 'publish-tutorial',
  pullStill: process.env.QUEUE_PULL_STILL || 'pull-still',
  classReminder: 'class-reminder',
  expireHold: 'expire-hold',
  sweepHolds: 'sweep-holds',
} as const;

/**
 * The PostgreSQL-backed job queue (pg-boss keeps its tables in its own `pgboss` schema), so
 * ffmpeg workers can run in this process or on other machines against the same database.
 */
export function getQueue(): Promise<PgBoss> {
  if (boss) return Promise.resolve(boss);
  starting ??= (async () => {
    const b = new PgBoss({ connectionString: config.databaseUrl, schema: 'pgboss', max: 4, application_name: 'cardwright-queue' });
    b.on('error', (e) => console.error('[queue]', e.message));
    await b.start();
    for (const name of Object.values(QUEUES)) await b.createQueue(name);
    boss = b;
    return b;
  })();
  return starting;
}

/** Stops the queue and its workers, letting a running job finish for a few seconds. */
export async function stopQueue(): Promise<void> {
  const b = boss ?? (starting ? await starting.catch(() => null) : null);
  boss = null;
  starting = null;
  await b?.stop({ graceful: true, timeout: 5000, wait: true });
}
