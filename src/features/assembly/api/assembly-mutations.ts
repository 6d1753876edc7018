import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assembly';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './keys';

type Action = 'run' | 'accept' | 'drop' | 'undo';

export const assemblyAction = ({ tutorialId, action, ids }: { tutorialId: string; action: Action; ids?: string[] }) =>
  api<AssemblyDto>(`/tutorials/${tutorialId}/assembly${action === 'run' ? '' : `/${action}`}`, { method: 'POST', body: ids ? { ids } : {} });

/**
 * Runs the assembly, or accepts, drops or undoes proposals. One choice can make chapters, stills,
 * pieces, supplies and the write-up, which four sections read: every cached read is refreshed.
 */
export function useAssemblyAction(tutorialId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { action: Action; ids?: string[] }) => assemblyAction({ tutorialId, ...v }),
    onSuccess: async (data) => {
      qc.setQueriesData({ queryKey: assemblyKeys.tutorial(tutorialId) }, () => data);
      await qc.invalidateQueries({ predicate: (q) => q.queryKey[0] !== assemblyKeys.all[0] });
    },
  });
}
