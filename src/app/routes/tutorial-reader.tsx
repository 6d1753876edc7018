import { Link } from 'react-router-dom';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { paths } from '@/config/paths';
import { usePublished } from '@/features/publish/api/get-published';
import { PublishedArticle, PublishedArticleState } from '@/features/publish/components/published-article';
import { ReaderDownloads } from '@/features/publish/components/reader-downloads';

/**
 * A published tutorial as the people who follow it see it (students; class attendees): the
 * published version's write-up with its photos, cut list and supplies, and the handout and
 * template to take to the table. Never the workspace's draft: edits made since publishing reach
 * readers only when their update is approved and published. Nothing to edit.
 */
export function TutorialReader({ tutorial }: { tutorial: TutorialDto }) {
  const published = usePublished(tutorial.id);
  const title = published.data?.title ?? tutorial.title;
  const author = published.data?.authorName || tutorial.author?.name;
  return (
    <main className="mx-auto max-w-6xl px-4 py-6 sm:px-6">
      <p className="text-sm">
        <Link to={paths.studio(tutorial.studioId)} className="text-kraft-dark underline">
          All tutorials
        </Link>
      </p>
      <h1 className="mt-2 text-2xl sm:text-3xl">{title}</h1>
      {author && <p className="mt-1 text-sm text-pencil">by {author}</p>}
      <hr className="score-rule my-4" />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_17rem]">
        <div className="min-w-0">
          {published.data ? (
            <PublishedArticle published={published.data} label={`${title}, the tutorial`} />
          ) : (
            <PublishedArticleState pending={published.isPending} error={published.error} />
          )}
        </div>
        <div className="lg:sticky lg:top-4">
          <ReaderDownloads tutorialId={tutorial.id} videoUrl={published.data ? published.data.videoUrl : tutorial.videoUrl} />
        </div>
      </div>
    </main>
  );
}
