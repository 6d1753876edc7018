import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { materialSchema, updateMaterialSchema, MaterialDto } from '@shared/schemas/piece';
import { api } from '@/lib/api-client';
import { refreshCutList } from './keys';

export type MaterialInput = z.input<typeof materialSchema>;
export type MaterialChange = z.input<typeof updateMaterialSchema>;

export const createMaterial = ({ tutorialId, ...input }: MaterialInput & { tutorialId: string }) =>
  api<MaterialDto>(`/tutorials/${tutorialId}/materials`, { method: 'POST', body: input });
export const updateMaterial = ({ id, ...input }: MaterialChange & { id: string }) => api<MaterialDto>(`/materials/${id}`, { method: 'PATCH', body: input });
export const deleteMaterial = (id: string) => api<void>(`/materials/${id}`, { method: 'DELETE' });

// A material's sheet changes its pieces' checks and the sheet plan; a rename moves pieces along.
const invalidate = refreshCutList;

/** Adds a material with its stock sheet. */
export function useCreateMaterial(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (input: MaterialInput) => createMaterial({ tutorialId, ...input }), onSuccess: () => invalidate(qc, tutorialId) });
}

/** Changes a material (renaming carries its pieces along on the server). */
export function useUpdateMaterial(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateMaterial, onSuccess: () => invalidate(qc, tutorialId) });
}

/** Deletes a material; its pieces fall back to the default 12 x 12 in sheet. */
export function useDeleteMaterial(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deleteMaterial, onSuccess: () => invalidate(qc, tutorialId) });
}
