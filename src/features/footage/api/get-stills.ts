import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { Still } from './types';

/** A recording's stills in time order. */
export const getStills = (recordingId: string) => api<{ stills: Still[] }>(`/recordings/${recordingId}/stills`);
export const stillsQueryOptions = (recordingId: string) =>
  queryOptions({ queryKey: footageKeys.stills(recordingId), queryFn: () => getStills(recordingId) });
export const useStills = (recordingId: string) => useQuery(stillsQueryOptions(recordingId));
