import { resourceKeys } from '@/lib/resources';

/**
 * Query keys of the Supplies section. The list and its disclosure are one shared read keyed by
 * resource (`resourceKeys.supplies`, which the write-up's live list reads too).
 */
export const supplyKeys = {
  all: ['supplies'] as const,
  tutorial: resourceKeys.supplies,
  /** The mutation key (and scope) of moves, so they run one after another. */
  reorder: (tutorialId: string) => [...supplyKeys.all, 'reorder', tutorialId] as const,
};
