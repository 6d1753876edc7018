import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { ChapterDto, CreateChapterInput, UpdateChapterInput } from '@shared/schemas/footage';

export const createChapter = ({ recordingId, ...input }: CreateChapterInput & { recordingId: string }) =>
  api<ChapterDto>(`/recordings/${recordingId}/chapters`, { method: 'POST', body: input });
export const updateChapter = ({ id, ...input }: UpdateChapterInput & { id: string }) => api<ChapterDto>(`/chapters/${id}`, { method: 'PATCH', body: input });
export const deleteChapter = (id: string) => api<void>(`/chapters/${id}`, { method: 'DELETE' });

// Suggestions leave out times a chapter already takes, so they change with the chapters.
const invalidate = (qc: ReturnType<typeof useQueryClient>, recordingId: string) =>
  Promise.all([
    qc.invalidateQueries({ queryKey: footageKeys.chapters(recordingId) }),
    qc.invalidateQueries({ queryKey: footageKeys.chapterSuggestions(recordingId) }),
  ]);

/** Adds a chapter to the recording. */
export function useCreateChapter(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { title: string; startMs: number }) => createChapter({ recordingId, ...input }),
    onSuccess: () => invalidate(qc, recordingId),
  });
}

/** Renames or retimes a chapter; the list shows the change before the refetch lands. */
export function useUpdateChapter(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateChapter,
    onSuccess: (c) => {
      qc.setQueryData(footageKeys.chapters(recordingId), (old: { chapters: ChapterDto[] } | undefined) =>
        old ? { chapters: old.chapters.map((x) => (x.id === c.id ? c : x)).sort((a, b) => a.startMs - b.startMs) } : old,
      );
      return invalidate(qc, recordingId);
    },
  });
}

/** Deletes a chapter. */
export function useDeleteChapter(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deleteChapter, onSuccess: () => invalidate(qc, recordingId) });
}
