import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cutListKeys } from './keys';
import type { MentionDismissedDto, MentionsDto } from '@shared/schemas/piece';

export const dismissMention = ({ tutorialId, key, dismissed }: { tutorialId: string; key: string; dismissed: boolean }) =>
  api<MentionDismissedDto>(`/tutorials/${tutorialId}/mentions/dismiss`, { method: 'POST', body: { key, dismissed } });

/** Marks a mention "not a piece" (or brings it back); the list changes at once. */
export function useDismissMention(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { key: string; dismissed: boolean }) => dismissMention({ tutorialId, ...v }),
    onSuccess: ({ key, dismissed }) => {
      qc.setQueryData(cutListKeys.mentions(tutorialId), (old: MentionsDto | undefined) =>
        old ? { ...old, mentions: old.mentions.map((m) => (m.key === key ? { ...m, dismissed } : m)) } : old,
      );
      return qc.invalidateQueries({ queryKey: cutListKeys.mentions(tutorialId) });
    },
  });
}
