import { useCallback, useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useDeleteChapter, useCreateChapter, useUpdateChapter } from '../api/chapter-mutations';
import { useChapterSuggestions } from '../api/get-chapter-suggestions';
import type { ChapterDto, ChapterSuggestionDto } from '@shared/schemas/footage';
import { suggestionKey, useDismissedSuggestions } from '../hooks/use-dismissed-suggestions';
import { chapterIndexAt, firstChapterFix } from '../utils/chapters';
import { formatClock } from '../utils/format';
import { ChapterRow } from './chapter-row';
import { ChapterSuggestions } from './chapter-suggestions';
import { CopyChapters } from './copy-chapters';

type Props = {
  recordingId: string;
  chapters: ChapterDto[] | undefined;
  loadError: Error | null;
  canEdit: boolean;
  hasTranscript: boolean;
  timeMs: number;
  durationMs: number;
  now: () => number;
  onSeek: (ms: number) => void;
};

/** The chapter list in time order, the 0:00 check, suggestions from the transcript and a copyable list. */
export function ChaptersPanel({ recordingId, chapters, loadError, canEdit, hasTranscript, timeMs, durationMs, now, onSeek }: Props) {
  const create = useCreateChapter(recordingId);
  const update = useUpdateChapter(recordingId);
  const del = useDeleteChapter(recordingId);
  const suggestions = useChapterSuggestions(recordingId, { enabled: canEdit && hasTranscript });
  const [dismissed, dismiss] = useDismissedSuggestions(recordingId);
  const [accepting, setAccepting] = useState<string | null>(null);

  const list = useMemo(() => chapters ?? [], [chapters]);
  const current = chapterIndexAt(list, timeMs);
  const fix = firstChapterFix(list);
  const visibleSuggestions = (suggestions.data?.suggestions ?? []).filter((s) => !dismissed.has(suggestionKey(s)));

  const { mutateAsync: updateAsync } = update;
  const { mutate: deleteOne } = del;
  const save = useCallback((id: string, change: { title?: string; startMs?: number }) => updateAsync({ id, ...change }), [updateAsync]);
  // Deleting asks first: the chapter's name and time go, and the write-up's steps linked to it stop following it.
  const [deleting, setDeleting] = useState<ChapterDto | null>(null);
  const remove = useCallback((id: string) => setDeleting(list.find((c) => c.id === id) ?? null), [list]);
  const accept = (s: ChapterSuggestionDto) => {
    const key = suggestionKey(s);
    setAccepting(key);
    create.mutate({ title: s.title, startMs: s.startMs }, { onSettled: () => setAccepting(null) });
  };
  const mutationError = create.error ?? del.error;

  return (
    <section className="rounded-lg border border-line bg-white" aria-labelledby="chapters-title">
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-line px-4 py-3">
        <h2 id="chapters-title" className="text-base">
          Chapters
        </h2>
        {list.length > 0 && <span className="text-sm text-pencil tabular-nums">{list.length}</span>}
      </header>

      {loadError ? (
        <div className="p-4">
          <Notice kind="error">{loadError.message}</Notice>
        </div>
      ) : !chapters ? (
        <div className="px-4">
          <Loading label="Loading chapters" />
        </div>
      ) : (
        <>
          {(fix || mutationError) && (
            <div className="space-y-2 px-4 pt-3">
              {mutationError && <Notice kind="error">{mutationError.message}</Notice>}
              {fix && (
                <Notice>
                  <p>The first chapter should start at 0:00, so the opening seconds belong to a chapter too.</p>
                  {canEdit && fix.kind === 'move' && (
                    <Button
                      size="sm"
                      variant="secondary"
                      className="mt-2"
                      busy={update.isPending}
                      onClick={() => update.mutate({ id: fix.chapter, startMs: 0 })}
                    >
                      Move “{list.find((c) => c.id === fix.chapter)?.title}” to 0:00
                    </Button>
                  )}
                  {canEdit && fix.kind === 'add' && (
                    <Button
                      size="sm"
                      variant="secondary"
                      className="mt-2"
                      busy={create.isPending}
                      onClick={() => create.mutate({ title: 'Introduction', startMs: 0 })}
                    >
                      Add “Introduction” at 0:00
                    </Button>
                  )}
                </Notice>
              )}
            </div>
          )}
          {list.length === 0 ? (
            <p className="px-4 py-4 text-sm text-pencil">
              {canEdit
                ? 'No chapters yet. Play to where each step begins and press C (or Mark chapter under the player); the first chapter starts at 0:00.'
                : 'No chapters yet.'}
            </p>
          ) : (
            <ol className="divide-y divide-line py-1" aria-label="Chapters in time order">
              {list.map((c, i) => (
                <ChapterRow
                  key={c.id}
                  chapter={c}
                  current={i === current}
                  canEdit={canEdit}
                  durationMs={durationMs}
                  now={now}
                  onSeek={onSeek}
                  onSave={save}
                  onDelete={remove}
                />
              ))}
            </ol>
          )}
          {list.length > 0 && (
            <div className="border-t border-line px-4 py-3">
              <CopyChapters chapters={list} durationMs={durationMs} />
            </div>
          )}
          {canEdit && hasTranscript && (
            <ChapterSuggestions
              suggestions={visibleSuggestions}
              accepting={accepting}
              onSeek={onSeek}
              onAccept={accept}
              onDismiss={(s) => dismiss(suggestionKey(s))}
            />
          )}
        </>
      )}
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete the chapter “${deleting?.title ?? ''}”?`}
        confirmLabel="Delete chapter"
        danger
        busy={del.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && deleteOne(deleting.id, { onSettled: () => setDeleting(null) })}
      >
        Its name and time leave the chapter list and the video description. Stills stay. Steps of the write-up linked to it keep their time in the video (
        {deleting ? formatClock(deleting.startMs) : ''}) and no longer follow a chapter.
      </ConfirmDialog>
    </section>
  );
}
