import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HistoryDto } from '@shared/schemas/review';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

/** Every move of the tutorial between states, newest first. */
export const getHistory = (tutorialId: string) => api<HistoryDto>(`/tutorials/${tutorialId}/history`);

export const historyQueryOptions = (tutorialId: string) => queryOptions({ queryKey: reviewKeys.history(tutorialId), queryFn: () => getHistory(tutorialId) });

export const useHistory = (tutorialId: string) => useQuery(historyQueryOptions(tutorialId));
