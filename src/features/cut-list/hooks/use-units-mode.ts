import { useCallback, useState } from 'react';
import type { UnitsMode } from '../utils/lengths';

const KEY = 'cardwright.cut-list.units';
const MODES: readonly UnitsMode[] = ['in', 'mm', 'both'];

function stored(): UnitsMode {
  try {
    const v = localStorage.getItem(KEY);
    return MODES.includes(v as UnitsMode) ? (v as UnitsMode) : 'both';
  } catch {
    return 'both';
  }
}

/** The units toggle, remembered in this browser: it is a reading preference, not part of the tutorial. */
export function useUnitsMode(): [UnitsMode, (m: UnitsMode) => void] {
  const [mode, setMode] = useState<UnitsMode>(stored);
  const set = useCallback((m: UnitsMode) => {
    setMode(m);
    try {
      localStorage.setItem(KEY, m);
    } catch {
      // private windows may refuse storage; the toggle still works for this visit
    }
  }, []);
  return [mode, set];
}
