import { useQuery } from '@tanstack/react-query';
import { piecesQueryOptions } from '@/lib/resources';

/**
 * The tutorial's cut list, for the live table in the write-up: the same cache entry as the Cut
 * list section's (src/lib/resources.ts), so an edit there is what the table shows here.
 */
export const useLivePieces = (tutorialId: string) => useQuery(piecesQueryOptions(tutorialId));
