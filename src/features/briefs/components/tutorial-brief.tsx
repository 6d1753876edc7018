import { Link } from 'react-router-dom';
import { useTutorialBrief } from '../api/briefs';

const day = (d: string) =>
  new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${d}T00:00:00Z`));

/**
 * The coordinator's brief beside the review of the tutorial it started: what to make, what to
 * feature, the due date and the notes, so maker and coordinator review against what was asked.
 * Nothing shows for a tutorial not started from a brief.
 */
export function TutorialBrief({ tutorialId, briefPath }: { tutorialId: string; briefPath: (briefId: string) => string }) {
  const q = useTutorialBrief(tutorialId);
  const b = q.data?.brief;
  if (!b) return null;
  return (
    <section aria-labelledby="tutorial-brief-title" className="rounded-lg border border-line bg-white p-5">
      <h2 id="tutorial-brief-title" className="text-lg">
        The brief
      </h2>
      <p className="mt-1 font-medium">{b.title}</p>
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
      {b.notes && <p className="mt-1 text-sm whitespace-pre-line">{b.notes}</p>}
      <Link className="mt-2 inline-block text-sm text-kraft-dark underline" to={briefPath(b.id)}>
        See it among the studio’s briefs
      </Link>
    </section>
  );
}
