import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { MentionsDto } from '@shared/schemas/piece';

/** The measurements spoken in the tutorial's newest recording, in time order. */
export const getMentions = (tutorialId: string) => api<MentionsDto>(`/tutorials/${tutorialId}/mentions`);
export const mentionsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: cutListKeys.mentions(tutorialId), queryFn: () => getMentions(tutorialId) });
/** The transcript's mentions, with which ones were dismissed. */
export const useMentions = (tutorialId: string) => useQuery(mentionsQueryOptions(tutorialId));
