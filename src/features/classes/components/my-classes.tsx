import { Link } from 'react-router-dom';
import { REGISTRATION_STATUS_LABELS } from '@shared/schemas/class';
import { useMyClasses } from '../api/public-class';

/** A student's classes: when, status, the handout and the tutorial. Nothing shows until they have one. */
export function MyClasses() {
  const q = useMyClasses();
  if (!q.data?.classes.length) return null;
  return (
    <section aria-label="Your classes" className="mb-6 rounded-lg border border-line bg-white p-4">
      <h2 className="text-xl">Your classes</h2>
      <ul className="mt-2 divide-y divide-line">
        {q.data.classes.map((c) => (
          <li key={c.registrationId} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 py-2 text-sm">
            <Link to={c.registrationUrl} className="font-medium text-kraft-dark underline">
              {c.class.title}
            </Link>
            <span>{c.class.when}</span>
            <span className="text-pencil">{REGISTRATION_STATUS_LABELS[c.status]}</span>
            <span className="ml-auto flex gap-3">
              {c.handoutUrl && (
                <a className="underline" href={c.handoutUrl} download>
                  Handout
                </a>
              )}
              {c.tutorialUrl && (
                <a className="underline" href={c.tutorialUrl}>
                  Tutorial
                </a>
              )}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
