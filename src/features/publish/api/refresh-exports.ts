import { useQueryClient } from '@tanstack/react-query';
import { publishKeys } from './keys';

/** Refetches everything the Publish section shows, for changes made on the tutorial (its video address). */
export function useRefreshExports(tutorialId: string) {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: publishKeys.tutorial(tutorialId) });
}
