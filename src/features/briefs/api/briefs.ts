import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { BriefDto, BriefListDto, CreateBriefInput, MonthlyTargetDto, MonthlyTargetsDto } from '@shared/schemas/brief';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { api } from '@/lib/api-client';
import { briefKeys } from './keys';

export const getBriefs = (studioId: string) => api<BriefListDto>(`/studios/${studioId}/briefs`);
export const briefsQueryOptions = (studioId: string) => queryOptions({ queryKey: briefKeys.list(studioId), queryFn: () => getBriefs(studioId) });
export const useBriefs = (studioId: string) => useQuery(briefsQueryOptions(studioId));

/** Hands out a brief; the maker gets an e-mail. */
export function useCreateBrief(studioId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBriefInput) => api<BriefDto>(`/studios/${studioId}/briefs`, { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: briefKeys.all }),
  });
}

export function useDeleteBrief() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<void>(`/briefs/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: briefKeys.all }),
  });
}

/** Starts the tutorial from a brief (it takes the brief's title and due date). */
export function useStartTutorial() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<TutorialDto>(`/briefs/${id}/tutorial`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: briefKeys.all }),
  });
}

export const getTargets = (studioId: string) => api<MonthlyTargetsDto>(`/studios/${studioId}/targets`);
export const useTargets = (studioId: string) => useQuery({ queryKey: briefKeys.targets(studioId), queryFn: () => getTargets(studioId) });

export function useSetTarget(studioId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, perMonth }: { userId: string; perMonth: number | null }) =>
      api<MonthlyTargetDto>(`/studios/${studioId}/targets/${userId}`, { method: 'PUT', body: { perMonth } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: briefKeys.targets(studioId) }),
  });
}

/** The brief a tutorial was started from (null when it was not started from one). */
export const getTutorialBrief = (tutorialId: string) => api<{ brief: BriefDto | null }>(`/tutorials/${tutorialId}/brief`);
export const tutorialBriefQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: briefKeys.ofTutorial(tutorialId), queryFn: () => getTutorialBrief(tutorialId) });
export const useTutorialBrief = (tutorialId: string, enabled = true) => useQuery({ ...tutorialBriefQueryOptions(tutorialId), enabled });
