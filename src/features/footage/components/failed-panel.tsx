import { Notice } from '@/components/ui/notice';
import type { RecordingDto } from '@shared/schemas/footage';
import { DeleteRecordingButton } from './delete-recording-button';
import { RecordingFacts } from './recording-facts';
import { RecordingUpload } from './recording-upload';

/** A recording the server could not prepare: why, and what to do about it. */
export function FailedPanel({ recording, canEdit }: { recording: RecordingDto; canEdit: boolean }) {
  return (
    <section className="space-y-4" aria-labelledby="failed-title">
      <div className="rounded-lg border border-line bg-white p-6">
        <h2 id="failed-title" className="text-lg">
          This recording could not be prepared
        </h2>
        <div className="mt-2">
          <RecordingFacts recording={recording} />
        </div>
        <div className="mt-4">
          <Notice kind="error">{recording.error ?? 'Processing stopped without a reason.'}</Notice>
        </div>
        <p className="mt-3 text-sm text-pencil">
          {canEdit
            ? 'Export the video again from your camera or editing app (MP4 with H.264 is the safest choice) and upload it below; the failed upload is removed once the new one arrives.'
            : 'Someone who edits this tutorial can upload the video again.'}
        </p>
        {canEdit && (
          <div className="mt-4">
            <DeleteRecordingButton recording={recording} label="Delete this upload" />
          </div>
        )}
      </div>
      {canEdit && <RecordingUpload tutorialId={recording.tutorialId} replaces={recording.id} lead="Drop another recording here or" />}
    </section>
  );
}
