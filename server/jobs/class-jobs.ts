import { getQueue, QUEUES } from './queue';

/**
 * Queue sends for classes, kept apart from their handlers (class-handlers.ts) so services can
 * queue work without loading the workers. A failure to queue is logged, not thrown: the
 * minute-by-minute sweep (and the check inside each registration) still ends overdue holds.
 */

/** Retries with back-off for the mail jobs: an SMTP hiccup should not lose a reminder. */
const RETRY = { retryLimit: 5, retryDelay: 30, retryBackoff: true, expireInMinutes: 15 } as const;

async function send(name: string, data: object, options: object): Promise<void> {
  try {
    const q = await getQueue();
    await q.send(name, data, options);
  } catch (e) {
    console.error(`[queue] could not queue ${name}:`, (e as Error).message);
  }
}

/** The reminder a day before the class; a job whose start time no longer matches the class does nothing. */
export function scheduleReminder(classId: string, startsAt: Date): Promise<void> {
  const iso = startsAt.toISOString();
  return send(
    QUEUES.classReminder,
    { classId, startsAt: iso },
    { ...RETRY, startAfter: new Date(startsAt.getTime() - 24 * 3600_000), singletonKey: `${classId}:${iso}` },
  );
}

/** Ends a seat hold when its time runs out, unless it was paid meanwhile. */
export function scheduleHoldExpiry(registrationId: string, at: Date): Promise<void> {
  return send(QUEUES.expireHold, { registrationId }, { ...RETRY, startAfter: at, singletonKey: `${registrationId}:${at.toISOString()}` });
}
