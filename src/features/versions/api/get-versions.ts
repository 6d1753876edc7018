import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VersionsDto } from '@shared/schemas/version';
import { api } from '@/lib/api-client';
import { versionKeys } from './keys';

/** The tutorial's kept versions (newest first) and the state of its update. */
export const getVersions = (tutorialId: string) => api<VersionsDto>(`/tutorials/${tutorialId}/versions`);

export const versionsQueryOptions = (tutorialId: string) => queryOptions({ queryKey: versionKeys.list(tutorialId), queryFn: () => getVersions(tutorialId) });

export const useVersions = (tutorialId: string, enabled = true) => useQuery({ ...versionsQueryOptions(tutorialId), enabled });
