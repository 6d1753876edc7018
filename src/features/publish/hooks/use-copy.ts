import { useCallback, useEffect, useState } from 'react';

export type CopyState = { status: 'idle' } | { status: 'copied'; message: string } | { status: 'manual'; message: string };

/**
 * The outcome of one Copy button: "Copied …" for a few seconds, or "manual" when the browser
 * refused the clipboard, so the text is shown selected to copy by hand.
 */
export function useCopy() {
  const [state, setState] = useState<CopyState>({ status: 'idle' });
  useEffect(() => {
    if (state.status !== 'copied') return;
    const t = setTimeout(() => setState({ status: 'idle' }), 3000);
    return () => clearTimeout(t);
  }, [state]);

  /** Runs the copy; `copy` resolves to the success message or throws when refused. */
  const run = useCallback(async (copy: () => Promise<string>) => {
    try {
      setState({ status: 'copied', message: await copy() });
    } catch (e) {
      setState({ status: 'manual', message: (e as Error).message });
    }
  }, []);
  const reset = useCallback(() => setState({ status: 'idle' }), []);
  return { state, run, reset };
}
