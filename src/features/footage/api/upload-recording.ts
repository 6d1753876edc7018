import { Upload as TusUpload, type DetailedError } from 'tus-js-client';
import type { RecordingDto } from '@shared/schemas/footage';
import { ApiError, getCsrfToken } from '@/lib/api-client';
import { UploadCancelled, type UploadProgress } from './upload-file';

/** The resumable upload endpoint (tus 1.0). */
const ENDPOINT = '/api/uploads';

/** A recording on its way: settles with the new recording (null when the server had already kept it), or rejects. */
export type RecordingUpload = { done: Promise<RecordingDto | null>; cancel: () => void; pause: () => void; resume: () => void };

function failure(e: Error | DetailedError): ApiError {
  const res = 'originalResponse' in e ? e.originalResponse : null;
  if (!res)
    return new ApiError(0, 'The connection to the server was lost; the part already sent is kept. Choose the same file again to continue where it stopped.');
  let body: Record<string, unknown> = {};
  try {
    body = JSON.parse(res.getBody() || '{}') as Record<string, unknown>;
  } catch {
    // a proxy's HTML page or tus's plain-text answer: the fallback below
  }
  const status = res.getStatus();
  const fallback = status === 413 ? 'The file is larger than the server accepts' : (res.getBody() || `The server answered ${status}`).trim();
  return new ApiError(status, String(body.error ?? fallback), [], body);
}

/**
 * Sends a recording with the tus protocol: a dropped connection is retried from the server's
 * offset, and choosing the same file again after a reload or a closed laptop continues the upload
 * the browser remembers for it (tus-js-client keeps its URL in localStorage, keyed by tutorial and
 * the file's name, size and date). 415 not a video; 413 too large.
 */
export function uploadRecording(tutorialId: string, file: File, onProgress?: (p: UploadProgress) => void): RecordingUpload {
  let tus: TusUpload | null = null;
  let cancelled = false;
  let settle: { resolve: (r: RecordingDto | null) => void; reject: (e: Error) => void } | null = null;
  const done = new Promise<RecordingDto | null>((resolve, reject) => {
    settle = { resolve, reject };
  });

  const begin = async () => {
    const token = await getCsrfToken();
    if (cancelled) return;
    const up = new TusUpload(file, {
      endpoint: ENDPOINT,
      metadata: { tutorialId, filename: file.name },
      headers: { 'X-CSRF-Token': token },
      fingerprint: async () => ['cardwright-recording', tutorialId, file.name, file.type, file.size, file.lastModified].join('|'),
      removeFingerprintOnSuccess: true,
      retryDelays: [0, 1000, 3000, 5000, 10_000, 20_000, 30_000, 60_000],
      onProgress: (loaded, total) => onProgress?.({ loaded, total }),
      onSuccess: ({ lastResponse }) => {
        let rec: RecordingDto | null;
        try {
          rec = lastResponse.getBody() ? (JSON.parse(lastResponse.getBody()) as RecordingDto) : null;
        } catch {
          rec = null;
        }
        settle?.resolve(rec);
      },
      onError: (e) => settle?.reject(failure(e)),
    });
    tus = up;
    const previous = await up.findPreviousUploads();
    if (previous.length) up.resumeFromPreviousUpload(previous[0]);
    up.start();
  };
  begin().catch(() => settle?.reject(new ApiError(0, 'Cannot reach the server; check your connection and try again')));

  return {
    done,
    // Cancel drops the part on the server too; Pause keeps it for Resume (or a later visit).
    cancel: () => {
      cancelled = true;
      void tus?.abort(true).catch(() => {});
      settle?.reject(new UploadCancelled());
    },
    pause: () => void tus?.abort(false),
    resume: () => tus?.start(),
  };
}
