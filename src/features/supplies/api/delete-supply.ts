import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { supplyKeys } from './keys';
import type { SuppliesDto } from '@shared/schemas/supply';

/** Deletes a supply (204). */
export const deleteSupply = (id: string) => api<void>(`/supplies/${id}`, { method: 'DELETE' });

/** Deletes a supply; the row leaves the table at once and comes back if the server refuses. */
export function useDeleteSupply(tutorialId: string) {
  const qc = useQueryClient();
  const key = supplyKeys.tutorial(tutorialId);
  return useMutation({
    mutationFn: deleteSupply,
    onMutate: async (id) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<SuppliesDto>(key);
      qc.setQueryData<SuppliesDto>(key, (old) => (old ? { ...old, supplies: old.supplies.filter((s) => s.id !== id) } : old));
      return { before };
    },
    onError: (_e, _id, ctx) => {
      if (ctx?.before) qc.setQueryData(key, ctx.before);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: key }),
  });
}
