import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReplacedArticleDto } from '@shared/schemas/article';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';

/** Where the server's Markdown file of the saved write-up is downloaded from (a plain GET with the session cookie). */
export const markdownExportUrl = (tutorialId: string) => `/api/tutorials/${tutorialId}/article/markdown`;

/** Replaces the write-up with a Markdown file's content; the old one stays in the revisions. */
export const importMarkdown = (tutorialId: string, markdown: string, version: number) =>
  api<ReplacedArticleDto>(`/tutorials/${tutorialId}/article/markdown`, { method: 'POST', body: { markdown, version } });

/** Imports Markdown; the revisions list gains the import. */
export function useImportMarkdown(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ markdown, version }: { markdown: string; version: number }) => importMarkdown(tutorialId, markdown, version),
    onSuccess: () => qc.invalidateQueries({ queryKey: writeUpKeys.revisions(tutorialId) }),
  });
}
