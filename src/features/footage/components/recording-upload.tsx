import { useEffect } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useRecordingUpload } from '../hooks/use-recording-upload';
import { formatBytes, percentOf } from '../utils/format';
import { FileDrop } from './file-drop';
import { ProgressBar } from './progress-bar';

const ACCEPT = 'video/mp4,video/quicktime,video/webm,video/x-matroska,.mp4,.mov,.webm,.mkv,.m4v';

/** The recording drop zone, and the upload's progress with Pause, Resume and Cancel once a file is on its way. */
export function RecordingUpload({ tutorialId, replaces, lead = 'Drop the recording here or' }: { tutorialId: string; replaces?: string; lead?: string }) {
  const { state, start, cancel, pause, resume, reset } = useRecordingUpload(tutorialId);

  // Closing the tab mid-upload stops it (the sent part is kept and continues when the file is chosen again): ask first.
  useEffect(() => {
    if (state.phase !== 'uploading') return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [state.phase]);

  if (state.phase === 'uploading' || state.phase === 'paused') {
    const pct = percentOf(state.loaded, state.total);
    const sent = state.loaded >= state.total && state.total > 0;
    const paused = state.phase === 'paused';
    return (
      <div className="rounded-lg border border-line bg-white p-6">
        <div className="flex flex-wrap items-baseline justify-between gap-4">
          <p className="min-w-0 truncate font-medium">
            {paused ? 'Paused' : 'Uploading'} “{state.fileName}”
          </p>
          <div className="flex gap-2">
            {!sent && (
              <Button variant="secondary" size="sm" onClick={paused ? resume : pause}>
                {paused ? 'Resume' : 'Pause'}
              </Button>
            )}
            <Button variant="secondary" size="sm" onClick={cancel}>
              Cancel
            </Button>
          </div>
        </div>
        <div className="mt-3">
          <ProgressBar percent={pct} label="Upload progress" />
        </div>
        <p className="mt-2 text-sm text-pencil tabular-nums" aria-live="polite">
          {sent ? 'Sent; the server is checking the file …' : `${pct} % · ${formatBytes(state.loaded)} of ${formatBytes(state.total)}`}
        </p>
        <p className="mt-1 text-xs text-pencil">
          A dropped connection is retried on its own; if this tab closes, choose the same file again to continue where it stopped. Preparing the preview then
          carries on on the server.
        </p>
      </div>
    );
  }

  return (
    <div className="space-y-3">
      {state.phase === 'error' && (
        <Notice kind="error">
          <span>{state.message}</span>{' '}
          <button type="button" className="underline" onClick={reset}>
            Dismiss
          </button>
        </Notice>
      )}
      {state.phase === 'cancelled' && <Notice>The upload of “{state.fileName}” was cancelled; nothing was saved.</Notice>}
      <FileDrop lead={lead} accept={ACCEPT} inputLabel="Recording file" onFile={(f) => start(f, { replaces })}>
        <p>MP4, MOV, WebM or MKV, straight from the camera or phone; files of several GB are fine.</p>
      </FileDrop>
    </div>
  );
}
