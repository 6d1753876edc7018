import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { StateBadge } from '@/components/ui/state-badge';
import { paths } from '@/config/paths';
import { useDeleteTutorial, useUpdateTutorial } from '../api/tutorial-mutations';
import type { TutorialDto } from '@shared/schemas/tutorial';

const formatDue = (d: string | null) =>
  d ? new Date(`${d}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' }) : null;

const fieldCls = 'rounded-md border border-field bg-white px-2 py-1 text-sm';

/**
 * One tutorial in the studio list. Those allowed edit its title and due date in place (a brief's
 * date moves more often than its title) and delete it. On a phone the row stacks: title and
 * state, then who and when, then the actions.
 */
export function TutorialRow({ tutorial }: { tutorial: TutorialDto }) {
  const [editing, setEditing] = useState(false);
  const [title, setTitle] = useState(tutorial.title);
  const [due, setDue] = useState(tutorial.dueDate ?? '');
  const [confirm, setConfirm] = useState(false);
  const update = useUpdateTutorial();
  const remove = useDeleteTutorial();
  const cancel = () => {
    setTitle(tutorial.title);
    setDue(tutorial.dueDate ?? '');
    update.reset();
    setEditing(false);
  };
  const save = async () => {
    const t = title.trim();
    const change: { title?: string; dueDate?: string | null } = {};
    if (t && t !== tutorial.title) change.title = t;
    if ((due || null) !== tutorial.dueDate) change.dueDate = due || null;
    if (!Object.keys(change).length) return setEditing(false);
    await update.mutateAsync({ id: tutorial.id, ...change });
    setEditing(false);
  };
  const dueText = formatDue(tutorial.dueDate);
  return (
    <li className="border-b border-line px-4 py-3 last:border-0">
      {editing ? (
        <form
          aria-label={`Edit “${tutorial.title}”`}
          onSubmit={(e) => {
            e.preventDefault();
            void save().catch(() => undefined);
          }}
          onKeyDown={(e) => e.key === 'Escape' && cancel()}
          className="flex flex-wrap items-end gap-2"
        >
          <label className="flex min-w-0 flex-[1_1_16rem] flex-col gap-1 text-xs text-pencil">
            Title
            <input aria-label="Tutorial title" autoFocus className={`${fieldCls} w-full text-ink`} value={title} onChange={(e) => setTitle(e.target.value)} />
          </label>
          <label className="flex flex-col gap-1 text-xs text-pencil">
            Due
            <input aria-label="Due date" type="date" className={`${fieldCls} text-ink`} value={due} onChange={(e) => setDue(e.target.value)} />
          </label>
          <div className="flex gap-2">
            <Button size="sm" type="submit" busy={update.isPending}>
              Save
            </Button>
            <Button size="sm" variant="secondary" onClick={cancel}>
              Cancel
            </Button>
          </div>
          {update.error && (
            <p className="w-full text-xs text-rosehip" role="alert">
              {update.error.message}
            </p>
          )}
        </form>
      ) : (
        <div className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-x-4 gap-y-1 sm:grid-cols-[minmax(0,1fr)_auto_7.5rem_auto]">
          <div className="min-w-0">
            <Link to={paths.tutorial(tutorial.id)} className="font-serif text-base break-words hover:text-kraft-dark">
              {tutorial.title}
            </Link>
            <p className="text-xs text-pencil">{tutorial.author ? `by ${tutorial.author.name}` : ''}</p>
          </div>
          <StateBadge state={tutorial.state} />
          <span className="text-sm text-pencil sm:text-right">
            {dueText ? (
              <>
                <span className="sm:sr-only">Due </span>
                {dueText}
              </>
            ) : (
              <span className="sr-only">No due date</span>
            )}
          </span>
          <div className="flex justify-end gap-1">
            {tutorial.abilities.update && (
              <Button size="sm" variant="ghost" onClick={() => setEditing(true)} aria-label={`Edit title and due date of “${tutorial.title}”`}>
                Edit
              </Button>
            )}
            {tutorial.abilities.delete && (
              <Button size="sm" variant="ghost" className="text-rosehip" onClick={() => setConfirm(true)} aria-label={`Delete “${tutorial.title}”`}>
                Delete
              </Button>
            )}
          </div>
        </div>
      )}
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
