import { useCallback, useState } from 'react';
import type { Paper } from '@shared/schemas/publish';
import { asPaper, defaultPaper } from '../utils/paper';

const KEY = 'cardwright.publish.paper';

function stored(key: string): Paper {
  try {
    return asPaper(localStorage.getItem(key)) ?? asPaper(localStorage.getItem(KEY)) ?? defaultPaper(navigator.language);
  } catch {
    return defaultPaper(typeof navigator === 'undefined' ? undefined : navigator.language);
  }
}

/**
 * The paper for one export (handout or template), remembered in this browser: it is the
 * printer's, not the tutorial's. A choice made for one export becomes the other's starting point.
 */
export function usePaper(kind: 'handout' | 'template'): [Paper, (p: Paper) => void] {
  const key = `${KEY}.${kind}`;
  const [paper, setPaper] = useState<Paper>(() => stored(key));
  const set = useCallback(
    (p: Paper) => {
      setPaper(p);
      try {
        localStorage.setItem(key, p);
        localStorage.setItem(KEY, p);
      } catch {
        // private windows may refuse storage; the choice still holds for this visit
      }
    },
    [key],
  );
  return [paper, set];
}
