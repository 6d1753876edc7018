import { useCallback, useState } from 'react';

const keyOf = (recordingId: string) => `cardwright.dismissed-suggestions.${recordingId}`;
export const suggestionKey = (s: { startMs: number; title: string }) => `${s.startMs}:${s.title}`;

function read(recordingId: string): Set<string> {
  try {
    return new Set(JSON.parse(sessionStorage.getItem(keyOf(recordingId)) ?? '[]') as string[]);
  } catch {
    return new Set();
  }
}

/** Suggestions the person dismissed, remembered for this browser tab's session only. */
export function useDismissedSuggestions(recordingId: string): [Set<string>, (key: string) => void] {
  const [dismissed, setDismissed] = useState(() => read(recordingId));
  const dismiss = useCallback(
    (key: string) =>
      setDismissed((old) => {
        const next = new Set(old).add(key);
        try {
          sessionStorage.setItem(keyOf(recordingId), JSON.stringify([...next]));
        } catch {
          // Storage full or blocked: still hidden until the page is reloaded.
        }
        return next;
      }),
    [recordingId],
  );
  return [dismissed, dismiss];
}
