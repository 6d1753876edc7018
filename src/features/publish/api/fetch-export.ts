import { ApiError } from '@/lib/api-client';
import { dispositionFilename } from '../utils/content-disposition';

export type ExportProgress = { received: number; total: number | null };
export type ExportFile = { blob: Blob; filename: string | null; headers: Headers };

/** The server's words for a failed export, or a sentence of our own for statuses it leaves bare. */
async function failure(res: Response): Promise<ApiError> {
  const body = (await res.json().catch(() => ({}))) as { error?: string };
  const fallback =
    res.status === 401
      ? 'Your session has ended; sign in again to download'
      : res.status === 404
        ? 'This export was not found; the tutorial may have been deleted or unpublished'
        : `The server could not make this file (${res.status} ${res.statusText})`.trim();
  return new ApiError(res.status, body.error ?? fallback, [], body as Record<string, unknown>);
}

/**
 * GETs one export as a Blob, reporting bytes as they arrive (for a progress line on long zips and
 * PDFs). Failures throw ApiError with the server's message, e.g. the 409 for an empty cut list.
 */
export async function fetchExport(url: string, opts: { signal?: AbortSignal; onProgress?: (p: ExportProgress) => void } = {}): Promise<ExportFile> {
  let res: Response;
  try {
    res = await fetch(url, { credentials: 'same-origin', signal: opts.signal });
  } catch (e) {
    if ((e as Error).name === 'AbortError') throw e;
    throw new ApiError(0, 'Cannot reach the server; check your connection and try again');
  }
  if (!res.ok) throw await failure(res);
  const type = res.headers.get('content-type') ?? 'application/octet-stream';
  const filename = dispositionFilename(res.headers.get('content-disposition'));
  const totalHeader = Number(res.headers.get('content-length'));
  const total = Number.isFinite(totalHeader) && totalHeader > 0 ? totalHeader : null;
  if (!res.body || !opts.onProgress) return { blob: await res.blob(), filename, headers: res.headers };

  const reader = res.body.getReader();
  const chunks: Uint8Array[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks.push(value);
    received += value.byteLength;
    opts.onProgress({ received, total });
  }
  return { blob: new Blob(chunks as BlobPart[], { type }), filename, headers: res.headers };
}

/** GETs a text export (the description) as a string. */
export async function fetchExportText(url: string, signal?: AbortSignal): Promise<string> {
  const { blob } = await fetchExport(url, { signal });
  return blob.text();
}
