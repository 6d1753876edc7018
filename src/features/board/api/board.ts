import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { BoardDto } from '@shared/schemas/board';
import type { Transition, TutorialDto } from '@shared/schemas/tutorial';
import { api } from '@/lib/api-client';

type Params = { month?: string; makerId?: string; timeZone: string };

export const boardKeys = {
  all: ['board'] as const,
  detail: (studioId: string, params: Params) => [...boardKeys.all, studioId, params] as const,
};

export function getBoard(studioId: string, params: Params) {
  const qs = new URLSearchParams(Object.entries(params).filter(([, v]) => v) as [string, string][]).toString();
  return api<BoardDto>(`/studios/${studioId}/board?${qs}`);
}
export const boardQueryOptions = (studioId: string, params: Params) =>
  queryOptions({ queryKey: boardKeys.detail(studioId, params), queryFn: () => getBoard(studioId, params), placeholderData: keepPreviousData });
export const useBoard = (studioId: string, params: Params) => useQuery(boardQueryOptions(studioId, params));

/** A card's move: the same review move (and rules) as the Publish section's buttons. */
export function useMoveCard() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, action, note }: { id: string; action: Transition; note?: string }) =>
      api<TutorialDto>(`/tutorials/${id}/state`, { method: 'POST', body: note ? { action, note } : { action } }),
    onSettled: () => qc.invalidateQueries({ queryKey: boardKeys.all }),
  });
}
