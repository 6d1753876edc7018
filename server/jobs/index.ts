import { Recording } from '../models';
import { getQueue, QUEUES, stopQueue as stopBoss } from './queue';
import { clearGenerated, leaseRunOut, processRecording } from './process-recording';
import { expireHold, sendClassReminders, sweepHolds } from './class-handlers';
import { runScheduledPublish } from '../services/schedule';
import type { PublishJob } from './publish-jobs';
import { watchPublishedContent } from '../services/public-page-invalidation';
import { startStillWorkers } from './still-jobs';

/**
 * Retries with backoff for what may pass (a full disk, a database hiccup): 3 more tries, 30 s,
 * then 60 s, then 120 s apart. A file that is not a video fails at once and is not retried.
 */
const RETRY = { retryLimit: 3, retryDelay: 30, retryBackoff: true };

/**
 * An expiry that fits the work: the 720p preview runs at about real time or better on two cores,
 * and a recording's size says roughly how long it is (about 100 MB a minute of 1080p footage, from
 * our own test files), so ten minutes plus three a 100 MB, at most six hours.
 */
export function expirySeconds(sizeBytes: number): number {
  const perHundredMb = Math.ceil(Math.max(0, sizeBytes) / 100_000_000);
  return Math.min(6 * 3600, 600 + perHundredMb * 180);
}

/** Sends a recording to the processing queue. */
export async function enqueueRecording(recordingId: string): Promise<void> {
  const rec = await Recording.findByPk(recordingId, { attributes: ['id', 'sizeBytes'] });
  const q = await getQueue();
  await q.send(QUEUES.processRecording, { recordingId }, { ...RETRY, expireInSeconds: expirySeconds(rec?.sizeBytes ?? 0) });
}

/**
 * Recordings left "processing" by a worker that stopped saying so (it died: a crash, a kill, a
 * power cut) go back in the queue, their half-written files removed. Runs when workers start and
 * then every half minute, so a crash anywhere is picked up by any live worker.
 */
export async function requeueAbandoned(): Promise<string[]> {
  const stale = { status: 'processing', ...leaseRunOut() };
  const rows = await Recording.findAll({ where: stale, attributes: ['id'] });
  const requeued: string[] = [];
  for (const { id } of rows) {
    const [n] = await Recording.update(
      { status: 'uploaded', progress: 0, stage: 'Starting again after an interruption', leaseUntil: null },
      { where: { id, ...stale } },
    );
    if (!n) continue; // another worker took it back first
    await clearGenerated(id);
    await enqueueRecording(id);
    requeued.push(id);
  }
  if (requeued.length) console.warn(`[jobs] queued again after an interruption: ${requeued.join(', ')}`);
  return requeued;
}

/**
 * Class work: reminders a day before, seat holds that run out, and a sweep every minute that
 * ends any hold whose job was lost (a crash, a queue outage). Their sends retry with back-off
 * (server/jobs/class-jobs.ts); the handlers are safe to run twice.
 */
export async function startClassWorkers(): Promise<void> {
  const q = await getQueue();
  await q.work<{ classId: string; startsAt: string }>(QUEUES.classReminder, { pollingIntervalSeconds: 2, batchSize: 1 }, async ([job]) => {
    await sendClassReminders(job.data);
  });
  await q.work<{ registrationId: string }>(QUEUES.expireHold, { pollingIntervalSeconds: 2, batchSize: 1 }, async ([job]) => {
    await expireHold(job.data.registrationId);
  });
  await q.work(QUEUES.sweepHolds, { pollingIntervalSeconds: 10, batchSize: 1 }, async () => {
    await sweepHolds();
  });
  await q.schedule(QUEUES.sweepHolds, '* * * * *', {}, { singletonKey: 'sweep-holds' });
}

/**
 * Scheduled publishing: each job waits in the queue (in PostgreSQL, so a restart loses none) until
 * its time; a job whose time passed while no worker ran is taken as soon as one starts.
 */
export async function startPublishWorkers(): Promise<void> {
  const q = await getQueue();
  await q.work<PublishJob>(QUEUES.publishTutorial, { pollingIntervalSeconds: 2, batchSize: 1 }, async ([job]) => {
    const outcome = await runScheduledPublish(job.data);
    console.log(JSON.stringify({ job: 'publish-tutorial', tutorialId: job.data.tutorialId, outcome }));
  });
}

let sweep: NodeJS.Timeout | null = null;

/**
 * Starts the queue workers in this process (the web server by default, or a worker process of its
 * own). ffmpeg uses both cores on its own, so one job at a time per worker process; more machines
 * mean more workers.
 */
export async function startWorkers(): Promise<void> {
  // Workers write stills and recordings that public pages show: app processes must hear of it.
  watchPublishedContent();
  const q = await getQueue();
  await q.work<{ recordingId: string }>(QUEUES.processRecording, { pollingIntervalSeconds: 1, batchSize: 1, includeMetadata: true }, async ([job]) => {
    await processRecording(job.data.recordingId, { lastTry: job.retryCount >= job.retryLimit });
  });
  await startStillWorkers();
  await startClassWorkers();
  await startPublishWorkers();
  await requeueAbandoned();
  sweep = setInterval(() => void requeueAbandoned().catch((e) => console.error('[jobs]', e)), 30_000);
  sweep.unref();
}

/** Stops the sweep, the workers and the queue (a running job gets a few seconds to finish). */
export async function stopQueue(): Promise<void> {
  if (sweep) clearInterval(sweep);
  sweep = null;
  await stopBoss();
}
