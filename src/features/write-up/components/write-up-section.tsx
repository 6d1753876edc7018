import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useArticle } from '../api/get-article';
import type { WriteUpReviewHooks } from '../utils/review-hooks';
import { WriteUpWorkspace } from './write-up-workspace';

/**
 * A tutorial's Write-up section: loads the current write-up, then hands it to the workspace,
 * which keeps its own working copy from then on (a refetch never resets what is being typed).
 */
export function WriteUpSection({
  tutorialId,
  canEdit,
  meId,
  review,
}: {
  tutorialId: string;
  canEdit: boolean;
  meId: string | null;
  /** Comments beside the write-up listen here (see review-hooks.ts). */
  review?: WriteUpReviewHooks;
}) {
  const article = useArticle(tutorialId);
  if (article.isPending) return <Loading label="Opening the write-up" />;
  if (article.error) return <Notice kind="error">{article.error.message}</Notice>;
  return (
    <WriteUpWorkspace
      key={tutorialId}
      tutorialId={tutorialId}
      article={article.data}
      canEdit={canEdit && article.data.abilities.update}
      meId={meId}
      review={review}
    />
  );
}
