import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { tutorialKeys } from './keys';
import type { TutorialDto } from '@shared/schemas/tutorial';

export const getTutorial = (id: string) => api<TutorialDto>(`/tutorials/${id}`);
export const tutorialQueryOptions = (id: string) => queryOptions({ queryKey: tutorialKeys.detail(id), queryFn: () => getTutorial(id) });
export const useTutorial = (id: string) => useQuery(tutorialQueryOptions(id));
