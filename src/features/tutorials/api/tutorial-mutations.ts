import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateTutorialInput, UpdateTutorialInput, TutorialDto } from '@shared/schemas/tutorial';
import { api } from '@/lib/api-client';
import { tutorialKeys } from './keys';

export const createTutorial = (input: CreateTutorialInput) => api<TutorialDto>('/tutorials', { method: 'POST', body: input });
export function useCreateTutorial() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createTutorial, onSuccess: () => qc.invalidateQueries({ queryKey: tutorialKeys.lists() }) });
}

export const updateTutorial = ({ id, ...input }: UpdateTutorialInput & { id: string }) =>
  api<TutorialDto>(`/tutorials/${id}`, { method: 'PATCH', body: input });
export function useUpdateTutorial() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateTutorial,
    onSuccess: (t) => {
      qc.setQueryData(tutorialKeys.detail(t.id), t);
      return qc.invalidateQueries({ queryKey: tutorialKeys.lists() });
    },
  });
}

export const deleteTutorial = (id: string) => api<void>(`/tutorials/${id}`, { method: 'DELETE' });
export function useDeleteTutorial() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteTutorial,
    onSuccess: (_v, id) => {
      qc.removeQueries({ queryKey: tutorialKeys.detail(id) });
      return qc.invalidateQueries({ queryKey: tutorialKeys.lists() });
    },
  });
}
