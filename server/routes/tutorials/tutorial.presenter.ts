import type { Tutorial } from '../../models';
import type { TutorialAbilities } from '../../policies/tutorial.policy';

/** The tutorial as the API shows it, with the caller's abilities. */
export function presentTutorial(t: Tutorial, abilities: TutorialAbilities) {
  return {
    id: t.id,
    studioId: t.studioId,
    authorId: t.authorId,
    author: t.author ? { id: t.author.id, name: t.author.name } : undefined,
    title: t.title,
    slug: t.slug,
    state: t.state,
    dueDate: t.dueDate,
    precision: t.precision,
    defaultUnit: t.defaultUnit,
    publishedAt: t.publishedAt,
    videoUrl: t.videoUrl,
    createdAt: t.createdAt,
    updatedAt: t.updatedAt,
    abilities,
  };
}
