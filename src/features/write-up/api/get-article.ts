import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { ArticleDto } from '@shared/schemas/article';

/** The current write-up (version 0 with an empty paragraph before the first save). */
export const getArticle = (tutorialId: string) => api<ArticleDto>(`/tutorials/${tutorialId}/article`);

/**
 * Always read fresh and never kept once the page is left: the editor holds the working copy, and
 * starting it from a cached, older version would turn the next save into a needless conflict.
 */
export const articleQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: writeUpKeys.article(tutorialId), queryFn: () => getArticle(tutorialId), staleTime: 0, gcTime: 0, refetchOnReconnect: false });
export const useArticle = (tutorialId: string) => useQuery(articleQueryOptions(tutorialId));
