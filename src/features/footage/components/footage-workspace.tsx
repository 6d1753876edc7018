import { useCallback, useEffect, useState } from 'react';
import { useCreateChapter } from '../api/chapter-mutations';
import { useChapters } from '../api/get-chapters';
import { useCreateStill } from '../api/still-mutations';
import type { RecordingDto } from '@shared/schemas/footage';
import { useFootageShortcuts } from '../hooks/use-footage-shortcuts';
import type { PlayerApi } from '../hooks/use-player';
import { chapterIndexAt, chapterTitleAt } from '../utils/chapters';
import { useCues } from '../api/get-cues';
import { formatClock } from '../utils/format';
import { ChaptersPanel } from './chapters-panel';
import { KeysNote } from './keys-note';
import { PlayerToolbar } from './player-toolbar';
import { ScrubStrip } from './scrub-strip';
import { StillsPanel } from './stills-panel';
import { TranscriptPanel } from './transcript-panel';

type Message = { kind: 'success' | 'error' | 'info'; text: string };

/**
 * A ready recording: the player with its scrub strip and stills on the left, the transcript and
 * chapters on the right, and the page's keys. Marking and pulling take the exact playhead.
 */
export function FootageWorkspace({
  recording,
  canEdit,
  startMs,
  player,
}: {
  recording: RecordingDto;
  canEdit: boolean;
  startMs?: number;
  /** The player's state, kept by the section so what sits above the workspace is not remounted. */
  player: PlayerApi;
}) {
  const { seek } = player;
  // Opened from a link with a time: put the playhead there once.
  useEffect(() => {
    if (startMs !== undefined) seek(startMs);
  }, [startMs, seek]);
  const chapters = useChapters(recording.id);
  // The same query the transcript panel reads: a chapter marked at the playhead is named from the line said there.
  const cues = useCues(recording.id, { enabled: !!recording.transcript });
  const createChapter = useCreateChapter(recording.id);
  const createStill = useCreateStill(recording.id);
  const [pulling, setPulling] = useState<{ atMs: number; mode: 'exact' | 'sharpest' } | null>(null);
  const [message, setMessage] = useState<Message | null>(null);
  const durationMs = player.durationMs || recording.durationMs || 0;
  const chapterList = chapters.data?.chapters;

  useEffect(() => {
    if (!message || message.kind === 'error') return;
    const t = setTimeout(() => setMessage(null), 5000);
    return () => clearTimeout(t);
  }, [message]);

  const { mutate: addChapter, isPending: marking } = createChapter;
  const mark = useCallback(() => {
    if (!chapterList || marking) return;
    const t = player.now();
    const near = chapterList.find((c) => Math.abs(c.startMs - t) < 1000);
    if (near) return setMessage({ kind: 'info', text: `“${near.title}” already starts at ${formatClock(near.startMs)}.` });
    const title = chapterTitleAt(chapterList, cues.data?.cues ?? [], t);
    addChapter(
      { title, startMs: t },
      {
        onSuccess: () => setMessage({ kind: 'success', text: `Marked “${title}” at ${formatClock(t)}. Click its name in Chapters to rename it.` }),
        onError: (e) => setMessage({ kind: 'error', text: e.message }),
      },
    );
  }, [chapterList, marking, player, addChapter, cues.data]);

  const { mutate: addStill } = createStill;
  const pull = useCallback(
    (mode: 'exact' | 'sharpest') => {
      if (pulling) return;
      const t = player.now();
      setPulling({ atMs: t, mode });
      addStill(
        { atMs: t, mode },
        {
          onSuccess: (s) =>
            setMessage({
              kind: 'success',
              text:
                mode === 'sharpest' ? `Kept the sharpest frame near ${formatClock(t)}, at ${formatClock(s.atMs)}.` : `Pulled the frame at ${formatClock(t)}.`,
            }),
          onError: (e) => setMessage({ kind: 'error', text: e.message }),
          onSettled: () => setPulling(null),
        },
      );
    },
    [pulling, player, addStill],
  );

  useFootageShortcuts({
    toggle: player.toggle,
    nudge: player.nudge,
    mark: canEdit ? mark : undefined,
    still: canEdit ? () => pull('exact') : undefined,
    sharpest: canEdit ? () => pull('sharpest') : undefined,
  });

  const list = chapterList ?? [];
  const inChapter = chapterIndexAt(list, player.timeMs);

  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1.6fr)_minmax(20rem,1fr)]">
      <div className="min-w-0 space-y-6">
        <section aria-label="Player" className="space-y-3 rounded-lg border border-line bg-white p-3">
          <video
            ref={player.ref}
            src={recording.previewUrl ?? undefined}
            poster={recording.posterUrl ?? undefined}
            controls
            preload="metadata"
            playsInline
            className="aspect-video w-full rounded-md bg-ink"
          />
          <ScrubStrip thumbnails={recording.thumbnails} durationMs={durationMs} timeMs={player.timeMs} chapters={list} onSeek={player.seek} />
          <PlayerToolbar
            playing={player.playing}
            timeMs={player.timeMs}
            durationMs={durationMs}
            chapterTitle={inChapter >= 0 ? list[inChapter].title : null}
            canEdit={canEdit}
            onToggle={player.toggle}
            onMark={mark}
            onPull={pull}
            marking={marking}
            pulling={pulling?.mode ?? null}
          />
          <p
            role={message?.kind === 'error' ? 'alert' : 'status'}
            className={`min-h-5 text-sm ${message?.kind === 'error' ? 'text-rosehip' : message?.kind === 'success' ? 'text-ink' : 'text-pencil'}`}
          >
            {message?.kind === 'success' && <span className="mr-1.5 inline-block h-2 w-2 rounded-full bg-sage align-middle" aria-hidden />}
            {message?.text}
          </p>
        </section>
        <StillsPanel recordingId={recording.id} canEdit={canEdit} onSeek={player.seek} pulling={pulling} />
      </div>
      <div className="min-w-0 space-y-6">
        <TranscriptPanel recording={recording} canEdit={canEdit} timeMs={player.timeMs} onSeek={player.seek} />
        <ChaptersPanel
          recordingId={recording.id}
          chapters={chapterList}
          loadError={chapters.error}
          canEdit={canEdit}
          hasTranscript={!!recording.transcript}
          timeMs={player.timeMs}
          durationMs={durationMs}
          now={player.now}
          onSeek={player.seek}
        />
        <KeysNote canEdit={canEdit} />
      </div>
    </div>
  );
}
