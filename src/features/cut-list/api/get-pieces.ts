import { useQuery, useQueryClient } from '@tanstack/react-query';
import { piecesQueryOptions } from '@/lib/resources';
import { refreshCutList } from './keys';

/** The cut list of a tutorial: the shared read of src/lib/resources.ts, so the write-up sees the same entry. */
export const usePieces = (tutorialId: string) => useQuery(piecesQueryOptions(tutorialId));

/** Refetches everything the cut list shows, for changes made elsewhere (the ruler precision). */
export function useRefreshCutList(tutorialId: string) {
  const qc = useQueryClient();
  return () => refreshCutList(qc, tutorialId);
}
