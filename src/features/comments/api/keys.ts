/** Query keys of a tutorial's comments (one list per tutorial, with replies) and the people to mention. */
export const commentKeys = {
  all: ['comments'] as const,
  tutorial: (tutorialId: string) => [...commentKeys.all, tutorialId] as const,
  list: (tutorialId: string) => [...commentKeys.tutorial(tutorialId), 'list'] as const,
  mentionable: (tutorialId: string) => [...commentKeys.tutorial(tutorialId), 'mentionable'] as const,
};
