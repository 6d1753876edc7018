import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InvitationAcceptedDto, InvitationPreviewDto } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getInvitation = (token: string) => api<InvitationPreviewDto>(`/invitations/${encodeURIComponent(token)}`);
export const invitationQueryOptions = (token: string) => queryOptions({ queryKey: authKeys.invitation(token), queryFn: () => getInvitation(token) });
// No token (a plain sign-up): nothing to ask the server.
export const useInvitation = (token: string) => useQuery({ ...invitationQueryOptions(token), enabled: token !== '' });

export const acceptInvitation = (token: string) => api<InvitationAcceptedDto>('/invitations/accept', { method: 'POST', body: { token } });
export function useAcceptInvitation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: acceptInvitation, onSuccess: () => qc.invalidateQueries({ queryKey: authKeys.all }) });
}
