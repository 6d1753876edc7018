import { ApiError } from '@/lib/api-client';

/** Why a save failed, in words for "Not saved: …"; the edits are always kept on the device meanwhile. */
export function saveErrorMessage(err: unknown): string {
  if (err instanceof ApiError) {
    if (err.status === 401) return 'your session has ended. Sign in again in another tab; your changes are kept on this device';
    if (err.status === 413) return 'the write-up is larger than the server accepts. Split long text or remove some photos';
    if (err.status >= 500) return `the server had a problem (${err.message}). Trying again shortly`;
    return err.message;
  }
  return 'something went wrong. Trying again shortly';
}

/** True for failures worth retrying on their own (the connection or the server), not for a refused document. */
export function isRetryable(err: unknown): boolean {
  return !(err instanceof ApiError) || err.status === 0 || err.status >= 500 || err.status === 429;
}
