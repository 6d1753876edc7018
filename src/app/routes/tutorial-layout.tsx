import { NavLink, Outlet, useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { StateBadge } from '@/components/ui/state-badge';
import { paths, TUTORIAL_SECTIONS } from '@/config/paths';
import { useTutorial } from '@/features/tutorials/api/get-tutorial';

/** A tutorial's workspace: title, state and the five sections. */
export function TutorialLayoutRoute() {
  const { tutorialId = '' } = useParams();
  const t = useTutorial(tutorialId);
  if (t.isPending) return <main className="mx-auto max-w-7xl px-6 py-8"><Loading label="Opening the tutorial" /></main>;
  if (t.error) return <main className="mx-auto max-w-7xl px-6 py-8"><Notice kind="error">{t.error.message}</Notice></main>;
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <div className="flex items-center gap-3">
        <h1 className="text-2xl">{t.data.title}</h1>
        <StateBadge state={t.data.state} />
      </div>
      <nav className="mt-4 flex gap-1 border-b border-line" aria-label="Tutorial sections">
        {TUTORIAL_SECTIONS.map((s) => (
          <NavLink
            key={s.key}
            to={paths.tutorialSection(tutorialId, s.key)}
            className={({ isActive }) =>
              `-mb-px border-b-2 px-4 py-2 text-sm ${isActive ? 'border-kraft font-medium text-kraft-dark' : 'border-transparent text-ink hover:text-kraft-dark'}`
            }
          >
            {s.label}
          </NavLink>
        ))}
      </nav>
      <div className="pt-6">
        <Outlet context={t.data} />
      </div>
    </main>
  );
}
