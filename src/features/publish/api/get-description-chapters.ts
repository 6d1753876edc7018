import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { publishKeys } from './keys';
import type { ChapterDto, ChaptersDto, RecordingsDto } from '@shared/schemas/footage';

export type ChapterInfo = Pick<ChapterDto, 'title' | 'startMs'>;
/** The chapters the description lists (those of the newest recording) and how long that recording runs. */
export type DescriptionChapters = { chapters: ChapterInfo[]; durationMs: number | null; hasRecording: boolean };

/**
 * The chapters the video description lists: those of the tutorial's newest recording, as the
 * server's publish bundle picks it, with that recording's length (for the 10-second rule).
 */
export async function getDescriptionChapters(tutorialId: string): Promise<DescriptionChapters> {
  const { recordings } = await api<RecordingsDto>(`/tutorials/${tutorialId}/recordings`);
  const newest = [...recordings].sort((a, b) => b.createdAt.localeCompare(a.createdAt))[0];
  if (!newest) return { chapters: [], durationMs: null, hasRecording: false };
  const { chapters } = await api<ChaptersDto>(`/recordings/${newest.id}/chapters`);
  return { chapters: chapters.map((c) => ({ title: c.title, startMs: c.startMs })), durationMs: newest.durationMs, hasRecording: true };
}
export const descriptionChaptersQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: publishKeys.chapters(tutorialId), queryFn: () => getDescriptionChapters(tutorialId) });
/** The description's chapters and the recording's length. */
export const useDescriptionChapters = (tutorialId: string) => useQuery(descriptionChaptersQueryOptions(tutorialId));
