import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { RevisionsDto } from '@shared/schemas/article';

/** The write-up's revisions, newest first, without their documents. */
export const getRevisions = (tutorialId: string) => api<RevisionsDto>(`/tutorials/${tutorialId}/revisions`);
export const revisionsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: writeUpKeys.revisions(tutorialId), queryFn: () => getRevisions(tutorialId), staleTime: 0 });
export const useRevisions = (tutorialId: string, opts: { enabled?: boolean } = {}) =>
  useQuery({ ...revisionsQueryOptions(tutorialId), enabled: opts.enabled ?? true });
