import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/schemas/roles';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export type InvitationPreview = { email: string; role: Role; studio: { id: string; name: string }; hasAccount: boolean; expiresAt: string };

export const getInvitation = (token: string) => api<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`);
export const invitationQueryOptions = (token: string) => queryOptions({ queryKey: authKeys.invitation(token), queryFn: () => getInvitation(token) });
export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));

export const acceptInvitation = (token: string) => api<{ studioId: string }>('/invitations/accept', { method: 'POST', body: { token } });
export function useAcceptInvitation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: acceptInvitation, onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.all }) });
}
