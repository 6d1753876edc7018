import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MentionableDto } from '@shared/schemas/comment';
import { api } from '@/lib/api-client';
import { commentKeys } from './keys';

/** Studio members who read the comments, for the "@" picker. */
export const getMentionable = (tutorialId: string) => api<{ people: MentionableDto[] }>(`/tutorials/${tutorialId}/mentionable`);

export const mentionableQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: commentKeys.mentionable(tutorialId), queryFn: () => getMentionable(tutorialId), staleTime: 5 * 60_000 });

export const useMentionable = (tutorialId: string) => useQuery(mentionableQueryOptions(tutorialId));
