import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreatePieceInput, UpdatePieceInput, CutListDto, PieceDto } from '@shared/schemas/piece';
import { api } from '@/lib/api-client';
import { cutListKeys, refreshCutList } from './keys';

export const createPiece = ({ tutorialId, ...input }: CreatePieceInput & { tutorialId: string }) =>
  api<PieceDto>(`/tutorials/${tutorialId}/pieces`, { method: 'POST', body: input });
export const updatePiece = ({ id, ...input }: UpdatePieceInput & { id: string }) => api<PieceDto>(`/pieces/${id}`, { method: 'PATCH', body: input });
/**
 * A change for one piece that also carries its material. The shared update schema gives
 * `material` a default of '', so a PATCH without it would empty the piece's material; sending
 * the current one keeps it until the schema leaves absent fields alone.
 */
export const pieceChange = (p: Pick<PieceDto, 'material'>, change: UpdatePieceInput): UpdatePieceInput => ({ material: p.material, ...change });

export const deletePiece = (id: string) => api<void>(`/pieces/${id}`, { method: 'DELETE' });

// A piece's checks depend on the others (mats) and the sheet plan on all of them: refresh the whole cut list.
const invalidate = refreshCutList;

/** Adds a piece at the end of the cut list. */
export function useCreatePiece(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (input: CreatePieceInput) => createPiece({ tutorialId, ...input }), onSuccess: () => invalidate(qc, tutorialId) });
}

/** Changes some fields of a piece; the row shows the server's answer before the refetch lands. */
export function useUpdatePiece(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updatePiece,
    onSuccess: (p) => {
      qc.setQueryData(cutListKeys.pieces(tutorialId), (old: CutListDto | undefined) =>
        old ? { ...old, pieces: old.pieces.map((x) => (x.id === p.id ? p : x)) } : old,
      );
      return invalidate(qc, tutorialId);
    },
  });
}

/** Deletes a piece. */
export function useDeletePiece(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deletePiece, onSuccess: () => invalidate(qc, tutorialId) });
}

/**
 * Moves a piece one place up or down. Positions are renumbered 0..n-1 in the new order and only
 * the pieces whose number changed are sent, so gaps left by deletions cannot stop a swap.
 */
export function useMovePiece(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ pieces, id, by }: { pieces: PieceDto[]; id: string; by: -1 | 1 }) => {
      const from = pieces.findIndex((p) => p.id === id);
      const to = from + by;
      if (from < 0 || to < 0 || to >= pieces.length) return;
      const order = [...pieces];
      [order[from], order[to]] = [order[to]!, order[from]!];
      qc.setQueryData(cutListKeys.pieces(tutorialId), (old: CutListDto | undefined) =>
        old ? { ...old, pieces: order.map((p, i) => ({ ...p, position: i })) } : old,
      );
      for (const [i, p] of order.entries()) if (p.position !== i) await updatePiece({ id: p.id, ...pieceChange(p, { position: i }) });
    },
    onSettled: () => invalidate(qc, tutorialId),
  });
}
