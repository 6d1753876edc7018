import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CommentsDto } from '@shared/schemas/comment';
import { api } from '@/lib/api-client';
import { commentKeys } from './keys';

/** Every thread of a tutorial with its replies, open and resolved counts, and whether the caller may comment. */
export const getComments = (tutorialId: string) => api<CommentsDto>(`/tutorials/${tutorialId}/comments`);

export const commentsQueryOptions = (tutorialId: string) =>
  // Someone else may comment meanwhile: look again now and then while the page is open.
  queryOptions({ queryKey: commentKeys.list(tutorialId), queryFn: () => getComments(tutorialId), refetchInterval: 60_000 });

export const useComments = (tutorialId: string, enabled = true) => useQuery({ ...commentsQueryOptions(tutorialId), enabled });
