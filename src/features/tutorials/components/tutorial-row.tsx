import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { StateBadge } from '@/components/ui/state-badge';
import { paths } from '@/config/paths';
import { useDeleteTutorial, useUpdateTutorial } from '../api/tutorial-mutations';
import type { Tutorial } from '../api/types';

const formatDue = (d: string | null) => (d ? new Date(`${d}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' }) : '—');

/** One tutorial in the studio list, with inline rename and delete for those allowed. */
export function TutorialRow({ tutorial }: { tutorial: Tutorial }) {
  const [editing, setEditing] = useState(false);
  const [title, setTitle] = useState(tutorial.title);
  const [confirm, setConfirm] = useState(false);
  const update = useUpdateTutorial();
  const remove = useDeleteTutorial();
  const save = async () => {
    const t = title.trim();
    if (!t || t === tutorial.title) return setEditing(false);
    await update.mutateAsync({ id: tutorial.id, title: t });
    setEditing(false);
  };
  return (
    <li className="flex items-center gap-4 border-b border-line px-4 py-3 last:border-0">
      <div className="min-w-0 flex-1">
        {editing ? (
          <form
            onSubmit={(e) => {
              e.preventDefault();
              void save();
            }}
            className="flex gap-2"
          >
            <input
              aria-label="Tutorial title"
              autoFocus
              className="w-full rounded-md border border-kraft bg-white px-2 py-1 text-sm"
              value={title}
              onChange={(e) => setTitle(e.target.value)}
              onKeyDown={(e) => {
                if (e.key === 'Escape') {
                  setTitle(tutorial.title);
                  setEditing(false);
                }
              }}
            />
            <Button size="sm" type="submit" busy={update.isPending}>
              Save
            </Button>
          </form>
        ) : (
          <Link to={paths.tutorial(tutorial.id)} className="font-serif text-base hover:text-kraft-dark">
            {tutorial.title}
          </Link>
        )}
        {update.error && <p className="text-xs text-rosehip">{update.error.message}</p>}
        <p className="text-xs text-pencil">{tutorial.author ? `by ${tutorial.author.name}` : ''}</p>
      </div>
      <StateBadge state={tutorial.state} />
      <span className="w-28 text-right text-sm text-pencil" title="Due date">
        {formatDue(tutorial.dueDate)}
      </span>
      <div className="flex w-40 justify-end gap-1">
        {tutorial.abilities.update && !editing && (
          <Button size="sm" variant="ghost" onClick={() => setEditing(true)}>
            Rename
          </Button>
        )}
        {tutorial.abilities.delete && (
          <Button size="sm" variant="ghost" className="text-rosehip" onClick={() => setConfirm(true)}>
            Delete
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={confirm}
        title={`Delete “${tutorial.title}”?`}
        confirmLabel="Delete tutorial"
        danger
        busy={remove.isPending}
        onCancel={() => setConfirm(false)}
        onConfirm={async () => {
          await remove.mutateAsync(tutorial.id);
          setConfirm(false);
        }}
      >
        Its footage, cut list and write-up go with it. This cannot be undone.
      </ConfirmDialog>
    </li>
  );
}
