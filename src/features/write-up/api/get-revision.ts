import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { RevisionDetailDto } from '@shared/schemas/article';

/** One revision with its document. Revisions never change, so it is cached for as long as the page lives. */
export const getRevision = (revisionId: string) => api<RevisionDetailDto>(`/revisions/${revisionId}`);
export const revisionQueryOptions = (revisionId: string) =>
  queryOptions({ queryKey: writeUpKeys.revision(revisionId), queryFn: () => getRevision(revisionId), staleTime: Infinity });
export const useRevision = (revisionId: string | null) => useQuery({ ...revisionQueryOptions(revisionId ?? ''), enabled: revisionId !== null });
