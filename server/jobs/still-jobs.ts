import { Recording } from '../models';
import { DomainError, NotFoundError, UnprocessableError } from '../lib/errors';
import { makeStill } from '../services/stills';
import { getQueue, QUEUES } from './queue';
import type { StillJob, StillJobOutput } from './still-queue';

/** The status a refusal keeps on its way back to the waiting request. */
function refusal(e: DomainError): StillJobOutput {
  const status = e instanceof NotFoundError ? 404 : e instanceof UnprocessableError ? 422 : 400;
  return { refused: { status, message: e.message } };
}

/** Makes one queued still; a refusal (a time past the end) is an answer, not a failure to retry. */
export async function runStillJob(job: StillJob): Promise<StillJobOutput> {
  const recording = await Recording.findByPk(job.recordingId);
  if (!recording) return { refused: { status: 404, message: 'Recording was not found' } };
  try {
    const still = await makeStill(recording, job.atMs, job.mode, { windowMs: job.windowMs, within: job.within, alt: job.alt });
    return { stillId: still.id };
  } catch (e) {
    if (e instanceof DomainError) return refusal(e);
    throw e;
  }
}

/**
 * Still pulls for app processes that run no ffmpeg (WORKERS=off): polled as often as pg-boss
 * allows (every 0.5 s), since a person waits. Two workers, so a long transcode in the same
 * process does not hold them up and one slow still does not hold up the next.
 */
export async function startStillWorkers(): Promise<void> {
  const q = await getQueue();
  // one job per fetch: the handler's answer is the job's output
  for (let i = 0; i < 2; i++) await q.work<StillJob>(QUEUES.pullStill, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => runStillJob(job.data));
}
