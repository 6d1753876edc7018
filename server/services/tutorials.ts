import type { InferAttributes } from 'sequelize';
import type { z } from 'zod';
import type { createTutorialSchema, listTutorialsQuery, updateTutorialSchema } from '@shared/schemas/tutorial';
import { Tutorial, User, type Studio } from '../models';
import { containsPattern } from '../lib/like';
import { retryOnUnique } from '../lib/unique';
import { columnsOf, selectRows, stored } from '../lib/plain-rows';
import { uniqueTutorialSlug } from './studios';

/** The unique index on (studio, slug) (migration create-tutorials). */
const TUTORIAL_SLUG = 'tutorials_studio_slug';

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
  if (!o.seeAll && o.state && o.state !== 'published') return [];
  const state = o.seeAll ? o.state : 'published';
  return selectTutorials(
    `t.studio_id = $studioId${state ? ' AND t.state = $state' : ''}${o.q ? ' AND t.title ILIKE $pattern' : ''} ORDER BY t.updated_at DESC`,
    { studioId: studio.id, ...(state && { state }), ...(o.q && { pattern: containsPattern(o.q) }) },
  );
}

/** One tutorial with its author (id and name), or null. */
export async function findTutorialWithAuthor(id: string): Promise<Tutorial | null> {
  const [t] = await selectTutorials('t.id = $id', { id });
  return t ?? null;
}

type AuthorRow = { author: { id: string; name: string } | null };

/** Tutorials with their authors in one plain query (the hot reads: see lib/plain-rows). */
async function selectTutorials(whereAndOrder: string, bind: Record<string, unknown>): Promise<Tutorial[]> {
  const rows = await selectRows<InferAttributes<Tutorial> & AuthorRow>(
    `SELECT ${columnsOf(Tutorial, 't')}, CASE WHEN a.id IS NULL THEN NULL ELSE json_build_object('id', a.id, 'name', a.name) END AS author
       FROM tutorials t LEFT JOIN users a ON a.id = t.author_id
      WHERE ${whereAndOrder}`,
    bind,
  );
  return rows.map(({ author, ...attributes }) => {
    const t = stored(Tutorial, attributes);
    if (author) t.author = stored(User, author);
    return t;
  });
}
