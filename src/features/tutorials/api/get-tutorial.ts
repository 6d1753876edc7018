import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { tutorialKeys } from './keys';
import type { Tutorial } from './types';

export const getTutorial = (id: string) => api<Tutorial>(`/tutorials/${id}`);
export const tutorialQueryOptions = (id: string) => queryOptions({ queryKey: tutorialKeys.detail(id), queryFn: () => getTutorial(id) });
export const useTutorial = (id: string) => useQuery(tutorialQueryOptions(id));
