import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/schemas/roles';
import type { InvitationCreatedDto, InviteInput, MembersDto } from '@shared/schemas/studio';
import { api } from '@/lib/api-client';
import { studioKeys } from './keys';

export const getMembers = (studioId: string) => api<MembersDto>(`/studios/${studioId}/members`);
export const membersQueryOptions = (studioId: string) => queryOptions({ queryKey: studioKeys.members(studioId), queryFn: () => getMembers(studioId) });
export const useMembers = (studioId: string) => useQuery(membersQueryOptions(studioId));

function useMembersMutation<V, R = unknown>(studioId: string, fn: (v: V) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: studioKeys.members(studioId) }) });
}

export const useInvite = (studioId: string) =>
  useMembersMutation(studioId, (input: InviteInput) => api<InvitationCreatedDto>(`/studios/${studioId}/invitations`, { method: 'POST', body: input }));
export const useChangeRole = (studioId: string) =>
  useMembersMutation(studioId, ({ userId, role }: { userId: string; role: Role }) =>
    api(`/studios/${studioId}/members/${userId}`, { method: 'PATCH', body: { role } }),
  );
export const useRemoveMember = (studioId: string) =>
  useMembersMutation(studioId, (userId: string) => api(`/studios/${studioId}/members/${userId}`, { method: 'DELETE' }));
export const useWithdrawInvitation = (studioId: string) =>
  useMembersMutation(studioId, (id: string) => api(`/studios/${studioId}/invitations/${id}`, { method: 'DELETE' }));
