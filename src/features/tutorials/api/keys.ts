export const tutorialKeys = {
  all: ['tutorials'] as const,
  lists: () => [...tutorialKeys.all, 'list'] as const,
  list: (studioId: string, params: { state?: string; q?: string } = {}) => [...tutorialKeys.lists(), studioId, params] as const,
  details: () => [...tutorialKeys.all, 'detail'] as const,
  detail: (id: string) => [...tutorialKeys.details(), id] as const,
};
