import type { Actor } from './actor';
import type { TutorialAbilities } from './tutorial.policy';

type CommentLike = { authorId: string | null; parentId: string | null };

/**
 * What a person may do with one comment, given what they may do with its tutorial: whoever may
 * comment replies and resolves or reopens threads; only its author changes its words.
 */
export function commentAbilities(actor: Actor, tutorial: Pick<TutorialAbilities, 'comment'>, c: CommentLike) {
  const mine = actor.userId !== null && c.authorId === actor.userId;
  return {
    reply: tutorial.comment,
    /** Threads are resolved as a whole, from their first comment. */
    resolve: tutorial.comment && c.parentId === null,
    edit: tutorial.comment && mine,
  };
}
