import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { SheetPlanDto } from '@shared/schemas/piece';

type Params = { kits: number; spares: number };

/** Every material's pieces laid out on its stock sheets, for N kits plus spares. */
export const getSheetPlan = (tutorialId: string, { kits, spares }: Params) =>
  api<SheetPlanDto>(`/tutorials/${tutorialId}/sheet-plan?kits=${kits}&spares=${spares}`);
export const sheetPlanQueryOptions = (tutorialId: string, params: Params) =>
  queryOptions({ queryKey: cutListKeys.sheetPlan(tutorialId, params), queryFn: () => getSheetPlan(tutorialId, params), placeholderData: keepPreviousData });
/** The sheet plan; the last plan stays on screen while a new kit count is planned. */
export const useSheetPlan = (tutorialId: string, params: Params, enabled = true) => useQuery({ ...sheetPlanQueryOptions(tutorialId, params), enabled });
