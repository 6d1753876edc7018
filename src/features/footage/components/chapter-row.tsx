import { memo, useEffect, useRef, useState } from 'react';
import { createChapterSchema, type ChapterDto } from '@shared/schemas/footage';
import { parseTimestamp } from '@shared/transcript/timestamp';
import { Button } from '@/components/ui/button';
import { formatClock } from '../utils/format';

type Props = {
  chapter: ChapterDto;
  current: boolean;
  canEdit: boolean;
  durationMs: number;
  now: () => number;
  onSeek: (ms: number) => void;
  onSave: (id: string, change: { title?: string; startMs?: number }) => Promise<unknown>;
  onDelete: (id: string) => void;
};

const titleSchema = createChapterSchema.shape.title;
const inputCls = 'rounded-md border bg-white px-2 py-1 text-sm focus:border-kraft';

/**
 * One chapter: its time seeks, its title renames in place (Enter saves, Escape cancels) and
 * Retime takes a typed time like 1:05 or the playhead.
 */
export const ChapterRow = memo(function ChapterRow({ chapter, current, canEdit, durationMs, now, onSeek, onSave, onDelete }: Props) {
  const [mode, setMode] = useState<'view' | 'rename' | 'retime'>('view');
  const [title, setTitle] = useState(chapter.title);
  const [time, setTime] = useState(formatClock(chapter.startMs));
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const cancelled = useRef(false);
  const busy = useRef(false);
  const field = useRef<HTMLInputElement>(null);

  useEffect(() => {
    if (mode !== 'view') {
      field.current?.focus();
      field.current?.select();
    }
  }, [mode]);

  const open = (m: 'rename' | 'retime') => {
    cancelled.current = false;
    setError(null);
    setTitle(chapter.title);
    setTime(formatClock(chapter.startMs));
    setMode(m);
  };
  const close = () => {
    cancelled.current = true;
    setError(null);
    setMode('view');
  };
  const save = async (change: { title?: string; startMs?: number }) => {
    busy.current = true;
    setSaving(true);
    try {
      await onSave(chapter.id, change);
      close();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      busy.current = false;
      setSaving(false);
    }
  };

  const saveTitle = () => {
    // Blur follows Enter and Escape; by then the edit is saved or dropped.
    if (cancelled.current || busy.current) return;
    const r = titleSchema.safeParse(title);
    if (!r.success) return setError(r.error.issues[0]?.message ?? 'Name the chapter');
    if (r.data === chapter.title) return close();
    void save({ title: r.data });
  };
  const saveTime = (ms: number | null = parseTimestamp(time)) => {
    if (busy.current) return;
    if (ms === null) return setError('Write the time as m:ss, like 1:05');
    if (durationMs > 0 && ms > durationMs) return setError(`That is after the end of the video (${formatClock(durationMs)})`);
    if (ms === chapter.startMs) return close();
    void save({ startMs: ms });
  };

  return (
    <li className={`border-l-[3px] px-3 py-2 ${current ? 'border-kraft bg-kraft-light/50' : 'border-transparent'}`} aria-current={current ? 'true' : undefined}>
      <div className="flex items-center gap-2">
        <button
          type="button"
          onClick={() => onSeek(chapter.startMs)}
          className="w-14 shrink-0 rounded px-1 text-left text-sm tabular-nums text-kraft-dark hover:bg-kraft-light"
          aria-label={`Play from ${formatClock(chapter.startMs)}`}
        >
          {formatClock(chapter.startMs)}
        </button>
        {mode === 'rename' ? (
          <input
            ref={field}
            aria-label="Chapter title"
            value={title}
            maxLength={120}
            onChange={(e) => setTitle(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                saveTitle();
              } else if (e.key === 'Escape') {
                e.preventDefault();
                close();
              }
            }}
            onBlur={saveTitle}
            disabled={saving}
            className={`${inputCls} min-w-0 flex-1 ${error ? 'border-rosehip' : 'border-line'}`}
          />
        ) : canEdit ? (
          <button
            type="button"
            onClick={() => open('rename')}
            className="min-w-0 flex-1 truncate rounded px-1 text-left text-sm hover:bg-kraft-light"
            title="Click to rename"
          >
            {chapter.title}
          </button>
        ) : (
          <span className="min-w-0 flex-1 truncate px-1 text-sm">{chapter.title}</span>
        )}
        {canEdit && mode === 'view' && (
          <span className="flex shrink-0 gap-1">
            <Button variant="ghost" size="sm" onClick={() => open('retime')} aria-label={`Retime “${chapter.title}”`}>
              Retime
            </Button>
            <Button variant="ghost" size="sm" className="text-rosehip" onClick={() => onDelete(chapter.id)} aria-label={`Delete “${chapter.title}”`}>
              Delete
            </Button>
          </span>
        )}
      </div>
      {mode === 'retime' && (
        <div className="mt-2 flex flex-wrap items-center gap-2 pl-16">
          <input
            ref={field}
            aria-label="Chapter start time"
            value={time}
            inputMode="numeric"
            onChange={(e) => setTime(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                saveTime();
              } else if (e.key === 'Escape') {
                e.preventDefault();
                close();
              }
            }}
            className={`${inputCls} w-20 tabular-nums ${error ? 'border-rosehip' : 'border-line'}`}
          />
          <Button variant="secondary" size="sm" onClick={() => saveTime(now())} disabled={saving}>
            Set to playhead
          </Button>
          <Button size="sm" onClick={() => saveTime()} busy={saving}>
            Save
          </Button>
          <Button variant="ghost" size="sm" onClick={close}>
            Cancel
          </Button>
        </div>
      )}
      {error && (
        <p className="mt-1 pl-16 text-xs text-rosehip" role="alert">
          {error}
        </p>
      )}
    </li>
  );
});
