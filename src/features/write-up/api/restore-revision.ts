import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReplacedArticleDto } from '@shared/schemas/article';
import { api } from '@/lib/api-client';
import { writeUpKeys } from './keys';

/** Makes an old revision the write-up again, as a new revision (nothing is thrown away). */
export const restoreRevision = (revisionId: string, version: number) =>
  api<ReplacedArticleDto>(`/revisions/${revisionId}/restore`, { method: 'POST', body: { version } });

/** Restores a revision; the list gains the restored copy. */
export function useRestoreRevision(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ revisionId, version }: { revisionId: string; version: number }) => restoreRevision(revisionId, version),
    onSuccess: () => qc.invalidateQueries({ queryKey: writeUpKeys.revisions(tutorialId) }),
  });
}
