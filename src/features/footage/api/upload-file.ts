import { ApiError, getCsrfToken, setCsrfToken } from '@/lib/api-client';

export type UploadProgress = { loaded: number; total: number };
export type Upload<T> = { done: Promise<T>; abort: () => void };

/** Thrown when the person cancels an upload; not a failure to report as one. */
export class UploadCancelled extends Error {
  name = 'UploadCancelled';
  constructor() {
    super('Upload cancelled');
  }
}

type Options = { onProgress?: (p: UploadProgress) => void };

/**
 * POSTs one file as multipart field `file` to /api with the CSRF header, through XMLHttpRequest
 * because fetch reports no upload progress. Non-2xx rejects with ApiError carrying the server's
 * message; a lost connection rejects with ApiError status 0; abort() rejects with UploadCancelled.
 */
export function uploadFile<T>(path: string, file: File, opts: Options = {}): Upload<T> {
  let xhr: XMLHttpRequest | null = null;
  let aborted = false;
  let rejectEarly: ((e: Error) => void) | null = null;

  const send = (token: string, retried: boolean): Promise<T> =>
    new Promise<T>((resolve, reject) => {
      const req = new XMLHttpRequest();
      xhr = req;
      req.open('POST', `/api${path}`);
      req.withCredentials = true;
      req.setRequestHeader('Accept', 'application/json');
      req.setRequestHeader('X-CSRF-Token', token);
      req.upload.onprogress = (e) => opts.onProgress?.({ loaded: e.loaded, total: e.lengthComputable ? e.total : file.size });
      req.onabort = () => reject(new UploadCancelled());
      req.onerror = () =>
        reject(new ApiError(0, 'The connection to the server was lost during the upload; nothing was saved. Check your connection and try again.'));
      req.onload = () => {
        let body: Record<string, unknown> = {};
        try {
          body = req.responseText ? (JSON.parse(req.responseText) as Record<string, unknown>) : {};
        } catch {
          // A proxy's HTML error page: fall back to the status text below.
        }
        if (req.status >= 200 && req.status < 300) return resolve(body as T);
        // The session may have been renewed in another tab: fetch a fresh token once and send again.
        if (req.status === 403 && body.code === 'csrf' && !retried && !aborted) {
          setCsrfToken(null);
          getCsrfToken()
            .then((t) => send(t, true))
            .then(resolve, reject);
          return;
        }
        const fallback = req.status === 413 ? 'The file is larger than the server accepts' : req.statusText || `The server answered ${req.status}`;
        reject(new ApiError(req.status, String(body.error ?? fallback), (body.issues as ApiError['issues']) ?? [], body));
      };
      const form = new FormData();
      form.append('file', file, file.name);
      req.send(form);
    });

  const done = new Promise<T>((resolve, reject) => {
    rejectEarly = reject;
    getCsrfToken()
      .then((token) => {
        if (aborted) throw new UploadCancelled();
        return send(token, false);
      })
      .then(resolve, (e: unknown) =>
        reject(
          e instanceof Error && !(e instanceof ApiError) && !(e instanceof UploadCancelled)
            ? new ApiError(0, 'Cannot reach the server; check your connection and try again')
            : e,
        ),
      );
  });

  return {
    done,
    abort: () => {
      aborted = true;
      if (xhr) xhr.abort();
      else rejectEarly?.(new UploadCancelled());
    },
  };
}
