import { getQueue, QUEUES } from './queue';

/**
 * Queue sends for scheduled publishing, apart from the handler (services/schedule.ts) so the
 * schedule service can queue work without loading the workers. Unlike class reminders, a failure
 * to queue is thrown: a publish time that no job will keep must not be saved.
 */

/** Retries with back-off: a database or SMTP hiccup at the publish time should not lose it. */
const RETRY = { retryLimit: 5, retryDelay: 30, retryBackoff: true, expireInMinutes: 15 } as const;

export type PublishJob = { tutorialId: string; at: string };

/** Queues the publish for its time; resolves to the job's id. Two sends for the same time are one job. */
export async function queuePublish(tutorialId: string, at: Date): Promise<string> {
  const q = await getQueue();
  const data: PublishJob = { tutorialId, at: at.toISOString() };
  const id = await q.send(QUEUES.publishTutorial, data, { ...RETRY, startAfter: at, singletonKey: `${tutorialId}:${data.at}` });
  if (!id) throw new Error('the queue did not take the publish job');
  return id;
}

/** Withdraws a queued publish (best effort: the handler also checks the time still stands). */
export async function withdrawPublish(jobId: string): Promise<void> {
  try {
    const q = await getQueue();
    await q.cancel(QUEUES.publishTutorial, jobId);
  } catch (e) {
    console.error('[queue] could not withdraw a publish job:', (e as Error).message);
  }
}
