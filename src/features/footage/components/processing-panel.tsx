import type { RecordingDto } from '@shared/schemas/footage';
import { DeleteRecordingButton } from './delete-recording-button';
import { ProgressBar } from './progress-bar';
import { RecordingFacts } from './recording-facts';

/** Follows the server preparing the preview, poster and thumbnails (the query polls each second). */
export function ProcessingPanel({ recording, canEdit }: { recording: RecordingDto; canEdit: boolean }) {
  const stage = recording.status === 'uploaded' ? 'Waiting for the video to be picked up' : (recording.stage ?? 'Working');
  return (
    <section className="rounded-lg border border-line bg-white p-6" aria-labelledby="processing-title">
      <h2 id="processing-title" className="text-lg">
        Preparing the footage
      </h2>
      <div className="mt-2">
        <RecordingFacts recording={recording} />
      </div>
      <div className="mt-5 flex items-baseline justify-between gap-4 text-sm">
        <span aria-live="polite">{stage} …</span>
        <span className="tabular-nums text-pencil">{recording.progress} %</span>
      </div>
      <div className="mt-2">
        <ProgressBar percent={recording.progress} label="Preparing the footage" tone="sage" />
      </div>
      <p className="mt-3 text-sm text-pencil">
        Cardwright is making a light preview to play in the browser, a poster and scrub thumbnails. You can leave this page; the work carries on on the server
        and the player opens here when it is done.
      </p>
      {canEdit && (
        <div className="mt-4">
          <DeleteRecordingButton recording={recording} label="Stop and delete" />
        </div>
      )}
    </section>
  );
}
