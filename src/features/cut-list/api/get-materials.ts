import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { Material } from './types';

/** The tutorial's materials with their stock sheets. */
export const getMaterials = (tutorialId: string) => api<{ materials: Material[] }>(`/tutorials/${tutorialId}/materials`);
export const materialsQueryOptions = (tutorialId: string) => queryOptions({ queryKey: cutListKeys.materials(tutorialId), queryFn: () => getMaterials(tutorialId) });
/** The materials of a tutorial. */
export const useMaterials = (tutorialId: string) => useQuery(materialsQueryOptions(tutorialId));
