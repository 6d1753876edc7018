import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Transition, TutorialDto } from '@shared/schemas/tutorial';
import { api } from '@/lib/api-client';
import { publishKeys } from './keys';

/** POST a review move; 409 when the move does not fit the state, 403 without the role. */
export const changeState = ({ id, action, note, confirmWarnings }: { id: string; action: Transition; note?: string; confirmWarnings?: boolean }) =>
  api<TutorialDto>(`/tutorials/${id}/state`, { method: 'POST', body: { action, ...(note ? { note } : {}), ...(confirmWarnings ? { confirmWarnings } : {}) } });

/**
 * Moves the tutorial through review. Publishing puts the public address into the exports, so they
 * are all refetched; `onMoved` lets the page update the tutorial it holds (the header's state).
 */
export function useChangeState(tutorialId: string, onMoved?: (t: TutorialDto) => unknown) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { action: Transition; note?: string; confirmWarnings?: boolean }) => changeState({ id: tutorialId, ...input }),
    onSuccess: async (t) => {
      await onMoved?.(t);
      return qc.invalidateQueries({ queryKey: publishKeys.tutorial(tutorialId) });
    },
  });
}
