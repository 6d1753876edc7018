import { Link } from 'react-router-dom';
import type { ClassSummaryDto } from '@shared/schemas/class';

/** The studio's classes: when, which tutorial, seats taken and the waiting list. */
export function ClassList({ classes, linkTo }: { classes: ClassSummaryDto[]; linkTo: (id: string) => string }) {
  return (
    <ul className="rounded-lg border border-line bg-white">
      {classes.map((k) => (
        <li key={k.id} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 border-b border-line px-4 py-3 last:border-0">
          <Link to={linkTo(k.id)} className="font-medium text-kraft-dark underline">
            {k.title}
          </Link>
          <span className="text-sm">{k.when}</span>
          <span className="text-sm text-pencil">from “{k.tutorialTitle}”</span>
          <span className="ml-auto text-sm">
            {k.status === 'cancelled' ? (
              <span className="text-rosehip">cancelled</span>
            ) : (
              <>
                {k.seatsTaken} of {k.seats} seats{k.waitlisted ? ` · ${k.waitlisted} waiting` : ''} · {k.fee}
              </>
            )}
          </span>
        </li>
      ))}
    </ul>
  );
}
