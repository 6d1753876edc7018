import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';

/** Deletes a recording with its files, transcript, chapters and stills. */
export const deleteRecording = (id: string) => api<void>(`/recordings/${id}`, { method: 'DELETE' });
export function useDeleteRecording(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteRecording,
    onSuccess: (_v, id) => {
      qc.removeQueries({ queryKey: footageKeys.scope(id) });
      return qc.invalidateQueries({ queryKey: footageKeys.tutorialRecordings(tutorialId) });
    },
  });
}
