import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { LiveSupplies } from './types';

/** The tutorial's supplies and whether the sponsorship disclosure is required. */
export const getLiveSupplies = (tutorialId: string) => api<LiveSupplies>(`/tutorials/${tutorialId}/supplies`);

/** Kept fresh the same way as the live cut list (the Supplies section caches its own copy). */
export const liveSuppliesQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: writeUpKeys.supplies(tutorialId), queryFn: () => getLiveSupplies(tutorialId), staleTime: 5_000, refetchOnWindowFocus: true, refetchOnMount: 'always' });
export const useLiveSupplies = (tutorialId: string) => useQuery(liveSuppliesQueryOptions(tutorialId));
