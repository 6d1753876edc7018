import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublishedTutorialDto } from '@shared/schemas/version';
import { api } from '@/lib/api-client';
import { publishKeys } from './keys';

/** The version readers see of a published tutorial, rendered by the server as its public page does. */
export const getPublished = (tutorialId: string, signal?: AbortSignal) => api<PublishedTutorialDto>(`/tutorials/${tutorialId}/published`, { signal });

export const publishedQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: publishKeys.published(tutorialId), queryFn: ({ signal }) => getPublished(tutorialId, signal) });

/** The published version of a tutorial, for the reader's view (never the workspace's draft). */
export const usePublished = (tutorialId: string) => useQuery(publishedQueryOptions(tutorialId));
