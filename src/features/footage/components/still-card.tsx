import { memo, useState } from 'react';
import { updateStillSchema, type StillDto } from '@shared/schemas/footage';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { formatClock } from '../utils/format';
import { SavedField } from './saved-field';

type Props = {
  still: StillDto;
  canEdit: boolean;
  onSeek: (ms: number) => void;
  onSave: (id: string, change: { caption?: string; alt?: string }) => Promise<unknown>;
  onDelete: (id: string) => Promise<unknown>;
};

const check = (field: 'caption' | 'alt') => (v: string) => {
  const r = updateStillSchema.safeParse({ [field]: v });
  return r.success ? null : (r.error.issues[0]?.message ?? 'This cannot be saved');
};

/** One still: its image, its time (seeks back there), caption and alt text, and delete. */
export const StillCard = memo(function StillCard({ still, canEdit, onSeek, onSave, onDelete }: Props) {
  const [confirm, setConfirm] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const moved = still.mode === 'sharpest' && still.atMs !== still.requestedMs;
  const altEmpty = !still.alt?.trim();

  return (
    <li className="flex flex-col overflow-hidden rounded-lg border border-line bg-white">
      <button type="button" onClick={() => onSeek(still.atMs)} className="group relative block bg-ink/5" aria-label={`Play from ${formatClock(still.atMs)}`}>
        <img
          src={still.url}
          width={still.width}
          height={still.height}
          loading="lazy"
          alt={still.alt?.trim() || `Still at ${formatClock(still.atMs)}`}
          style={{ aspectRatio: `${still.width} / ${still.height}` }}
          className="w-full object-cover"
        />
      </button>
      <div className="flex flex-1 flex-col gap-2 p-3">
        <div className="flex items-center justify-between gap-2 text-xs">
          <button type="button" onClick={() => onSeek(still.atMs)} className="font-medium tabular-nums text-kraft-dark hover:underline">
            {formatClock(still.atMs)}
          </button>
          <span className="truncate text-pencil tabular-nums">
            {still.mode === 'sharpest' ? (moved ? `sharpest near ${formatClock(still.requestedMs)}` : 'sharpest nearby') : 'exact frame'} · {still.width} ×{' '}
            {still.height}
          </span>
        </div>
        {canEdit ? (
          <>
            <SavedField
              label="Caption"
              value={still.caption ?? ''}
              check={check('caption')}
              onSave={(v) => onSave(still.id, { caption: v })}
              placeholder="What this step shows"
            />
            <SavedField
              label="Alt text"
              value={still.alt ?? ''}
              check={check('alt')}
              onSave={(v) => onSave(still.id, { alt: v })}
              placeholder="e.g. Scoring the box wall along the ruler"
              hint={altEmpty ? 'Readers using screen readers hear this instead of seeing the photo: say in a few words what it shows.' : undefined}
            />
            <div className="mt-auto flex justify-end pt-1">
              <Button variant="ghost" size="sm" className="text-rosehip" onClick={() => setConfirm(true)}>
                Delete
              </Button>
            </div>
            <ConfirmDialog
              open={confirm}
              title="Delete this still?"
              confirmLabel="Delete still"
              danger
              busy={deleting}
              onCancel={() => setConfirm(false)}
              onConfirm={async () => {
                setDeleting(true);
                try {
                  await onDelete(still.id);
                } finally {
                  setDeleting(false);
                  setConfirm(false);
                }
              }}
            >
              The frame at {formatClock(still.atMs)} is removed with its caption and alt text. You can pull it again from the video.
            </ConfirmDialog>
          </>
        ) : (
          <div className="space-y-1 text-sm">
            <p>{still.caption?.trim() || <span className="text-pencil">No caption</span>}</p>
            <p className="text-xs text-pencil">Alt text: {still.alt?.trim() || 'none yet'}</p>
          </div>
        )}
      </div>
    </li>
  );
});
