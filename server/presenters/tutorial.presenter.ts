import type { TutorialDto } from '@shared/schemas/tutorial';
import type { Tutorial } from '../models';
import type { TutorialAbilities } from '../policies';

/** The tutorial as the API shows it, with the caller's abilities. */
export function presentTutorial(t: Tutorial, abilities: TutorialAbilities): TutorialDto {
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
    publishedAt: t.publishedAt?.toISOString() ?? null,
    updateState: t.state === 'published' ? (t.updateState ?? null) : null,
    pendingUpdate: t.state === 'published' && Boolean(t.updateState),
    videoUrl: t.videoUrl,
    briefId: t.briefId ?? null,
    publishAt: t.publishAt?.toISOString() ?? null,
    publishTimeZone: t.publishTimeZone ?? null,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
    abilities,
  };
}
