import type { BriefDto } from '@shared/schemas/brief';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { STATE_LABELS } from '@shared/schemas/tutorial';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useDeleteBrief, useStartTutorial } from '../api/briefs';

const day = (d: string) =>
  new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${d}T00:00:00Z`));

/** Briefs with what to feature, and the way to start (or open) each one's tutorial. */
export function BriefList({
  briefs,
  tutorialPath,
  onStarted,
}: {
  briefs: BriefDto[];
  tutorialPath: (id: string) => string;
  onStarted: (t: TutorialDto) => void;
}) {
  const start = useStartTutorial();
  const remove = useDeleteBrief();
  return (
    <ul className="grid gap-3">
      {briefs.map((b) => (
        <li key={b.id} id={`brief-${b.id}`} className="rounded-lg border border-line bg-white p-4 target:border-kraft">
          <h3 className="text-base font-medium">{b.title}</h3>
          <p className="text-sm text-pencil">
            For {b.maker.name} · due {day(b.dueDate)}
            {b.createdBy ? ` · from ${b.createdBy.name}` : ''}
          </p>
          {b.features.length > 0 && (
            <div className="mt-2 text-sm">
              <span className="font-medium">Feature: </span>
              {b.features.join(' · ')}
            </div>
          )}
          {b.notes && <p className="mt-1 text-sm">{b.notes}</p>}
          <div className="mt-3 flex flex-wrap items-center gap-2">
            {b.tutorial ? (
              <Link className="text-sm text-kraft-dark underline" to={tutorialPath(b.tutorial.id)}>
                Open the tutorial ({STATE_LABELS[b.tutorial.state]})
              </Link>
            ) : b.abilities.startTutorial ? (
              <Button size="sm" busy={start.isPending && start.variables === b.id} onClick={() => start.mutate(b.id, { onSuccess: onStarted })}>
                Start the tutorial
              </Button>
            ) : (
              <span className="text-sm text-pencil">Not started yet</span>
            )}
            {b.abilities.delete && (
              <Button size="sm" variant="ghost" busy={remove.isPending && remove.variables === b.id} onClick={() => remove.mutate(b.id)}>
                Withdraw <span className="sr-only">“{b.title}”</span>
              </Button>
            )}
          </div>
        </li>
      ))}
      {(start.error || remove.error) && <Notice kind="error">{(start.error ?? remove.error)!.message}</Notice>}
    </ul>
  );
}
