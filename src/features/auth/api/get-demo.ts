import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DemoDto } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './keys';

export const getDemo = () => api<DemoDto>('/auth/demo');
export const demoQueryOptions = () => queryOptions({ queryKey: authKeys.demo(), queryFn: getDemo, staleTime: Infinity });
export const useDemo = () => useQuery(demoQueryOptions());
