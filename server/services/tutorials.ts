import { Op, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { createTutorialSchema, listTutorialsQuery, updateTutorialSchema } from '@shared/schemas/tutorial';
import { Tutorial, User, type Studio } from '../models';
import { containsPattern } from '../lib/like';
import { retryOnUnique } from '../lib/unique';
import { uniqueTutorialSlug } from './studios';

/** The unique index on (studio, slug) (migration create-tutorials). */
const TUTORIAL_SLUG = 'tutorials_studio_slug';

const withAuthor = { model: User, as: 'author', attributes: ['id', 'name'] };

/** A new draft by its maker, with a slug unique in the studio. */
export async function createTutorial(studio: Studio, author: User, input: z.output<typeof createTutorialSchema>): Promise<Tutorial> {
  return retryOnUnique([TUTORIAL_SLUG], async () =>
    Tutorial.create({
      studioId: studio.id,
      authorId: author.id,
      title: input.title,
      slug: await uniqueTutorialSlug(studio.id, input.title),
      dueDate: input.dueDate ?? null,
    }),
  );
}

/** Renames, re-dates or resets a tutorial; a draft's slug follows its title, a published one keeps its public address. */
export async function updateTutorial(tutorial: Tutorial, input: z.output<typeof updateTutorialSchema>): Promise<Tutorial> {
  return retryOnUnique([TUTORIAL_SLUG], async () => {
    const changes: Partial<Tutorial> = { ...input };
    if (input.title && input.title !== tutorial.title && tutorial.state !== 'published') {
      changes.slug = await uniqueTutorialSlug(tutorial.studioId, input.title, tutorial.id);
    }
    return tutorial.update(changes);
  });
}

/** Deletes a tutorial; its recordings, cut list, supplies and write-up go with it (the tables cascade). */
export async function deleteTutorial(tutorial: Tutorial): Promise<void> {
  await tutorial.destroy();
}

/**
 * A studio's tutorials, newest change first, with their authors. People who may not see every
 * tutorial (students) get the published ones only: their filter still filters (another state
 * than published finds nothing), so a chip never shows what it does not name.
 */
export async function listTutorials(studio: Studio, o: { seeAll: boolean } & z.output<typeof listTutorialsQuery>): Promise<Tutorial[]> {
  const where: WhereOptions<Tutorial> = { studioId: studio.id };
  if (!o.seeAll) {
    if (o.state && o.state !== 'published') return [];
    Object.assign(where, { state: 'published' });
  } else if (o.state) Object.assign(where, { state: o.state });
  if (o.q) Object.assign(where, { title: { [Op.iLike]: containsPattern(o.q) } });
  return Tutorial.findAll({ where, include: [withAuthor], order: [['updatedAt', 'DESC']] });
}
