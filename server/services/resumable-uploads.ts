import { createReadStream } from 'node:fs';
import { mkdirSync } from 'node:fs';
import { open } from 'node:fs/promises';
import path from 'node:path';
import { FileStore } from '@tus/file-store';
import { config } from '../config';
import { User } from '../models';
import { BadRequestError, DomainError, NotFoundError } from '../lib/errors';
import { addRecording, recordingUpload } from './recordings';
import { storage } from './storage';
import type { Recording } from '../models';

/**
 * Resumable recording uploads (the tus protocol, tus.io 1.0): the parts received so far wait on this
 * machine's disk, beside a small JSON file with the upload's offset and metadata, until the last
 * byte arrives; only then is the file handed to the media store and a recording row made. A part
 * nobody has continued for UPLOAD_EXPIRY_HOURS (48 by default) after it started is removed by `sweepStaleUploads`.
 */
export const resumableDir = path.join(config.mediaDir, 'partial-uploads');
mkdirSync(resumableDir, { recursive: true });

const expiryMs = Number(process.env.UPLOAD_EXPIRY_HOURS ?? 48) * 3600_000;

export const resumableStore = new FileStore({ directory: resumableDir, expirationPeriodInMilliseconds: expiryMs });

/** The metadata the server writes itself when an upload is created (never taken from the client). */
export type ResumableMeta = { tutorialId: string; uploadedBy: string; filename: string };

/** An upload in progress, or NotFoundError (404) when it is unknown, finished or swept away. */
/** Enough of the start of a file for its signature: file-type's own sample size (4100 bytes). */
const HEAD_BYTES = 4100;

type Upload = Awaited<ReturnType<FileStore['getUpload']>>;

export async function findResumable(id: string): Promise<Upload & { meta: ResumableMeta }> {
  const upload = await resumableStore.getUpload(id).catch(() => null);
  const m = upload?.metadata;
  if (!upload || !m?.tutorialId || !m.uploadedBy) throw new NotFoundError('Upload');
  return Object.assign(upload, { meta: { tutorialId: m.tutorialId, uploadedBy: m.uploadedBy, filename: m.filename ?? 'recording' } });
}

/** Reads tus's Upload-Metadata header ("key base64,key base64"); a malformed pair is a 400. */
export function parseUploadMetadata(header: string | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  for (const pair of (header ?? '').split(',')) {
    const [key, value] = pair.trim().split(' ');
    if (!key) continue;
    if (!/^[A-Za-z0-9_.-]+$/.test(key)) throw new BadRequestError('The upload metadata could not be read; start the upload again');
    out[key] = value ? Buffer.from(value, 'base64').toString('utf8') : '';
  }
  return out;
}

/** Writes tus's Upload-Metadata header from plain values. */
export function uploadMetadataHeader(meta: Record<string, string>): string {
  return Object.entries(meta)
    .map(([k, v]) => `${k} ${Buffer.from(v, 'utf8').toString('base64')}`)
    .join(',');
}

/** Throws the refusal (415, saying what the file is) when these first bytes are not a video. */
export async function checkRecordingHead(head: Buffer, filename: string): Promise<void> {
  await recordingUpload().place(head, filename);
}

async function readHead(file: string): Promise<Buffer> {
  const fh = await open(file, 'r');
  try {
    const buf = Buffer.alloc(HEAD_BYTES);
    const { bytesRead } = await fh.read(buf, 0, HEAD_BYTES, 0);
    return buf.subarray(0, bytesRead);
  } finally {
    await fh.close();
  }
}

/**
 * The last byte arrived: checks the file's kind from its own first bytes again (a resumed upload may
 * have skipped the early check), streams it to the media store, keeps it as a recording of the
 * tutorial and queues its processing, as the one-request upload does. The partial files go once it is
 * kept or refused; after a passing failure (the store unreachable) they stay, and the client's next
 * HEAD finishes it.
 */
export async function finishResumable(id: string): Promise<Recording> {
  const { meta, size } = await findResumable(id);
  const file = path.join(resumableDir, id);
  let rec: Recording;
  try {
    const { place } = recordingUpload(id);
    const where = await place(await readHead(file), meta.filename);
    const uploadedBy = await User.findByPk(meta.uploadedBy);
    if (!uploadedBy) throw new NotFoundError('User');
    const stored = await storage.putStream(where.key, createReadStream(file), where.contentType);
    if (size !== undefined && stored !== size) throw new BadRequestError('The upload ended short of its announced size; upload the file again');
    rec = await addRecording({
      id,
      tutorialId: meta.tutorialId,
      uploadedBy,
      upload: { key: where.key, contentType: where.contentType, originalName: meta.filename, size: stored },
    });
  } catch (e) {
    if (e instanceof DomainError) await resumableStore.remove(id).catch(() => {});
    throw e;
  }
  await resumableStore.remove(id).catch(() => {});
  return rec;
}

/** Removes partial uploads nobody has continued within the expiry; resolves with how many went. */
export function sweepStaleUploads(): Promise<number> {
  return resumableStore.deleteExpired();
}

let sweep: NodeJS.Timeout | null = null;

/** Sweeps stale partial uploads hourly in the process that holds them (the app server that received them). */
export function startUploadSweep(): void {
  if (sweep) return;
  const run = () => void sweepStaleUploads().catch((e) => console.error('[uploads]', e));
  run();
  sweep = setInterval(run, 3600_000);
  sweep.unref();
}
