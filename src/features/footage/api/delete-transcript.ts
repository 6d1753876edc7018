import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';

/** Removes the transcript and its cues; chapters and stills stay. */
export const deleteTranscript = (recordingId: string) => api<void>(`/recordings/${recordingId}/transcript`, { method: 'DELETE' });
export function useDeleteTranscript(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => deleteTranscript(recordingId),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: footageKeys.recording(recordingId) }),
        qc.invalidateQueries({ queryKey: footageKeys.allCues(recordingId) }),
        qc.invalidateQueries({ queryKey: footageKeys.chapterSuggestions(recordingId) }),
      ]),
  });
}
