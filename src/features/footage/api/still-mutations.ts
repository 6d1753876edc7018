import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateStillInput, StillDto } from '@shared/schemas/footage';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';

export const createStill = ({ recordingId, ...input }: CreateStillInput & { recordingId: string }) =>
  api<StillDto>(`/recordings/${recordingId}/stills`, { method: 'POST', body: input });
export const updateStill = ({ id, ...input }: { id: string; caption?: string; alt?: string }) =>
  api<StillDto>(`/stills/${id}`, { method: 'PATCH', body: input });
export const deleteStill = (id: string) => api<void>(`/stills/${id}`, { method: 'DELETE' });

/** Pulls a still at a time: the exact frame, or the sharpest within a second of it. */
export function useCreateStill(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateStillInput) => createStill({ recordingId, ...input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: footageKeys.stills(recordingId) }),
  });
}

/** Saves a still's caption or alt text. */
export function useUpdateStill(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateStill,
    onSuccess: (s) => {
      qc.setQueryData(footageKeys.stills(recordingId), (old: { stills: StillDto[] } | undefined) =>
        old ? { stills: old.stills.map((x) => (x.id === s.id ? s : x)) } : old,
      );
      return qc.invalidateQueries({ queryKey: footageKeys.stills(recordingId) });
    },
  });
}

/** Deletes a still and its image. */
export function useDeleteStill(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deleteStill, onSuccess: () => qc.invalidateQueries({ queryKey: footageKeys.stills(recordingId) }) });
}
