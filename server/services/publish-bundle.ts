import type { RulerPrecision } from '@shared/measure';
import { Chapter, Recording, Still, Studio, User, type Tutorial } from '../models';
import { config } from '../config';
import type { PublishBundle } from './publish/types';
import { loadCutList } from './cut-list';
import { getArticle } from './write-up';
import { loadSupplies } from './supplies';
import { storage } from './storage';

/** The stable public address of a published tutorial. */
export const publicPath = (studioSlug: string, tutorialSlug: string) => `/t/${studioSlug}/${tutorialSlug}`;

/** Everything that goes out with a tutorial, loaded once for every export. */
export async function loadPublishBundle(tutorial: Tutorial): Promise<PublishBundle> {
  const [studio, author, cut, sup, article, rec] = await Promise.all([
    Studio.findByPk(tutorial.studioId, { attributes: ['name', 'slug'] }),
    tutorial.authorId ? User.findByPk(tutorial.authorId, { attributes: ['name'] }) : null,
    loadCutList(tutorial),
    loadSupplies(tutorial),
    getArticle(tutorial),
    Recording.findOne({ where: { tutorialId: tutorial.id }, order: [['createdAt', 'DESC']] }),
  ]);
  const [chapters, stills] = rec
    ? await Promise.all([
        Chapter.findAll({ where: { recordingId: rec.id }, order: [['startMs', 'ASC']] }),
        Still.findAll({ where: { recordingId: rec.id }, order: [['atMs', 'ASC']] }),
      ])
    : [[], []];
  const published = tutorial.state === 'published';
  return {
    tutorial: {
      title: tutorial.title,
      slug: tutorial.slug,
      studioName: studio?.name ?? '',
      authorName: author?.name ?? '',
      publicUrl: published && studio ? `${config.publicUrl}${publicPath(studio.slug, tutorial.slug)}` : null,
      videoUrl: tutorial.videoUrl,
      totalTimeMinutes: null,
    },
    doc: article.doc,
    pieces: cut.pieces,
    supplies: sup.supplies,
    disclosure: sup.disclosure.required ? sup.disclosure.text : null,
    chapters: chapters.map((c) => ({ title: c.title, startMs: c.startMs })),
    stills: stills.map((s) => ({ id: s.id, atMs: s.atMs, caption: s.caption, alt: s.alt, width: s.width, height: s.height, file: storage.localPath(s.fileKey) })),
    precision: tutorial.precision as RulerPrecision,
  };
}
