import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { Recording } from './types';

/** A tutorial's recordings, newest first. */
export const getRecordings = (tutorialId: string) => api<{ recordings: Recording[] }>(`/tutorials/${tutorialId}/recordings`);
export const recordingsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: footageKeys.tutorialRecordings(tutorialId), queryFn: () => getRecordings(tutorialId) });
export const useRecordings = (tutorialId: string) => useQuery(recordingsQueryOptions(tutorialId));
