import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { tutorialKeys } from './keys';
import type { Tutorial } from './types';

type Params = { state?: string; q?: string };
export type TutorialList = { tutorials: Tutorial[]; abilities: { createTutorial: boolean; manageMembers: boolean } };

export function getTutorials(studioId: string, params: Params = {}) {
  const qs = new URLSearchParams(Object.entries(params).filter(([, v]) => v) as [string, string][]).toString();
  return api<TutorialList>(`/studios/${studioId}/tutorials${qs ? `?${qs}` : ''}`);
}
export const tutorialsQueryOptions = (studioId: string, params: Params = {}) =>
  queryOptions({ queryKey: tutorialKeys.list(studioId, params), queryFn: () => getTutorials(studioId, params) });
export const useTutorials = (studioId: string, params: Params = {}) => useQuery(tutorialsQueryOptions(studioId, params));
