import { getQueue, QUEUES, stopQueue } from './queue';
import { processRecording } from './process-recording';

/** Sends a recording to the processing queue. */
export async function enqueueRecording(recordingId: string): Promise<void> {
  const q = await getQueue();
  await q.send(QUEUES.processRecording, { recordingId }, { retryLimit: 0, expireInHours: 6 });
}

/**
 * Starts the queue workers in this process. ffmpeg uses both cores on its own, so one job at a
 * time per worker process; more machines mean more workers.
 */
export async function startWorkers(): Promise<void> {
  const q = await getQueue();
  await q.work<{ recordingId: string }>(QUEUES.processRecording, { pollingIntervalSeconds: 1, batchSize: 1 }, async ([job]) => {
    await processRecording(job.data.recordingId);
  });
}

export { stopQueue };
