import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { CuesDto } from '@shared/schemas/footage';

/** The transcript's cues in order; `q` narrows them on the server (case-insensitive substring). */
export function getCues(recordingId: string, q = '') {
  const qs = q.trim() ? `?q=${encodeURIComponent(q.trim())}` : '';
  return api<CuesDto>(`/recordings/${recordingId}/cues${qs}`);
}
export const cuesQueryOptions = (recordingId: string, q = '') =>
  queryOptions({ queryKey: footageKeys.cues(recordingId, q.trim()), queryFn: () => getCues(recordingId, q) });
export const useCues = (recordingId: string, opts: { q?: string; enabled?: boolean } = {}) =>
  useQuery({ ...cuesQueryOptions(recordingId, opts.q), enabled: opts.enabled ?? true });
