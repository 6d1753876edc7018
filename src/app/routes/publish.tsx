import { useQueryClient } from '@tanstack/react-query';
import { Link, useOutletContext } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { exportUrls } from '@/features/publish/api/export-urls';
import { PublishSection } from '@/features/publish/components/publish-section';
import { SheetChecksPanel } from '@/features/supplies/components/sheet-checks-panel';
import { tutorialKeys } from '@/features/tutorials/api/keys';
import { useUpdateTutorial } from '@/features/tutorials/api/tutorial-mutations';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { useComments } from '@/features/comments/api/get-comments';
import { commentKeys } from '@/features/comments/api/keys';
import { reviewKeys } from '@/features/review/api/keys';
import { ReviewChecklist } from '@/features/review/components/review-checklist';
import { ReviewHistory } from '@/features/review/components/review-history';
import { CompareView } from '@/features/versions/components/compare-view';
import { TutorialBrief } from '@/features/briefs/components/tutorial-brief';
import { versionKeys } from '@/features/versions/api/keys';

/**
 * A tutorial's Publish section. The public address needs the studio's slug, which comes with the
 * signed-in person's memberships; a review move hands back the tutorial, which the layout shows.
 */
export function PublishRoute() {
  const tutorial = useOutletContext<TutorialDto>();
  const me = useMe();
  const qc = useQueryClient();
  const update = useUpdateTutorial();
  const studioSlug = me.data?.studios.find((s) => s.id === tutorial.studioId)?.slug;
  const publicUrl = studioSlug ? `${window.location.origin}${exportUrls.publicPage(studioSlug, tutorial.slug)}` : null;
  const reviewing = tutorial.abilities.readComments;
  const comments = useComments(tutorial.id, reviewing);
  const openComments = (comments.data?.comments ?? [])
    .filter((c) => !c.resolved)
    .map((c) => ({
      id: c.id,
      where: c.anchor ? (c.anchor.status === 'missing' ? `${c.anchor.label} (deleted)` : c.anchor.label) : 'The whole tutorial',
      body: c.body,
      author: c.author?.name ?? 'A former member',
    }));
  const sectionPath = (s: 'write-up' | 'supplies' | 'cut-list' | 'footage' | 'tutorial') =>
    s === 'tutorial' ? paths.tutorial(tutorial.id) : paths.tutorialSection(tutorial.id, s);
  return (
    <>
      <SheetChecksPanel tutorialId={tutorial.id} canEdit={tutorial.abilities.update} where="publish" className="mb-5" />
      <PublishSection
        tutorial={tutorial}
        publicUrl={publicUrl}
        cutListPath={paths.tutorialSection(tutorial.id, 'cut-list')}
        footagePath={paths.tutorialSection(tutorial.id, 'footage')}
        onSaveVideoUrl={(videoUrl) => update.mutateAsync({ id: tutorial.id, videoUrl })}
        onMoved={(t) => {
          // The move answers with the whole tutorial (same shape as a read), so the header updates at once.
          qc.setQueryData(tutorialKeys.detail(tutorial.id), (old: TutorialDto | undefined) => (old ? { ...old, ...(t as Partial<TutorialDto>) } : old));
          return Promise.all([
            qc.invalidateQueries({ queryKey: tutorialKeys.all }),
            qc.invalidateQueries({ queryKey: reviewKeys.tutorial(tutorial.id) }),
            qc.invalidateQueries({ queryKey: commentKeys.tutorial(tutorial.id) }),
            qc.invalidateQueries({ queryKey: versionKeys.tutorial(tutorial.id) }),
          ]);
        }}
        openComments={openComments}
        review={
          reviewing && (
            <>
              {tutorial.briefId && <TutorialBrief tutorialId={tutorial.id} briefPath={(briefId) => paths.brief(tutorial.studioId, briefId)} />}
              <CompareView tutorialId={tutorial.id} published={tutorial.state === 'published'} />
              <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
                <ReviewChecklist tutorialId={tutorial.id} sectionPath={sectionPath} />
                <ReviewHistory tutorialId={tutorial.id} />
              </div>
            </>
          )
        }
      />
      {tutorial.abilities.scheduleClass && (
        <p className="mt-6 text-sm">
          Teaching it in person or online?{' '}
          <Link className="font-medium text-kraft-dark underline" to={paths.scheduleClassFrom(tutorial.studioId, tutorial.id)}>
            Schedule a class from this tutorial
          </Link>
        </p>
      )}
    </>
  );
}
