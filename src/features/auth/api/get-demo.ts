import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/schemas/roles';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export type Demo = { present: boolean; password?: string; people: { email: string; name: string; role: Role }[] };

export const getDemo = () => api<Demo>('/auth/demo');
export const demoQueryOptions = () => queryOptions({ queryKey: authKeys.demo(), queryFn: getDemo, staleTime: Infinity });
export const useDemo = () => useQuery(demoQueryOptions());
