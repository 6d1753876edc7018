import { useCallback, useMemo, useRef, useState } from 'react';
import { useOutletContext, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { WriteUpSection } from '@/features/write-up/components/write-up-section';
import type { PassageRef, StepRef, WriteUpReviewHooks } from '@/features/write-up/utils/review-hooks';
import { CommentsPanel } from '@/features/comments/components/comments-panel';
import { CommentsJumpLink } from '@/features/comments/components/comments-jump-link';

/**
 * A tutorial's Write-up section (loaded lazily: the editor is the heaviest part of the client),
 * with its comments beside it (below it on a phone). The page passes the write-up's steps and
 * selected words to the comments, and a step's "Comment" button to the comment form.
 */
export function WriteUpRoute() {
  const tutorial = useOutletContext<TutorialDto>();
  const me = useMe();
  const [params] = useSearchParams();
  const withComments = tutorial.abilities.readComments;
  const [steps, setSteps] = useState<StepRef[]>([]);
  const [passage, setPassage] = useState<PassageRef | null>(null);
  const [preset, setPreset] = useState<{ value: string; nonce: number } | null>(null);
  const flush = useRef<(() => Promise<boolean>) | null>(null);
  const canComment = tutorial.abilities.comment;

  const review: WriteUpReviewHooks | undefined = useMemo(
    () =>
      withComments
        ? {
            onSteps: setSteps,
            onSelection: setPassage,
            onCommentOn: canComment ? (stepId: string) => setPreset({ value: `step:${stepId}`, nonce: Date.now() }) : undefined,
            flush,
          }
        : undefined,
    [withComments, canComment],
  );
  const beforeComment = useCallback(() => (flush.current ? flush.current() : Promise.resolve(true)), []);

  const section = <WriteUpSection tutorialId={tutorial.id} canEdit={tutorial.abilities.update} meId={me.data?.user.id ?? null} review={review} />;
  if (!withComments) return section;
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="min-w-0">
        <CommentsJumpLink tutorialId={tutorial.id} targetId="comments" className="mb-2 inline-block lg:hidden" />
        {section}
      </div>
      <aside
        id="comments"
        aria-label="Comments on this tutorial"
        className="min-w-0 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto lg:pr-1"
      >
        <CommentsPanel
          tutorialId={tutorial.id}
          steps={steps}
          passage={passage}
          preset={preset}
          focusCommentId={params.get('comment')}
          beforeComment={beforeComment}
          links={{ cutList: paths.tutorialSection(tutorial.id, 'cut-list'), footage: paths.tutorialSection(tutorial.id, 'footage') }}
        />
      </aside>
    </div>
  );
}
