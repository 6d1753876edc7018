import { Studio, User, type Tutorial } from '../../models';
import type { VersionContent } from '../../models/tutorial-version';
import { config } from '../../config';
import { ANONYMOUS, tutorialAbilities } from '../../policies';
import type { PublishBundle } from './types';
import { usableVersionPieces } from '../cut-list';
import { storage } from '../storage';
import { draftContent } from '../versions/content';
import { liveContent } from '../versions/versions';

/** The stable public address of a published tutorial. */
export const publicPath = (studioSlug: string, tutorialSlug: string) => `/t/${studioSlug}/${tutorialSlug}`;

/**
 * Which content a bundle is made from. `readers`: what readers see, the published version of a
 * published tutorial (never its draft) and the draft of one not published yet, which only its
 * studio can open. `draft`: the workspace's draft, for the people working on it.
 */
export type BundleSource = 'readers' | 'draft';

/**
 * Everything that goes out with a tutorial, loaded once for every export: the only database read
 * of the publish services. The public page, every export, the print view, the class handout and
 * the reader's view all come through here, so they all show the same version.
 */
export async function loadPublishBundle(tutorial: Tutorial, source: BundleSource = 'readers'): Promise<PublishBundle> {
  const content = source === 'readers' && tutorial.state === 'published' ? await liveContent(tutorial) : await draftContent(tutorial);
  return bundleOf(tutorial, content);
}

/** A bundle from a content (a version's or the draft's), with the live address, studio and maker's name. */
export async function bundleOf(tutorial: Tutorial, content: VersionContent): Promise<PublishBundle> {
  const [studio, author] = await Promise.all([
    Studio.findByPk(tutorial.studioId, { attributes: ['name', 'slug'] }),
    tutorial.authorId ? User.findByPk(tutorial.authorId, { attributes: ['name'] }) : null,
  ]);
  // The public address goes out only when visitors can open it.
  const published = tutorialAbilities(ANONYMOUS, tutorial).readPublicPage;
  return {
    tutorial: {
      title: content.title,
      slug: tutorial.slug,
      studioName: studio?.name ?? '',
      authorName: author?.name ?? '',
      publicUrl: published && studio ? `${config.publicUrl}${publicPath(studio.slug, tutorial.slug)}` : null,
      videoUrl: content.videoUrl,
      totalTimeMinutes: null,
    },
    doc: content.doc,
    // Pieces with a stored size that cannot be used stay out of everything published (the Cut list shows why).
    pieces: usableVersionPieces(content.pieces),
    supplies: content.supplies.map(({ id: _id, ...s }) => s),
    disclosure: content.disclosure,
    chapters: content.chapters.map((c) => ({ title: c.title, startMs: c.startMs })),
    stills: await Promise.all(
      content.stills.map(async (s) => ({
        id: s.id,
        atMs: s.atMs,
        caption: s.caption,
        alt: s.alt,
        width: s.width,
        height: s.height,
        file: await storage.imageSource(s.fileKey),
      })),
    ),
    precision: content.precision,
  };
}
