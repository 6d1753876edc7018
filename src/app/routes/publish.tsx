import { useQueryClient } from '@tanstack/react-query';
import { useOutletContext } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { exportUrls } from '@/features/publish/api/export-urls';
import { PublishSection } from '@/features/publish/components/publish-section';
import { tutorialKeys } from '@/features/tutorials/api/keys';
import { useUpdateTutorial } from '@/features/tutorials/api/tutorial-mutations';
import type { Tutorial } from '@/features/tutorials/api/types';

/**
 * A tutorial's Publish section. The public address needs the studio's slug, which comes with the
 * signed-in person's memberships; a review move hands back the tutorial, which the layout shows.
 */
export function PublishRoute() {
  const tutorial = useOutletContext<Tutorial>();
  const me = useMe();
  const qc = useQueryClient();
  const update = useUpdateTutorial();
  const studioSlug = me.data?.studios.find((s) => s.id === tutorial.studioId)?.slug;
  const publicUrl = studioSlug ? `${window.location.origin}${exportUrls.publicPage(studioSlug, tutorial.slug)}` : null;
  return (
    <PublishSection
      tutorial={tutorial}
      publicUrl={publicUrl}
      cutListPath={paths.tutorialSection(tutorial.id, 'cut-list')}
      footagePath={paths.tutorialSection(tutorial.id, 'footage')}
      onSaveVideoUrl={(videoUrl) => update.mutateAsync({ id: tutorial.id, videoUrl })}
      onMoved={(t) => {
        // The move answers with the whole tutorial (same shape as a read), so the header updates at once.
        qc.setQueryData(tutorialKeys.detail(tutorial.id), (old: Tutorial | undefined) => (old ? { ...old, ...(t as Partial<Tutorial>) } : old));
        return qc.invalidateQueries({ queryKey: tutorialKeys.all });
      }}
    />
  );
}
