/**
 * Query keys of the Cut list section. Everything about one tutorial's cut list sits under
 * `cutListKeys.tutorial(id)`, so a change that moves checks (precision, a material's sheet)
 * refreshes all of it with one prefix.
 */
export const cutListKeys = {
  all: ['cut-list'] as const,
  tutorial: (tutorialId: string) => [...cutListKeys.all, tutorialId] as const,
  pieces: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'pieces'] as const,
  mentions: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'mentions'] as const,
  materials: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'materials'] as const,
  sheetPlans: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'sheet-plan'] as const,
  sheetPlan: (tutorialId: string, params: { kits: number; spares: number }) => [...cutListKeys.sheetPlans(tutorialId), params] as const,
};
