import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useQuery } from '@tanstack/react-query';
import { recordingQueryOptions } from '../api/get-recording';
import { useRecordings } from '../api/get-recordings';
import type { Recording } from '../api/types';
import { useRecordingUpload } from '../hooks/use-recording-upload';
import { FailedPanel } from './failed-panel';
import { FootageWorkspace } from './footage-workspace';
import { ProcessingPanel } from './processing-panel';
import { RecordingUpload } from './recording-upload';

/**
 * The Footage section of a tutorial: an upload when there is no recording yet, the server's
 * progress while it prepares the newest one, and the player with transcript, chapters and stills
 * once it is ready.
 */
export function FootageSection({ tutorialId, canEdit, startMs }: { tutorialId: string; canEdit: boolean; startMs?: number }) {
  const list = useRecordings(tutorialId);
  const upload = useRecordingUpload(tutorialId);
  if (list.isPending) return <Loading label="Loading the footage" />;
  if (list.error) return <Notice kind="error">{list.error.message}</Notice>;
  const newest = list.data.recordings[0];
  if (!newest || (upload.state.phase === 'uploading' && newest.status !== 'failed')) {
    if (!canEdit && !newest) {
      return (
        <EmptyState title="No footage yet">
          The recording has not been uploaded. Someone who edits this tutorial can add it here, with its transcript, chapters and stills.
        </EmptyState>
      );
    }
    return (
      <section aria-labelledby="footage-empty-title" className="mx-auto max-w-3xl space-y-4">
        <div>
          <h2 id="footage-empty-title" className="text-xl">
            {newest ? 'Uploading a new recording' : 'No footage yet'}
          </h2>
          <p className="mt-1 text-sm text-pencil">
            Upload the recorded walkthrough of this project. Cardwright makes a light preview for the browser, then you can attach the transcript, mark
            chapters and pull stills for the write-up.
          </p>
        </div>
        <RecordingUpload tutorialId={tutorialId} />
      </section>
    );
  }
  return <RecordingView key={newest.id} listed={newest} canEdit={canEdit} startMs={startMs} />;
}

function RecordingView({ listed, canEdit: tutorialCanEdit, startMs }: { listed: Recording; canEdit: boolean; startMs?: number }) {
  const q = useQuery({ ...recordingQueryOptions(listed.id), placeholderData: listed });
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const recording = q.data ?? listed;
  const canEdit = recording.abilities?.update ?? tutorialCanEdit;
  if (recording.status === 'failed') return <FailedPanel recording={recording} canEdit={canEdit} />;
  if (recording.status !== 'ready' || !recording.previewUrl) return <ProcessingPanel recording={recording} canEdit={canEdit} />;
  return <FootageWorkspace recording={recording} canEdit={canEdit} startMs={startMs} />;
}
