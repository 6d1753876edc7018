import type { PublishedTutorialDto } from '@shared/schemas/version';
import type { Tutorial } from '../../models';
import { NotFoundError } from '../../lib/errors';
import { blogImageBase } from '../../lib/media-urls';
import { blogHtml } from '../publish/blog';
import { ensureBlogImages } from '../publish/blog-images';
import { loadPublishBundle } from '../publish/bundle';
import { templateSvg } from '../publish/template';

/**
 * The reader's view of a published tutorial (students, class attendees): the published
 * version's article as the public page renders it, never the draft behind it. The page shows
 * the title and byline itself, so the article's own are left out, as is its JSON-LD.
 */
export async function readerView(tutorial: Tutorial): Promise<PublishedTutorialDto> {
  if (tutorial.state !== 'published') throw NotFoundError.saying('This tutorial is not published yet');
  const bundle = await loadPublishBundle(tutorial, 'readers');
  const blog = await blogHtml(bundle, { imageBase: blogImageBase(tutorial.id) });
  await ensureBlogImages(tutorial.id, blog.images);
  const html = blog.html
    .replace(/<script type="application\/ld\+json">[\s\S]*?<\/script>/, '')
    .replace(/^<article class="cw-tutorial"><h1>[\s\S]*?<\/h1>(?:<p class="cw-byline">[\s\S]*?<\/p>)?/, '<article class="cw-tutorial">');
  return {
    id: tutorial.id,
    title: bundle.tutorial.title,
    authorName: bundle.tutorial.authorName,
    studioName: bundle.tutorial.studioName,
    publishedAt: tutorial.publishedAt?.toISOString() ?? null,
    videoUrl: bundle.tutorial.videoUrl,
    html,
    templatePages: bundle.pieces.length ? templateSvg(bundle.pieces, { paper: 'letter', title: bundle.tutorial.title, precision: bundle.precision }).length : 0,
  };
}
