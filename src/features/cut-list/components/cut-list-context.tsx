import { createContext, useContext } from 'react';
import type { LengthUnit, RulerPrecision } from '@shared/measure';
import type { UnitsMode } from '../utils/lengths';

/** What every part of the Cut list section needs to read and show lengths. */
export type CutListSettings = {
  tutorialId: string;
  precision: RulerPrecision;
  defaultUnit: LengthUnit;
  canEdit: boolean;
  units: UnitsMode;
  /** Where the Footage section opens at a time. */
  footageAt: (ms: number) => string;
};

export const CutListContext = createContext<CutListSettings | null>(null);

/** The section's settings; only valid inside the Cut list workspace. */
export function useCutList(): CutListSettings {
  const v = useContext(CutListContext);
  if (!v) throw new Error('useCutList outside the Cut list workspace');
  return v;
}
