import { Router } from 'express';
import { createCommentSchema, replySchema, updateCommentSchema, type MentionableDto } from '@shared/schemas/comment';
import { idParams } from '@shared/schemas/studio';
import { route } from '../../lib/route';
import { authorize, commentAbilities, type Actor, type TutorialAbilities } from '../../policies';
import { loadTutorial } from '../../services/access';
import {
  addComment,
  addReply,
  anchorTargets,
  editComment,
  findComment,
  listThreads,
  loadThread,
  mentionable,
  peopleById,
  setResolved,
} from '../../services/comments';
import { presentComment, presentComments } from '../../presenters/comment.presenter';
import type { Comment, Tutorial } from '../../models';

const READ_ONLY = 'Only the tutorial’s maker, its coordinators and the studio owner comment; other makers read';

/** A thread as the API sends it: its first comment with every reply. */
async function presentThread(rootId: string, tutorial: Tutorial, actor: Actor, abilities: TutorialAbilities) {
  const { root, replies } = await loadThread(rootId);
  const ctx = { actor, abilities, targets: await anchorTargets(tutorial), people: await peopleById([root, ...replies]) };
  return presentComment(root, ctx, replies);
}

/** One comment or reply as the API sends it (a thread's first comment comes with its replies). */
async function presentOne(c: Comment, tutorial: Tutorial, actor: Actor, abilities: TutorialAbilities) {
  if (!c.parentId) return presentThread(c.id, tutorial, actor, abilities);
  const { replies } = await loadThread(c.parentId);
  const loaded = replies.find((r) => r.id === c.id) ?? c;
  return presentComment(loaded, { actor, abilities, targets: await anchorTargets(tutorial), people: await peopleById([loaded]) });
}

/** Comments on a tutorial (DESIGN.md T2): threads, replies, resolve and reopen, mentions. */
export function commentsRouter() {
  const r = Router();

  r.get(
    '/tutorials/:id/comments',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readComments', 'Comments are for the studio’s makers and coordinators');
      const { threads, replies } = await listThreads(tutorial);
      const people = await peopleById([...threads, ...[...replies.values()].flat()]);
      res.json(presentComments(threads, replies, { actor, abilities, targets: await anchorTargets(tutorial), people }));
    }),
  );

  r.post(
    '/tutorials/:id/comments',
    route({ params: idParams, body: createCommentSchema }, async ({ params, body, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'comment', READ_ONLY);
      const c = await addComment({ tutorial, by: user, body: body.body, anchor: body.anchor, mentions: body.mentions });
      res.status(201).json(await presentThread(c.id, tutorial, actor, abilities));
    }),
  );

  // The people the "@" picker offers: members who can read the comments.
  r.get(
    '/tutorials/:id/mentionable',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readComments', 'Comments are for the studio’s makers and coordinators');
      const people: MentionableDto[] = (await mentionable(tutorial.studioId)).map((u) => ({ id: u.id, name: u.name }));
      res.json({ people });
    }),
  );

  r.post(
    '/comments/:id/replies',
    route({ params: idParams, body: replySchema }, async ({ params, body, user, res }) => {
      const parent = await findComment(params.id);
      const { tutorial, actor, abilities } = await loadTutorial(user, parent.tutorialId);
      authorize(abilities, 'comment', READ_ONLY);
      const reply = await addReply({ tutorial, parent, by: user, body: body.body, mentions: body.mentions });
      res.status(201).json(await presentOne(reply, tutorial, actor, abilities));
    }),
  );

  r.patch(
    '/comments/:id',
    route({ params: idParams, body: updateCommentSchema }, async ({ params, body, user, res }) => {
      const comment = await findComment(params.id);
      const { tutorial, actor, abilities } = await loadTutorial(user, comment.tutorialId);
      authorize(abilities, 'comment', READ_ONLY);
      if ('resolved' in body) {
        await setResolved(comment, user, body.resolved);
      } else {
        authorize(commentAbilities(actor, abilities, comment), 'edit', 'Only the person who wrote a comment can change its words');
        await editComment({ tutorial, comment, by: user, body: body.body, mentions: body.mentions });
      }
      res.json(await presentOne(comment, tutorial, actor, abilities));
    }),
  );

  return r;
}
