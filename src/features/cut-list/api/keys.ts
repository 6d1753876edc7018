import type { QueryClient } from '@tanstack/react-query';
import { resourceKeys } from '@/lib/resources';

/**
 * Query keys of the Cut list section. The pieces are a shared read keyed by resource
 * (`resourceKeys.pieces`, which the write-up's live table reads too); the section's own reads sit
 * under `cutListKeys.tutorial(id)`. `refreshCutList` refreshes both, for a change that moves
 * checks (precision, a material's sheet).
 */
export const cutListKeys = {
  all: ['cut-list'] as const,
  tutorial: (tutorialId: string) => [...cutListKeys.all, tutorialId] as const,
  pieces: resourceKeys.pieces,
  mentions: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'mentions'] as const,
  materials: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'materials'] as const,
  sheetPlans: (tutorialId: string) => [...cutListKeys.tutorial(tutorialId), 'sheet-plan'] as const,
  sheetPlan: (tutorialId: string, params: { kits: number; spares: number }) => [...cutListKeys.sheetPlans(tutorialId), params] as const,
};

/** Refetches the pieces and everything the section derives from them. */
export const refreshCutList = (qc: QueryClient, tutorialId: string) =>
  Promise.all([
    qc.invalidateQueries({ queryKey: cutListKeys.tutorial(tutorialId) }),
    qc.invalidateQueries({ queryKey: resourceKeys.pieces(tutorialId) }),
    // The supplies' sheet counts are checked against the plan of these pieces.
    qc.invalidateQueries({ queryKey: resourceKeys.supplyChecks(tutorialId) }),
  ]);
