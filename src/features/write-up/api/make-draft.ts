import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';
import type { DraftPreviewDto, ReplacedArticleDto } from '@shared/schemas/article';

/** A first draft from the newest recording's chapters and transcript, not saved (409 without footage). */
export const previewDraft = (tutorialId: string) => api<DraftPreviewDto>(`/tutorials/${tutorialId}/draft`, { method: 'POST' });

/** Makes the draft the write-up; the one it replaces stays in the revisions. */
export const applyDraft = (tutorialId: string, version: number) =>
  api<ReplacedArticleDto>(`/tutorials/${tutorialId}/draft/apply`, { method: 'POST', body: { version } });

/** Asks for the draft preview. */
export function usePreviewDraft(tutorialId: string) {
  return useMutation({ mutationFn: () => previewDraft(tutorialId) });
}

/** Applies the draft; the revisions list gains an entry. */
export function useApplyDraft(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (version: number) => applyDraft(tutorialId, version),
    onSuccess: () => qc.invalidateQueries({ queryKey: writeUpKeys.revisions(tutorialId) }),
  });
}
