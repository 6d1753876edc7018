import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CompareDto } from '@shared/schemas/version';
import { api } from '@/lib/api-client';
import { versionKeys } from './keys';

/** Two versions side by side: `from` is published, sent_back, approved or a version's id; `to` the draft or a version's id. */
export const getCompare = (tutorialId: string, from: string, to = 'draft') =>
  api<CompareDto>(`/tutorials/${tutorialId}/compare?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`);

export const compareQueryOptions = (tutorialId: string, from: string, to = 'draft') =>
  queryOptions({ queryKey: versionKeys.compare(tutorialId, from, to), queryFn: () => getCompare(tutorialId, from, to) });

export const useCompare = (tutorialId: string, from: string | null, to = 'draft') =>
  useQuery({ ...compareQueryOptions(tutorialId, from ?? '', to), enabled: Boolean(from) });
