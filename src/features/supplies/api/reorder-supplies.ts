import { useMutation, useQueryClient } from '@tanstack/react-query';
import { supplyKeys } from './keys';
import type { SuppliesDto, SupplyDto } from '@shared/schemas/supply';
import { updateSupply } from './update-supply';
import { positionChanges } from '../utils/supply-order';

/**
 * Stores a new order: the list moves at once, then each supply whose place changed is given its
 * new position (through PATCH /supplies/:id). Moves made in quick succession are sent one after
 * another (one mutation scope), so a later move never lands before an earlier one; the list is
 * read back once the last of them is done. A failure puts the order from before it back.
 */
export function useReorderSupplies(tutorialId: string) {
  const qc = useQueryClient();
  const key = supplyKeys.tutorial(tutorialId);
  const mutationKey = supplyKeys.reorder(tutorialId);
  return useMutation({
    mutationKey,
    scope: { id: mutationKey.join('/') },
    mutationFn: async (ordered: SupplyDto[]) => {
      for (const c of positionChanges(ordered)) await updateSupply(c);
    },
    onMutate: async (ordered) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<SuppliesDto>(key);
      qc.setQueryData<SuppliesDto>(key, (old) => (old ? { ...old, supplies: ordered.map((s, i) => ({ ...s, position: i })) } : old));
      return { before };
    },
    onError: (_e, _v, ctx) => {
      if (ctx?.before) qc.setQueryData(key, ctx.before);
    },
    // This mutation still counts as running here; more than one means a later move is queued.
    onSettled: () => (qc.isMutating({ mutationKey }) > 1 ? undefined : qc.invalidateQueries({ queryKey: key })),
  });
}
