import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { ChaptersDto } from '@shared/schemas/footage';

/** A recording's chapters in time order. */
export const getChapters = (recordingId: string) => api<ChaptersDto>(`/recordings/${recordingId}/chapters`);
export const chaptersQueryOptions = (recordingId: string) =>
  queryOptions({ queryKey: footageKeys.chapters(recordingId), queryFn: () => getChapters(recordingId) });
export const useChapters = (recordingId: string) => useQuery(chaptersQueryOptions(recordingId));
