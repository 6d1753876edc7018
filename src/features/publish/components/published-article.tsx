import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import type { PublishedTutorialDto } from '@shared/schemas/version';
import './published-article.css';

/**
 * The published version's article as the public page shows it: steps with their photos, the cut
 * list and supplies as they were approved. The markup comes from the server's own renderer
 * (escaped text, checked addresses, no scripts), the same one the public page and blog export use.
 */
export function PublishedArticle({ published, label }: { published: PublishedTutorialDto; label: string }) {
  return <div className="pa-article" role="document" aria-label={label} dangerouslySetInnerHTML={{ __html: published.html }} />;
}

/** While the published version loads, or why it cannot be shown. */
export function PublishedArticleState({ pending, error }: { pending: boolean; error: Error | null }) {
  if (pending) return <Loading label="Opening the tutorial" />;
  if (error) return <Notice kind="error">{error.message}</Notice>;
  return null;
}
