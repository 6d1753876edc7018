import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { LivePiece } from './types';

/** The tutorial's cut list, for the live table in the write-up. */
export const getLivePieces = (tutorialId: string) => api<{ pieces: LivePiece[]; precision: 8 | 16 | 32 }>(`/tutorials/${tutorialId}/pieces`);

/**
 * The Cut list section has its own cache, so its edits do not reach this one: the table reads
 * afresh whenever it is drawn (coming back from the Cut list section), on window focus, and
 * when older than a few seconds.
 */
export const livePiecesQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: writeUpKeys.pieces(tutorialId), queryFn: () => getLivePieces(tutorialId), staleTime: 5_000, refetchOnWindowFocus: true, refetchOnMount: 'always' });
export const useLivePieces = (tutorialId: string) => useQuery(livePiecesQueryOptions(tutorialId));
