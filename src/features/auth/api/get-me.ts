import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/schemas/roles';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from './keys';

export type StudioMembership = { id: string; name: string; slug: string; role: Role };
export type Me = { user: { id: string; email: string; name: string }; studios: StudioMembership[]; outbox: boolean };

/** The signed-in person, or null when signed out. */
export async function getMe(): Promise<Me | null> {
  try {
    return await api<Me>('/auth/me');
  } catch (e) {
    if (e instanceof ApiError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });
export const useMe = () => useQuery(meQueryOptions());
