import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { Mentions } from './types';

/** The measurements spoken in the tutorial's newest recording, in time order. */
export const getMentions = (tutorialId: string) => api<Mentions>(`/tutorials/${tutorialId}/mentions`);
export const mentionsQueryOptions = (tutorialId: string) => queryOptions({ queryKey: cutListKeys.mentions(tutorialId), queryFn: () => getMentions(tutorialId) });
/** The transcript's mentions, with which ones were dismissed. */
export const useMentions = (tutorialId: string) => useQuery(mentionsQueryOptions(tutorialId));
