import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MadePiecesDto, PieceDto } from '@shared/schemas/piece';
import { api } from '@/lib/api-client';
import { refreshCutList } from './keys';

export const makePieces = ({ tutorialId, ...body }: { tutorialId: string; keys?: string[]; again?: boolean }) =>
  api<MadePiecesDto>(`/tutorials/${tutorialId}/mentions/pieces`, { method: 'POST', body });

export const addMentionScoreLines = ({
  tutorialId,
  ...body
}: {
  tutorialId: string;
  key: string;
  pieceId: string;
  axis: 'width' | 'height';
  again?: boolean;
}) => api<PieceDto>(`/tutorials/${tutorialId}/mentions/score-lines`, { method: 'POST', body });

/** "Make a piece" (keys of one mention) and "Make pieces from all" (no keys): finished pieces from what was said. */
export function useMakePieces(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { keys?: string[]; again?: boolean }) => makePieces({ tutorialId, ...v }),
    onSuccess: () => refreshCutList(qc, tutorialId),
  });
}

/** A score mention's lines onto a chosen piece; the mention then shows where it went. */
export function useAddMentionScoreLines(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { key: string; pieceId: string; axis: 'width' | 'height'; again?: boolean }) => addMentionScoreLines({ tutorialId, ...v }),
    onSuccess: () => refreshCutList(qc, tutorialId),
  });
}
