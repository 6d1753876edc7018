import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MailSettingsDto, UpdateMailSettingsInput } from '@shared/schemas/mail-settings';
import { api } from '@/lib/api-client';
import { mailSettingsKeys } from './keys';

/** Which kinds of mail the signed-in person gets from a studio. */
export const getMailSettings = (studioId: string) => api<MailSettingsDto>(`/studios/${studioId}/mail-settings`);

export const mailSettingsQueryOptions = (studioId: string) =>
  queryOptions({ queryKey: mailSettingsKeys.studio(studioId), queryFn: () => getMailSettings(studioId) });

export const useMailSettings = (studioId: string) => useQuery(mailSettingsQueryOptions(studioId));

/** Turns kinds on or off; the answer is the whole list, which replaces the cached one. */
export const updateMailSettings = ({ studioId, changes }: { studioId: string; changes: UpdateMailSettingsInput }) =>
  api<MailSettingsDto>(`/studios/${studioId}/mail-settings`, { method: 'PUT', body: changes });

export function useUpdateMailSettings(studioId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (changes: UpdateMailSettingsInput) => updateMailSettings({ studioId, changes }),
    onSuccess: (data) => qc.setQueryData(mailSettingsKeys.studio(studioId), data),
  });
}
