import { queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { CutList } from './types';

/** The cut list with each piece's checks, the materials and the caller's abilities. */
export const getPieces = (tutorialId: string) => api<CutList>(`/tutorials/${tutorialId}/pieces`);
export const piecesQueryOptions = (tutorialId: string) => queryOptions({ queryKey: cutListKeys.pieces(tutorialId), queryFn: () => getPieces(tutorialId) });
/** The cut list of a tutorial. */
export const usePieces = (tutorialId: string) => useQuery(piecesQueryOptions(tutorialId));

/** Refetches everything the cut list shows, for changes made elsewhere (the ruler precision). */
export function useRefreshCutList(tutorialId: string) {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: cutListKeys.tutorial(tutorialId) });
}
