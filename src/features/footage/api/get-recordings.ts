import { useQuery } from '@tanstack/react-query';
import { recordingsQueryOptions } from '@/lib/resources';

/** A tutorial's recordings, newest first (the shared read the write-up's still picker uses too). */
export const useRecordings = (tutorialId: string) => useQuery(recordingsQueryOptions(tutorialId));
