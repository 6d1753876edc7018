import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { ChapterSuggestionsDto } from '@shared/schemas/footage';

/** Chapters the transcript's own cue phrases suggest, minus times already taken by a chapter. */
export const getChapterSuggestions = (recordingId: string) => api<ChapterSuggestionsDto>(`/recordings/${recordingId}/chapter-suggestions`);
export const chapterSuggestionsQueryOptions = (recordingId: string) =>
  queryOptions({ queryKey: footageKeys.chapterSuggestions(recordingId), queryFn: () => getChapterSuggestions(recordingId) });
export const useChapterSuggestions = (recordingId: string, opts: { enabled?: boolean } = {}) =>
  useQuery({ ...chapterSuggestionsQueryOptions(recordingId), enabled: opts.enabled ?? true });
