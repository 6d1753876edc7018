import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { PickableStill } from './types';

type RecordingRef = { id: string; originalName: string };

/** The tutorial's recordings, newest first (only what the still picker needs). */
export const getRecordingRefs = (tutorialId: string) => api<{ recordings: RecordingRef[] }>(`/tutorials/${tutorialId}/recordings`);
export const recordingRefsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: writeUpKeys.recordings(tutorialId), queryFn: () => getRecordingRefs(tutorialId), staleTime: 5_000 });

/** One recording's stills in time order. */
export const getPickableStills = (recordingId: string) => api<{ stills: PickableStill[] }>(`/recordings/${recordingId}/stills`);
export const pickableStillsQueryOptions = (recordingId: string) =>
  queryOptions({ queryKey: writeUpKeys.stills(recordingId), queryFn: () => getPickableStills(recordingId), staleTime: 5_000 });

/** Every still of every recording of the tutorial, newest recording first, for the still picker. */
export function useTutorialStills(tutorialId: string, opts: { enabled?: boolean } = {}) {
  const enabled = opts.enabled ?? true;
  const recordings = useQuery({ ...recordingRefsQueryOptions(tutorialId), enabled });
  const list = recordings.data?.recordings ?? [];
  const stills = useQueries({ queries: list.map((r) => ({ ...pickableStillsQueryOptions(r.id), enabled })) });
  const error = recordings.error ?? stills.find((s) => s.error)?.error ?? null;
  return {
    isPending: recordings.isPending || stills.some((s) => s.isPending),
    error,
    groups: list.map((r, i) => ({ recording: r, stills: stills[i]?.data?.stills ?? [] })),
  };
}
