import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { supplyKeys } from './keys';
import type { SuppliesDto, SupplyDto, UpdateSupplyInput } from '@shared/schemas/supply';

/** Changes some of a supply's fields or its position (400 with field issues). */
export const updateSupply = ({ id, ...change }: UpdateSupplyInput & { id: string }) => api<SupplyDto>(`/supplies/${id}`, { method: 'PATCH', body: change });

const replace = (old: SuppliesDto | undefined, s: SupplyDto) => (old ? { ...old, supplies: old.supplies.map((x) => (x.id === s.id ? s : x)) } : old);

/**
 * Saves a change to one supply. The row shows the change at once (a ticked box stays ticked) and
 * goes back if the server refuses; the refetch then brings the disclosure up to date (a sponsored
 * link makes it required).
 */
export function useUpdateSupply(tutorialId: string) {
  const qc = useQueryClient();
  const key = supplyKeys.tutorial(tutorialId);
  return useMutation({
    mutationFn: updateSupply,
    onMutate: async ({ id, ...change }) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<SuppliesDto>(key);
      const current = before?.supplies.find((s) => s.id === id);
      if (current) qc.setQueryData<SuppliesDto>(key, (old) => replace(old, { ...current, ...change }));
      return { before };
    },
    onError: (_e, _v, ctx) => {
      if (ctx?.before) qc.setQueryData(key, ctx.before);
    },
    onSuccess: (s) => {
      qc.setQueryData<SuppliesDto>(key, (old) => replace(old, s));
    },
    onSettled: () => qc.invalidateQueries({ queryKey: key }),
  });
}
