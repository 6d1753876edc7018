import { useQuery } from '@tanstack/react-query';
import { stillsQueryOptions } from '@/lib/resources';

/** A recording's stills in time order (the shared read the write-up's still picker uses too). */
export const useStills = (recordingId: string) => useQuery(stillsQueryOptions(recordingId));
