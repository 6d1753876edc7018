import { useQuery } from '@tanstack/react-query';
import { suppliesQueryOptions } from '@/lib/resources';

/** A tutorial's supplies, their disclosure and the caller's abilities (the shared read the write-up's live list uses too). */
export const useSupplies = (tutorialId: string) => useQuery(suppliesQueryOptions(tutorialId));
