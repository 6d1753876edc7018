import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClassDto, CreateClassInput, MessageAllInput, MessagesSentDto, UpdateClassInput } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** Schedules a class from a tutorial (201 with the class). */
export const createClass = ({ tutorialId, ...input }: CreateClassInput & { tutorialId: string }) =>
  api<ClassDto>(`/tutorials/${tutorialId}/classes`, { method: 'POST', body: input });

export function useCreateClass(studioId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createClass, onSuccess: () => qc.invalidateQueries({ queryKey: classKeys.studio(studioId) }) });
}

/** Every change to a class or its roster answers with the class; the cache takes it as it is. */
function useClassChange<V>(id: string, fn: (v: V) => Promise<ClassDto>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (k) => {
      qc.setQueryData(classKeys.detail(id), k);
      return qc.invalidateQueries({ queryKey: classKeys.all });
    },
  });
}

export const useUpdateClass = (id: string) =>
  useClassChange(id, (input: UpdateClassInput) => api<ClassDto>(`/classes/${id}`, { method: 'PATCH', body: input }));
export const useCancelClass = (id: string) => useClassChange(id, () => api<ClassDto>(`/classes/${id}/cancel`, { method: 'POST' }));
export const useCheckIn = (id: string) =>
  useClassChange(id, ({ registrationId, checkedIn }: { registrationId: string; checkedIn: boolean }) =>
    api<ClassDto>(`/classes/${id}/registrations/${registrationId}`, { method: 'PATCH', body: { checkedIn } }),
  );
export const useCancelRegistration = (id: string) =>
  useClassChange(id, ({ registrationId, refund }: { registrationId: string; refund: boolean }) =>
    api<ClassDto>(`/classes/${id}/registrations/${registrationId}/cancel`, { method: 'POST', body: { refund } }),
  );

/** Mails everyone with a seat. */
export function useMessageAll(id: string) {
  return useMutation({
    mutationFn: (input: MessageAllInput) => api<MessagesSentDto>(`/classes/${id}/messages`, { method: 'POST', body: input }),
  });
}

/** Sets a material's price per stock sheet (minor units) and refreshes the kit plan. */
export function useSetMaterialPrice(classId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ materialId, ...body }: { materialId: string; sheetPriceCents: number | null; sheetPriceCurrency: string | null }) =>
      api(`/materials/${materialId}/price`, { method: 'PUT', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: classKeys.kitPlan(classId) }),
  });
}
