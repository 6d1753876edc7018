import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChecklistDto } from '@shared/schemas/review';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

/** The review checklist, worked out from the tutorial's sections as saved now. */
export const getChecklist = (tutorialId: string) => api<ChecklistDto>(`/tutorials/${tutorialId}/checklist`);

export const checklistQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: reviewKeys.checklist(tutorialId), queryFn: () => getChecklist(tutorialId), staleTime: 0 });

export const useChecklist = (tutorialId: string) => useQuery(checklistQueryOptions(tutorialId));
