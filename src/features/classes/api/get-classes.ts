import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClassListDto } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** The studio's classes, soonest first. */
export const getClasses = (studioId: string) => api<ClassListDto>(`/studios/${studioId}/classes`);
export const classesQueryOptions = (studioId: string) => queryOptions({ queryKey: classKeys.studio(studioId), queryFn: () => getClasses(studioId) });
export const useClasses = (studioId: string) => useQuery(classesQueryOptions(studioId));
