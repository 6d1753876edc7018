/** Query keys of a tutorial's review: its history of moves and its checklist. */
export const reviewKeys = {
  all: ['review'] as const,
  tutorial: (tutorialId: string) => [...reviewKeys.all, tutorialId] as const,
  history: (tutorialId: string) => [...reviewKeys.tutorial(tutorialId), 'history'] as const,
  checklist: (tutorialId: string) => [...reviewKeys.tutorial(tutorialId), 'checklist'] as const,
};
