import type { CopyState } from '../hooks/use-copy';

/** The short line beside a Copy button, read out by screen readers. */
export function CopyFeedback({ state }: { state: CopyState }) {
  return (
    <span className="text-xs text-sage" aria-live="polite">
      {state.status === 'copied' ? state.message : ''}
    </span>
  );
}
