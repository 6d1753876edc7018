import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { supplyKeys } from './keys';
import type { DisclosureDto, SuppliesDto } from '@shared/schemas/supply';

/** Saves the tutorial's own disclosure wording; null goes back to the default wording. */
export const updateDisclosure = ({ tutorialId, disclosure }: { tutorialId: string; disclosure: string | null }) =>
  api<DisclosureDto>(`/tutorials/${tutorialId}/disclosure`, { method: 'PUT', body: { disclosure } });

/** Saves the disclosure wording (or resets it) and shows the saved text at once. */
export function useUpdateDisclosure(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (disclosure: string | null) => updateDisclosure({ tutorialId, disclosure }),
    onSuccess: (d) => {
      qc.setQueryData<SuppliesDto>(supplyKeys.tutorial(tutorialId), (old) => (old ? { ...old, disclosure: d } : old));
      return qc.invalidateQueries({ queryKey: supplyKeys.tutorial(tutorialId) });
    },
  });
}
