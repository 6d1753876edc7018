import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { supplyKeys } from './keys';
import type { SuppliesResponse } from './types';

/** A tutorial's supplies in list order, the disclosure that goes with them and the caller's abilities. */
export const getSupplies = (tutorialId: string) => api<SuppliesResponse>(`/tutorials/${tutorialId}/supplies`);
export const suppliesQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: supplyKeys.tutorial(tutorialId), queryFn: () => getSupplies(tutorialId) });
export const useSupplies = (tutorialId: string) => useQuery(suppliesQueryOptions(tutorialId));
