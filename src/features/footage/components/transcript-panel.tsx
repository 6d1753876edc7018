import { useMemo, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { ApiError } from '@/lib/api-client';
import { useDeleteTranscript } from '../api/delete-transcript';
import { useCues } from '../api/get-cues';
import type { RecordingDto } from '@shared/schemas/footage';
import { useUploadTranscript, type TranscriptUploaded } from '../api/upload-transcript';
import { findMatches, stepMatch } from '../utils/cue-search';
import { activeCueIndex } from '../utils/timeline';
import { CueList } from './cue-list';
import { FileDrop } from './file-drop';
import { TranscriptSearch } from './transcript-search';

const ACCEPT = '.vtt,.srt,.txt,text/vtt,text/plain,application/x-subrip';
const FORMAT_LABEL: Record<string, string> = { vtt: 'WebVTT', srt: 'SRT', plain: 'timed text' };

const sentence = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

type Props = { recording: RecordingDto; canEdit: boolean; timeMs: number; onSeek: (ms: number) => void };

/** The timed transcript beside the player: attach or replace it, follow playback, search it. */
export function TranscriptPanel({ recording, canEdit, timeMs, onSeek }: Props) {
  const hasTranscript = !!recording.transcript;
  const cues = useCues(recording.id, { enabled: hasTranscript });
  const upload = useUploadTranscript(recording.id);
  const remove = useDeleteTranscript(recording.id);
  const [done, setDone] = useState<TranscriptUploaded | null>(null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const [query, setQuery] = useState('');
  const [current, setCurrent] = useState(-1);
  const replaceInput = useRef<HTMLInputElement>(null);

  const list = useMemo(() => (hasTranscript ? (cues.data?.cues ?? []) : []), [cues.data, hasTranscript]);
  const texts = useMemo(() => list.map((c) => c.text), [list]);
  const matches = useMemo(() => findMatches(texts, query), [texts, query]);
  const active = activeCueIndex(list, timeMs);

  const send = (file: File) => {
    setDone(null);
    upload.mutate(file, { onSuccess: (r) => setDone(r) });
  };
  const onQuery = (q: string) => {
    setQuery(q);
    setCurrent(findMatches(texts, q).length ? 0 : -1);
  };

  let uploadError: string | null = null;
  if (upload.error) {
    const e = upload.error;
    const kept = hasTranscript ? 'The previous transcript is kept.' : 'Nothing was saved; correct the file and upload it again.';
    uploadError = e instanceof ApiError && e.status === 422 ? `${sentence(e.message)}. ${kept}` : `${e.message}. ${kept}`;
  }

  return (
    <section className="rounded-lg border border-line bg-white" aria-labelledby="transcript-title">
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-line px-4 py-3">
        <div className="min-w-0">
          <h2 id="transcript-title" className="text-base">
            Transcript
          </h2>
          {recording.transcript && (
            <p className="truncate text-xs text-pencil">
              {recording.transcript.name} · {FORMAT_LABEL[recording.transcript.format ?? ''] ?? 'timed text'}
              {cues.data && ` · ${cues.data.cues.length} lines`}
            </p>
          )}
        </div>
        {canEdit && hasTranscript && (
          <div className="flex gap-2">
            <Button variant="secondary" size="sm" busy={upload.isPending} onClick={() => replaceInput.current?.click()}>
              Replace
            </Button>
            <Button variant="ghost" size="sm" onClick={() => setConfirmRemove(true)}>
              Remove
            </Button>
            <input
              ref={replaceInput}
              type="file"
              accept={ACCEPT}
              aria-label="Replacement transcript file"
              className="sr-only"
              tabIndex={-1}
              onChange={(e) => {
                const f = e.target.files?.[0];
                if (f) send(f);
                e.target.value = '';
              }}
            />
          </div>
        )}
      </header>

      <div className="space-y-3 p-4">
        {/* Ligatures off: the message quotes the file, and Inter would draw its "-->" as an arrow. */}
        {uploadError && (
          <Notice kind="error">
            <span className="[font-variant-ligatures:none]">{uploadError}</span>
          </Notice>
        )}
        {done && !upload.error && (
          <Notice kind="success">
            Read {done.cueCount} timed lines from “{done.name}” ({FORMAT_LABEL[done.format] ?? done.format}).
          </Notice>
        )}
        {done && !upload.error && done.notices && done.notices.length > 0 && (
          <Notice kind="info">
            <p>Read, with {done.notices.length === 1 ? 'one note' : `${done.notices.length} notes`}:</p>
            <ul className="mt-1 list-disc pl-5 [font-variant-ligatures:none]">
              {done.notices.slice(0, 20).map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
            {done.notices.length > 20 && <p className="mt-1">…and {done.notices.length - 20} more.</p>}
          </Notice>
        )}
        {remove.error && <Notice kind="error">{remove.error.message}</Notice>}

        {!hasTranscript ? (
          canEdit ? (
            upload.isPending ? (
              <Loading label="Reading the transcript" />
            ) : (
              <FileDrop lead="Drop the transcript here or" accept={ACCEPT} inputLabel="Transcript file" onFile={send} size="sm">
                <p>WebVTT (.vtt), SRT (.srt), or plain text where each line starts with its time, like “0:05 First we cut the base”.</p>
                <p className="mt-1">The spoken line then follows playback, and chapters can be suggested from it.</p>
              </FileDrop>
            )
          ) : (
            <EmptyState title="No transcript yet">Someone who edits this tutorial can attach a WebVTT, SRT or timed text file.</EmptyState>
          )
        ) : cues.isPending ? (
          <Loading label="Loading the transcript" />
        ) : cues.error ? (
          <Notice kind="error">{cues.error.message}</Notice>
        ) : (
          <>
            <TranscriptSearch
              query={query}
              onQuery={onQuery}
              count={matches.length}
              current={current}
              onStep={(d) => setCurrent((c) => stepMatch(c, matches.length, d))}
            />
            <div className="-mx-4 border-t border-line">
              <CueList cues={list} active={active} matches={matches} currentMatch={current} onSeek={onSeek} />
            </div>
          </>
        )}
      </div>

      <ConfirmDialog
        open={confirmRemove}
        title="Remove the transcript?"
        confirmLabel="Remove transcript"
        danger
        busy={remove.isPending}
        onCancel={() => setConfirmRemove(false)}
        onConfirm={() =>
          remove.mutate(undefined, {
            onSettled: () => setConfirmRemove(false),
            onSuccess: () => {
              setDone(null);
              setQuery('');
              upload.reset();
            },
          })
        }
      >
        Its timed lines are deleted. Chapters and stills stay as they are.
      </ConfirmDialog>
    </section>
  );
}
