import type { CommentDto, CommentsDto } from '@shared/schemas/comment';
import type { Comment, User } from '../models';
import { commentAbilities, type Actor, type TutorialAbilities } from '../policies';
import { describeAnchor, type AnchorTargets } from '../services/comments';

const person = (u: User | null | undefined) => (u ? { id: u.id, name: u.name } : null);

type Ctx = { actor: Actor; abilities: TutorialAbilities; targets: AnchorTargets; people: Map<string, User> };

/** A comment (and, for a thread's first one, its replies) with the caller's abilities. */
export function presentComment(c: Comment, ctx: Ctx, replies: Comment[] = []): CommentDto {
  const anchor = describeAnchor(c.anchor, c.anchorLabel, ctx.targets);
  return {
    id: c.id,
    tutorialId: c.tutorialId,
    parentId: c.parentId ?? null,
    author: person(c.author),
    body: c.body,
    anchor,
    orphaned: anchor?.status === 'missing',
    mentions: (c.mentionedIds ?? []).map((id) => person(ctx.people.get(id))).filter((p): p is NonNullable<typeof p> => !!p),
    resolved: c.resolvedAt !== null && c.resolvedAt !== undefined,
    resolvedAt: c.resolvedAt ? c.resolvedAt.toISOString() : null,
    resolvedBy: person(c.resolvedBy),
    editedAt: c.editedAt ? c.editedAt.toISOString() : null,
    createdAt: c.createdAt.toISOString(),
    replies: replies.map((r) => presentComment(r, ctx)),
    abilities: commentAbilities(ctx.actor, ctx.abilities, { authorId: c.authorId ?? null, parentId: c.parentId ?? null }),
  };
}

/** Every thread of a tutorial, with counts of open and resolved ones. */
export function presentComments(threads: Comment[], replies: Map<string, Comment[]>, ctx: Ctx): CommentsDto {
  const comments = threads.map((t) => presentComment(t, ctx, replies.get(t.id) ?? []));
  const resolved = comments.filter((c) => c.resolved).length;
  return { comments, counts: { open: comments.length - resolved, resolved }, abilities: { comment: ctx.abilities.comment } };
}
