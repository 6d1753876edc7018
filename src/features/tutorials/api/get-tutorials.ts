import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { tutorialKeys } from './keys';
import type { TutorialListDto } from '@shared/schemas/tutorial';

type Params = { state?: string; q?: string };

export function getTutorials(studioId: string, params: Params = {}) {
  const qs = new URLSearchParams(Object.entries(params).filter(([, v]) => v) as [string, string][]).toString();
  return api<TutorialListDto>(`/studios/${studioId}/tutorials${qs ? `?${qs}` : ''}`);
}
export const tutorialsQueryOptions = (studioId: string, params: Params = {}) =>
  queryOptions({ queryKey: tutorialKeys.list(studioId, params), queryFn: () => getTutorials(studioId, params) });
export const useTutorials = (studioId: string, params: Params = {}) => useQuery(tutorialsQueryOptions(studioId, params));
