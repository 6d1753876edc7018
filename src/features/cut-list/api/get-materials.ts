import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { MaterialsDto } from '@shared/schemas/piece';

/** The tutorial's materials with their stock sheets. */
export const getMaterials = (tutorialId: string) => api<MaterialsDto>(`/tutorials/${tutorialId}/materials`);
export const materialsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: cutListKeys.materials(tutorialId), queryFn: () => getMaterials(tutorialId) });
/** The materials of a tutorial. */
export const useMaterials = (tutorialId: string) => useQuery(materialsQueryOptions(tutorialId));
