/** Query keys of a tutorial's versions: the kept ones and a comparison of two. */
export const versionKeys = {
  all: ['versions'] as const,
  tutorial: (tutorialId: string) => [...versionKeys.all, tutorialId] as const,
  list: (tutorialId: string) => [...versionKeys.tutorial(tutorialId), 'list'] as const,
  compare: (tutorialId: string, from: string, to: string) => [...versionKeys.tutorial(tutorialId), 'compare', from, to] as const,
};
