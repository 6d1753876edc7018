import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useQuery } from '@tanstack/react-query';
import { recordingQueryOptions } from '../api/get-recording';
import { useRecordings } from '../api/get-recordings';
import type { RecordingDto } from '@shared/schemas/footage';
import { useRecordingUpload } from '../hooks/use-recording-upload';
import { FailedPanel } from './failed-panel';
import { usePlayer } from '../hooks/use-player';
import { DeleteRecordingButton } from './delete-recording-button';
import { FootageWorkspace } from './footage-workspace';
import { RecordingFacts } from './recording-facts';
import { ProcessingPanel } from './processing-panel';
import { TranscriptPanel } from './transcript-panel';
import { ChaptersPanel } from './chapters-panel';
import { useChapters } from '../api/get-chapters';
import { RecordingUpload } from './recording-upload';

/**
 * The Footage section of a tutorial: an upload when there is no recording yet, the server's
 * progress while it prepares the newest one, and the player with transcript, chapters and stills
 * once it is ready.
 */
/** What the page shows with a recording (the assembly), given the recording and, once the player is there, a way to seek it. */
export type FootageAside = (recording: RecordingDto, seek?: (ms: number) => void) => ReactNode;

export function FootageSection({ tutorialId, canEdit, startMs, aside }: { tutorialId: string; canEdit: boolean; startMs?: number; aside?: FootageAside }) {
  const list = useRecordings(tutorialId);
  const upload = useRecordingUpload(tutorialId);
  if (list.isPending) return <Loading label="Loading the footage" />;
  if (list.error) return <Notice kind="error">{list.error.message}</Notice>;
  const newest = list.data.recordings[0];
  if (!newest || ((upload.state.phase === 'uploading' || upload.state.phase === 'paused') && newest.status !== 'failed')) {
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
            Upload the recorded walkthrough of this project. Cardwright makes a light preview for the browser, then you can attach the transcript, mark chapters
            and pull stills for the write-up.
          </p>
        </div>
        <RecordingUpload tutorialId={tutorialId} />
      </section>
    );
  }
  return <RecordingView key={newest.id} listed={newest} canEdit={canEdit} startMs={startMs} aside={aside} />;
}

function RecordingView({
  listed,
  canEdit: tutorialCanEdit,
  startMs,
  aside,
}: {
  listed: RecordingDto;
  canEdit: boolean;
  startMs?: number;
  aside?: FootageAside;
}) {
  const q = useQuery({ ...recordingQueryOptions(listed.id), placeholderData: listed });
  // The player's state lives here, not in the workspace, so the aside keeps its place (and its
  // state, such as an "Undo accepting all") when the preview becomes ready and the player appears.
  const player = usePlayer(listed.durationMs);
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const recording = q.data ?? listed;
  const canEdit = recording.abilities?.update ?? tutorialCanEdit;
  if (recording.status === 'failed') return <FailedPanel recording={recording} canEdit={canEdit} />;
  const ready = recording.status === 'ready' && !!recording.previewUrl;
  return (
    <div className="space-y-4">
      {ready ? (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <RecordingFacts recording={recording} />
          {canEdit && <DeleteRecordingButton recording={recording} />}
        </div>
      ) : null}
      {aside?.(recording, ready ? player.seek : undefined)}
      {ready ? (
        <FootageWorkspace recording={recording} canEdit={canEdit} startMs={startMs} player={player} />
      ) : (
        // Nothing that does not need the preview waits for it: the transcript, chapters and the assembly work now.
        <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1.6fr)_minmax(20rem,1fr)]">
          <ProcessingPanel recording={recording} canEdit={canEdit} />
          <div className="min-w-0 space-y-6">
            <TranscriptPanel recording={recording} canEdit={canEdit} timeMs={0} onSeek={noSeek} />
            <ProcessingChapters recording={recording} canEdit={canEdit} />
          </div>
        </div>
      )}
    </div>
  );
}

const noSeek = () => {};
const atStart = () => 0;

/** The chapters while the preview is made: suggestions from the talk can be taken; marking at the playhead waits for the player. */
function ProcessingChapters({ recording, canEdit }: { recording: RecordingDto; canEdit: boolean }) {
  const chapters = useChapters(recording.id);
  return (
    <ChaptersPanel
      recordingId={recording.id}
      chapters={chapters.data?.chapters}
      loadError={chapters.error}
      canEdit={canEdit}
      hasTranscript={!!recording.transcript}
      timeMs={0}
      durationMs={recording.durationMs ?? 0}
      now={atStart}
      onSeek={noSeek}
    />
  );
}
