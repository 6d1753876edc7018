import { useQuery } from '@tanstack/react-query';
import { suppliesQueryOptions } from '@/lib/resources';

/** The tutorial's supplies and whether the sponsorship disclosure is required: the Supplies section's cache entry. */
export const useLiveSupplies = (tutorialId: string) => useQuery(suppliesQueryOptions(tutorialId));
