export const briefKeys = {
  all: ['briefs'] as const,
  list: (studioId: string) => [...briefKeys.all, 'list', studioId] as const,
  targets: (studioId: string) => [...briefKeys.all, 'targets', studioId] as const,
  ofTutorial: (tutorialId: string) => [...briefKeys.all, 'tutorial', tutorialId] as const,
};
