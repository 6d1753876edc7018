import { Button } from '@/components/ui/button';
import { useDownload } from '../hooks/use-download';
import { formatBytes } from '../utils/format-bytes';

/**
 * A button that fetches one export and hands it over as a download; while the server works it
 * says "Preparing …" (then the bytes received), and a failure is shown beside it in words.
 */
export function DownloadButton(props: { label: string; url: string; fallbackName: string; variant?: 'primary' | 'secondary'; disabled?: boolean }) {
  const { state, start } = useDownload();
  const busy = state.status === 'busy';
  const busyLabel =
    state.status === 'busy' && state.progress
      ? `Downloading … ${formatBytes(state.progress.received)}${state.progress.total ? ` of ${formatBytes(state.progress.total)}` : ''}`
      : 'Preparing …';
  return (
    <div className="flex flex-col items-start gap-1">
      <Button
        variant={props.variant ?? 'secondary'}
        busy={busy}
        disabled={props.disabled}
        onClick={() => void start(props.url, props.fallbackName)}
        aria-label={busy ? `${props.label}: ${busyLabel}` : undefined}
      >
        {busy ? busyLabel : props.label}
      </Button>
      {/* w-0 min-w-full: the line wraps at the button's width instead of widening the column and moving its neighbours. */}
      <span className="w-0 min-w-full text-xs [overflow-wrap:anywhere] text-sage" aria-live="polite">
        {state.status === 'done' && `Saved as ${state.filename}`}
      </span>
      {state.status === 'error' && (
        <p role="alert" className="w-0 min-w-[14rem] text-xs text-rosehip">
          {props.label} failed: {state.message}
        </p>
      )}
    </div>
  );
}
