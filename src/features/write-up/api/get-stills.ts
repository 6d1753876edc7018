import { useQueries, useQuery } from '@tanstack/react-query';
import { recordingsQueryOptions, stillsQueryOptions } from '@/lib/resources';

/** Every still of every recording of the tutorial, newest recording first, for the still picker. */
export function useTutorialStills(tutorialId: string, opts: { enabled?: boolean } = {}) {
  const enabled = opts.enabled ?? true;
  const recordings = useQuery({ ...recordingsQueryOptions(tutorialId), enabled });
  const list = recordings.data?.recordings ?? [];
  const stills = useQueries({ queries: list.map((r) => ({ ...stillsQueryOptions(r.id), enabled })) });
  const error = recordings.error ?? stills.find((s) => s.error)?.error ?? null;
  return {
    isPending: recordings.isPending || stills.some((s) => s.isPending),
    error,
    groups: list.map((r, i) => ({ recording: r, stills: stills[i]?.data?.stills ?? [] })),
  };
}
