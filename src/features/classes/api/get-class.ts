import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClassDto } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** One class with its roster (those who run it). */
export const getClass = (id: string) => api<ClassDto>(`/classes/${id}`);
export const classQueryOptions = (id: string) => queryOptions({ queryKey: classKeys.detail(id), queryFn: () => getClass(id), refetchInterval: 10_000 });
export const useClass = (id: string) => useQuery(classQueryOptions(id));
