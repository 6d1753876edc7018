import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateSupplyInput, SupplyDto } from '@shared/schemas/supply';
import { api } from '@/lib/api-client';
import { supplyKeys } from './keys';

/** Adds a supply at the end of the list (201 Supply; 400 with field issues). */
export const createSupply = ({ tutorialId, ...input }: CreateSupplyInput & { tutorialId: string }) =>
  api<SupplyDto>(`/tutorials/${tutorialId}/supplies`, { method: 'POST', body: input });

/** Adds one supply. */
export function useCreateSupply(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateSupplyInput) => createSupply({ tutorialId, ...input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: supplyKeys.tutorial(tutorialId) }),
  });
}

/** What adding a pasted list did: the supplies added and, when one was refused, which and why. */
export type AddedSupplies = { added: SupplyDto[]; refused: { input: CreateSupplyInput; error: unknown } | null };

/**
 * Adds several supplies in the order given (a pasted list). They go one after another so they
 * keep that order; at the first refusal it stops, and those before it stay added.
 */
export function useCreateSupplies(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (inputs: CreateSupplyInput[]): Promise<AddedSupplies> => {
      const added: SupplyDto[] = [];
      for (const input of inputs) {
        try {
          added.push(await createSupply({ tutorialId, ...input }));
        } catch (error) {
          return { added, refused: { input, error } };
        }
      }
      return { added, refused: null };
    },
    onSettled: () => qc.invalidateQueries({ queryKey: supplyKeys.tutorial(tutorialId) }),
  });
}

/** Puts a deleted supply back where it was: added again, then given its old position. */
export function useRestoreSupply(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id: _id, position, ...fields }: SupplyDto) => {
      const s = await createSupply({ tutorialId, ...fields, url: fields.url ?? undefined, discountCode: fields.discountCode ?? undefined });
      // Deleting leaves the other positions alone, so the old one is free again.
      return api<SupplyDto>(`/supplies/${s.id}`, { method: 'PATCH', body: { position } });
    },
    onSettled: () => qc.invalidateQueries({ queryKey: supplyKeys.tutorial(tutorialId) }),
  });
}
