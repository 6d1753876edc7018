import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KitPlanDto } from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** The kit planner's figures for a class. */
export const getKitPlan = (id: string) => api<KitPlanDto>(`/classes/${id}/kit-plan`);
export const kitPlanQueryOptions = (id: string) => queryOptions({ queryKey: classKeys.kitPlan(id), queryFn: () => getKitPlan(id) });
export const useKitPlan = (id: string) => useQuery(kitPlanQueryOptions(id));
