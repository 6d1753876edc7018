/** Query keys of the Supplies section; one read per tutorial holds the list and its disclosure. */
export const supplyKeys = {
  all: ['supplies'] as const,
  tutorial: (tutorialId: string) => [...supplyKeys.all, 'tutorial', tutorialId] as const,
  /** The mutation key (and scope) of moves, so they run one after another. */
  reorder: (tutorialId: string) => [...supplyKeys.all, 'reorder', tutorialId] as const,
};
