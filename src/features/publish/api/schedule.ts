import { useMutation } from '@tanstack/react-query';
import type { SchedulePublishInput } from '@shared/schemas/board';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { api } from '@/lib/api-client';

/** Sets (or moves) the time an approved tutorial publishes itself, or cancels it. */
export function useSchedulePublish(tutorialId: string, onChanged?: (t: TutorialDto) => unknown) {
  const set = useMutation({
    mutationFn: (input: SchedulePublishInput) => api<TutorialDto>(`/tutorials/${tutorialId}/schedule`, { method: 'PUT', body: input }),
    onSuccess: (t) => onChanged?.(t),
  });
  const cancel = useMutation({
    mutationFn: () => api<TutorialDto>(`/tutorials/${tutorialId}/schedule`, { method: 'DELETE' }),
    onSuccess: (t) => onChanged?.(t),
  });
  return { set, cancel };
}
