import { useEffect, useRef } from 'react';
import { useIsMutating, useQueryClient } from '@tanstack/react-query';
import { NavLink, Outlet, useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { StateBadge } from '@/components/ui/state-badge';
import { paths, TUTORIAL_SECTIONS } from '@/config/paths';
import { useTutorial } from '@/features/tutorials/api/get-tutorial';
import { tutorialKeys } from '@/features/tutorials/api/keys';
import { LiveNotice } from '@/features/versions/components/live-notice';
import { TutorialReader } from './tutorial-reader';

/**
 * An edit anywhere in a published tutorial's workspace (write-up, cut list, supplies, footage)
 * makes an update on the server; once a save finishes, the tutorial is read again so the header
 * says "update pending" at once.
 */
function useLiveStateFollowsEdits(tutorialId: string, published: boolean) {
  const qc = useQueryClient();
  const mutating = useIsMutating();
  const before = useRef(mutating);
  useEffect(() => {
    if (published && before.current > 0 && mutating === 0) void qc.invalidateQueries({ queryKey: tutorialKeys.detail(tutorialId) });
    before.current = mutating;
  }, [mutating, published, qc, tutorialId]);
}

/** A tutorial's workspace: title, state and the five sections. */
export function TutorialLayoutRoute() {
  const { tutorialId = '' } = useParams();
  const t = useTutorial(tutorialId);
  useLiveStateFollowsEdits(tutorialId, t.data?.state === 'published');
  if (t.isPending)
    return (
      <main className="mx-auto max-w-7xl px-4 sm:px-6 py-8">
        <Loading label="Opening the tutorial" />
      </main>
    );
  if (t.error)
    return (
      <main className="mx-auto max-w-7xl px-4 sm:px-6 py-8">
        <Notice kind="error">{t.error.message}</Notice>
      </main>
    );
  // Readers (students) get the published version, never the workspace's draft.
  if (!t.data.abilities.readDraft) return <TutorialReader tutorial={t.data} />;
  return (
    <main className="mx-auto max-w-7xl px-4 sm:px-6 py-6">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <h1 className="text-xl sm:text-2xl">{t.data.title}</h1>
        <StateBadge state={t.data.state} />
      </div>
      <LiveNotice tutorial={t.data} comparePath={paths.whatChanged(tutorialId)} />
      {/* Five short tabs fit a 390 px phone; narrower screens scroll them sideways. */}
      <nav className="-mx-4 mt-4 flex gap-0.5 overflow-x-auto border-b border-line px-4 sm:mx-0 sm:gap-1 sm:px-0" aria-label="Tutorial sections">
        {TUTORIAL_SECTIONS.map((s) => (
          <NavLink
            key={s.key}
            to={paths.tutorialSection(tutorialId, s.key)}
            className={({ isActive }) =>
              `-mb-px shrink-0 border-b-2 px-2 py-2 text-sm whitespace-nowrap sm:px-4 ${isActive ? 'border-kraft font-medium text-kraft-dark' : 'border-transparent text-ink hover:text-kraft-dark'}`
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
