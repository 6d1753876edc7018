import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeDto, SessionDto } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

/** The signed-in person, or null when signed out. */
export async function getMe(): Promise<MeDto | null> {
  return (await api<SessionDto>('/auth/session')).me;
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });
export const useMe = () => useQuery(meQueryOptions());
