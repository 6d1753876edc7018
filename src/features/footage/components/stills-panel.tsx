import { useCallback } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useStills } from '../api/get-stills';
import { useDeleteStill, useUpdateStill } from '../api/still-mutations';
import { formatClock } from '../utils/format';
import { StillCard } from './still-card';

type Props = { recordingId: string; canEdit: boolean; onSeek: (ms: number) => void; pulling: { atMs: number; mode: 'exact' | 'sharpest' } | null };

/** The gallery of stills pulled from the video, in time order. */
export function StillsPanel({ recordingId, canEdit, onSeek, pulling }: Props) {
  const stills = useStills(recordingId);
  const { mutateAsync: update } = useUpdateStill(recordingId);
  const { mutateAsync: remove } = useDeleteStill(recordingId);
  const save = useCallback((id: string, change: { caption?: string; alt?: string }) => update({ id, ...change }), [update]);
  const del = useCallback((id: string) => remove(id), [remove]);
  const list = stills.data?.stills ?? [];

  return (
    <section aria-labelledby="stills-title">
      <div className="mb-3 flex items-baseline justify-between">
        <h2 id="stills-title" className="text-lg">
          Stills
        </h2>
        {list.length > 0 && <span className="text-sm text-pencil tabular-nums">{list.length}</span>}
      </div>
      {stills.isPending ? (
        <Loading label="Loading stills" />
      ) : stills.error ? (
        <Notice kind="error">{stills.error.message}</Notice>
      ) : list.length === 0 && !pulling ? (
        <EmptyState title="No stills yet">
          {canEdit
            ? 'Pause on a clear frame of each step and press Pull still (S). Sharpest nearby (Shift+S) looks a second either side and keeps the least blurred frame.'
            : 'Stills pulled from the video for the write-up will show here.'}
        </EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2" aria-label="Stills in time order">
          {list.map((s) => (
            <StillCard key={s.id} still={s} canEdit={canEdit} onSeek={onSeek} onSave={save} onDelete={del} />
          ))}
          {pulling && (
            <li
              className="flex aspect-video flex-col items-center justify-center gap-2 rounded-lg border border-dashed border-kraft/50 bg-white/60 text-sm text-pencil"
              aria-live="polite"
            >
              <span className="h-5 w-5 animate-spin rounded-full border-2 border-kraft border-t-transparent" aria-hidden />
              {pulling.mode === 'sharpest'
                ? `Looking for the sharpest frame near ${formatClock(pulling.atMs)} …`
                : `Pulling the frame at ${formatClock(pulling.atMs)} …`}
            </li>
          )}
        </ul>
      )}
    </section>
  );
}
