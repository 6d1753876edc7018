import { BadRequestError, NotFoundError, UnavailableError, UnprocessableError } from '../lib/errors';
import { getQueue, QUEUES } from './queue';

/** What a worker needs to pull a still: the recording, the time and how (the sharpest-nearby window and chapter bounds when given). */
export type StillJob = {
  recordingId: string;
  atMs: number;
  mode: 'exact' | 'sharpest';
  windowMs?: number;
  within?: { fromMs: number; toMs: number };
  alt?: string;
};

/** A worker's answer: the still it made, or the refusal a person should read (a time past the end, an unreadable file). */
export type StillJobOutput = { stillId: string } | { refused: { status: 400 | 404 | 422; message: string } };

/** How long a request waits for a worker: a sharpest-nearby still from a bucket takes a few seconds on two cores. */
const WAIT_MS = Number(process.env.STILL_WAIT_SECONDS || 60) * 1000;
const POLL_MS = 100;

/**
 * Sends a still to the queue and waits for a worker to make it (WORKERS=off: the web process runs
 * no ffmpeg). One try: a person waiting would rather pull again than wait for a retry. Resolves
 * with the new still's id; a worker's refusal comes back as the same domain error it would be in
 * process; no answer in time is a 503 to try again.
 */
export async function stillThroughQueue(job: StillJob): Promise<string> {
  const q = await getQueue();
  const id = await q.send(QUEUES.pullStill, job, { retryLimit: 0, expireInSeconds: Math.ceil(WAIT_MS / 1000) });
  if (!id) throw new UnavailableError('The still could not be queued; try again in a moment');
  const deadline = Date.now() + WAIT_MS;
  while (Date.now() < deadline) {
    const j = await q.getJobById<StillJob>(QUEUES.pullStill, id);
    if (j?.state === 'completed') {
      const out = j.output as StillJobOutput;
      if ('stillId' in out) return out.stillId;
      const { status, message } = out.refused;
      throw status === 400 ? new BadRequestError(message) : status === 404 ? NotFoundError.saying(message) : new UnprocessableError(message);
    }
    if (j?.state === 'failed' || j?.state === 'cancelled') throw new UnavailableError('The still could not be made just now; try again in a moment');
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
  await q.cancel(QUEUES.pullStill, id).catch(() => {});
  throw new UnavailableError('No worker made the still in time; try again in a moment');
}
