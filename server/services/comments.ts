import { Op } from 'sequelize';
import type { JSONContent } from '@tiptap/core';
import { stepsOf } from '@shared/editor/step-ids';
import type { CommentAnchor, CommentAnchorDto } from '@shared/schemas/comment';
import type { OpenCommentDto } from '@shared/schemas/review';
import { Article, Comment, Membership, PieceRow, Recording, Still, User, type Tutorial } from '../models';
import { BadRequestError, fieldError, NotFoundError } from '../lib/errors';
import { notify } from './notify';

/** What anchors can point at in one tutorial now: its steps, pieces and stills. */
export type AnchorTargets = {
  steps: Map<string, { number: number; title: string; text: string }>;
  pieces: Map<string, string>;
  stills: Map<string, { atMs: number; caption: string }>;
};

/** The tutorial's current steps (from the saved write-up), pieces and stills. */
export async function anchorTargets(tutorial: Tutorial): Promise<AnchorTargets> {
  const [article, pieces, stills] = await Promise.all([
    Article.findByPk(tutorial.id, { attributes: ['doc'] }),
    PieceRow.findAll({ where: { tutorialId: tutorial.id }, attributes: ['id', 'name'] }),
    Still.findAll({
      attributes: ['id', 'atMs', 'caption'],
      include: [{ model: Recording, as: 'recording', attributes: [], where: { tutorialId: tutorial.id }, required: true }],
    }),
  ]);
  const steps = new Map<string, { number: number; title: string; text: string }>();
  for (const s of article ? stepsOf(article.doc as JSONContent) : []) if (s.id) steps.set(s.id, s);
  return {
    steps,
    pieces: new Map(pieces.map((p) => [p.id, p.name])),
    stills: new Map(stills.map((s) => [s.id, { atMs: s.atMs, caption: s.caption }])),
  };
}

/** Spaces and line breaks count as one space, case aside: a selection reads the same as the text it came from. */
const squash = (s: string) => s.replace(/\s+/g, ' ').trim().toLowerCase();

const clock = (ms: number) => {
  const s = Math.floor(ms / 1000);
  const h = Math.floor(s / 3600);
  const mm = String(Math.floor((s % 3600) / 60));
  const ss = String(s % 60).padStart(2, '0');
  return h ? `${h}:${mm.padStart(2, '0')}:${ss}` : `${mm}:${ss}`;
};

const stepLabel = (s: { number: number; title: string }) => `Step ${s.number}${s.title ? `: ${s.title}` : ''}`;
const shortQuote = (q: string) => (q.length > 60 ? `${q.slice(0, 57)}…` : q);

/** How an anchor reads now and whether its target is still there; null for the whole tutorial. */
export function describeAnchor(anchor: CommentAnchor | null, savedLabel: string | null, t: AnchorTargets): CommentAnchorDto | null {
  if (!anchor) return null;
  const gone = (kind: CommentAnchorDto['kind'], fallback: string) => ({ kind, label: savedLabel ?? fallback, status: 'missing' as const });
  if ('pieceId' in anchor) {
    const name = t.pieces.get(anchor.pieceId);
    return name === undefined
      ? { ...gone('piece', 'A piece'), pieceId: anchor.pieceId }
      : { kind: 'piece', pieceId: anchor.pieceId, label: `Piece: ${name}`, status: 'present' };
  }
  if ('stillId' in anchor) {
    const still = t.stills.get(anchor.stillId);
    if (!still) return { ...gone('still', 'A still'), stillId: anchor.stillId };
    return { kind: 'still', stillId: anchor.stillId, label: `Still at ${clock(still.atMs)}${still.caption ? `: ${still.caption}` : ''}`, status: 'present' };
  }
  const step = t.steps.get(anchor.stepId);
  if ('quote' in anchor) {
    if (!step) return { ...gone('passage', 'A passage'), stepId: anchor.stepId, quote: anchor.quote };
    const status = squash(step.text).includes(squash(anchor.quote)) ? 'present' : 'changed';
    return { kind: 'passage', stepId: anchor.stepId, quote: anchor.quote, label: `${stepLabel(step)}, “${shortQuote(anchor.quote)}”`, status };
  }
  if (!step) return { ...gone('step', 'A step'), stepId: anchor.stepId };
  return { kind: 'step', stepId: anchor.stepId, label: stepLabel(step), status: 'present' };
}

/** Checks a new anchor against what is there now: a bad one is refused with the reason, nothing saved. */
function checkAnchor(anchor: CommentAnchor, t: AnchorTargets): void {
  if ('pieceId' in anchor) {
    if (!t.pieces.has(anchor.pieceId)) throw fieldError('anchor.pieceId', 'That piece is not in this tutorial’s cut list');
    return;
  }
  if ('stillId' in anchor) {
    if (!t.stills.has(anchor.stillId)) throw fieldError('anchor.stillId', 'That still is not in this tutorial’s footage');
    return;
  }
  const step = t.steps.get(anchor.stepId);
  if (!step) throw fieldError('anchor.stepId', 'That step is not in the saved write-up (save it first, or pick another step)');
  if ('quote' in anchor && !squash(step.text).includes(squash(anchor.quote))) {
    throw fieldError('anchor.quote', `Those words are not in step ${step.number}: select a passage within one step`);
  }
}

/** A studio member who may be mentioned: one who reads the tutorial's comments (students do not). */
export async function mentionable(studioId: string): Promise<User[]> {
  const rows = await Membership.findAll({
    where: { studioId, role: { [Op.in]: ['owner', 'coordinator', 'maker'] } },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
  });
  return rows.map((m) => m.user!).sort((a, b) => a.name.localeCompare(b.name));
}

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * The people a comment mentions: those picked with "@" (ids; anyone else is refused) and those
 * whose name is typed after an "@", longest names first so "@Ann Lee" is not "@Ann".
 */
export async function resolveMentions(studioId: string, body: string, ids: string[] = []): Promise<User[]> {
  const members = await mentionable(studioId);
  const byId = new Map(members.map((u) => [u.id, u]));
  const out = new Map<string, User>();
  for (const id of ids) {
    const u = byId.get(id);
    if (!u) throw fieldError('mentions', 'Only members of this studio who can read its comments can be mentioned');
    out.set(u.id, u);
  }
  let rest = body;
  for (const u of [...members].sort((a, b) => b.name.length - a.name.length)) {
    const re = new RegExp(`@${escapeRe(u.name)}(?![\\p{L}\\p{N}])`, 'iu');
    if (re.test(rest)) {
      out.set(u.id, u);
      rest = rest.replace(new RegExp(re.source, 'giu'), ' ');
    }
  }
  return [...out.values()];
}

/** A comment or reply by id, or 404. */
export async function findComment(id: string): Promise<Comment> {
  const c = await Comment.findByPk(id);
  if (!c) throw new NotFoundError('Comment');
  return c;
}

const PEOPLE = [
  { model: User, as: 'author', attributes: ['id', 'name'] },
  { model: User, as: 'resolvedBy', attributes: ['id', 'name'] },
];

/** The tutorial's threads, oldest first, each with its replies oldest first. */
export async function listThreads(tutorial: Tutorial): Promise<{ threads: Comment[]; replies: Map<string, Comment[]> }> {
  const all = await Comment.findAll({ where: { tutorialId: tutorial.id }, include: PEOPLE, order: [['createdAt', 'ASC']] });
  const replies = new Map<string, Comment[]>();
  const threads: Comment[] = [];
  for (const c of all) {
    if (c.parentId) replies.set(c.parentId, [...(replies.get(c.parentId) ?? []), c]);
    else threads.push(c);
  }
  return { threads, replies };
}

/** One thread (its first comment with people loaded, and its replies). */
export async function loadThread(rootId: string): Promise<{ root: Comment; replies: Comment[] }> {
  const root = await Comment.findByPk(rootId, { include: PEOPLE });
  if (!root) throw new NotFoundError('Comment');
  const replies = await Comment.findAll({ where: { parentId: rootId }, include: PEOPLE, order: [['createdAt', 'ASC']] });
  return { root, replies };
}

/** Names of everyone mentioned in these comments, by id. */
export async function peopleById(comments: Comment[]): Promise<Map<string, User>> {
  const ids = [...new Set(comments.flatMap((c) => c.mentionedIds ?? []))];
  if (!ids.length) return new Map();
  const users = await User.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u]));
}

/** Where the app shows a comment: the write-up, opened at the comment. */
export const commentPath = (tutorialId: string, commentId: string) => `/tutorials/${tutorialId}/write-up?comment=${commentId}`;

const quoteBody = (body: string) => (body.length > 600 ? `${body.slice(0, 597)}…` : body);

/** Mails each newly mentioned person; returns who got it, so they are not told twice. */
async function mailMentions(o: { tutorial: Tutorial; by: User; comment: Comment; people: User[]; where: string | null }): Promise<Set<string>> {
  const sent = await notify({
    studioId: o.tutorial.studioId,
    kind: 'mentions',
    to: o.people,
    except: [o.by.id],
    subject: `${o.by.name} mentioned you on “${o.tutorial.title}”`,
    lines: () => [`${o.by.name} mentioned you in a comment on “${o.tutorial.title}”${o.where ? ` (${o.where})` : ''}:`, quoteBody(o.comment.body)],
    link: commentPath(o.tutorial.id, o.comment.parentId ?? o.comment.id),
    linkLabel: 'Open the comment',
  });
  return new Set(o.people.filter((p) => sent.includes(p.email)).map((p) => p.id));
}

/** The maker and the studio's coordinators, and whoever commented on the tutorial before. */
async function commentAudience(tutorial: Tutorial): Promise<User[]> {
  const [staff, commenters, maker] = await Promise.all([
    Membership.findAll({ where: { studioId: tutorial.studioId, role: 'coordinator' }, include: [{ model: User, as: 'user' }] }),
    Comment.findAll({ where: { tutorialId: tutorial.id }, attributes: ['authorId'], include: [{ model: User, as: 'author' }] }),
    tutorial.authorId ? User.findByPk(tutorial.authorId) : null,
  ]);
  return [...staff.map((m) => m.user!), ...commenters.map((c) => c.author).filter((u): u is User => !!u), ...(maker ? [maker] : [])];
}

/** Starts a thread on the tutorial (or on a step, passage, piece or still of it) and tells the people it concerns. */
export async function addComment(o: { tutorial: Tutorial; by: User; body: string; anchor?: CommentAnchor | null; mentions?: string[] }): Promise<Comment> {
  const targets = await anchorTargets(o.tutorial);
  const anchor = o.anchor ?? null;
  if (anchor) checkAnchor(anchor, targets);
  const people = await resolveMentions(o.tutorial.studioId, o.body, o.mentions);
  const audience = await commentAudience(o.tutorial);
  const where = describeAnchor(anchor, null, targets)?.label ?? null;
  const comment = await Comment.create({
    tutorialId: o.tutorial.id,
    authorId: o.by.id,
    parentId: null,
    body: o.body,
    anchor,
    anchorLabel: where,
    mentionedIds: people.map((p) => p.id),
  });
  const told = await mailMentions({ tutorial: o.tutorial, by: o.by, comment, people, where });
  await notify({
    studioId: o.tutorial.studioId,
    kind: 'comments',
    to: audience,
    except: [o.by.id, ...told],
    subject: `New comment on “${o.tutorial.title}”`,
    lines: () => [`${o.by.name} commented on “${o.tutorial.title}”${where ? ` (${where})` : ''}:`, quoteBody(o.body)],
    link: commentPath(o.tutorial.id, comment.id),
    linkLabel: 'Open the comment',
  });
  return comment;
}

/** Adds a reply to a comment's thread (a reply to a reply joins the same thread) and tells the thread. */
export async function addReply(o: { tutorial: Tutorial; parent: Comment; by: User; body: string; mentions?: string[] }): Promise<Comment> {
  const rootId = o.parent.parentId ?? o.parent.id;
  const { root, replies } = await loadThread(rootId);
  const people = await resolveMentions(o.tutorial.studioId, o.body, o.mentions);
  const reply = await Comment.create({
    tutorialId: o.tutorial.id,
    authorId: o.by.id,
    parentId: rootId,
    body: o.body,
    anchor: null,
    mentionedIds: people.map((p) => p.id),
  });
  // A reply reopens nothing by itself: a resolved thread stays resolved until someone reopens it.
  const where = root.anchorLabel;
  const told = await mailMentions({ tutorial: o.tutorial, by: o.by, comment: reply, people, where });
  // Everyone in the thread and the tutorial's maker (with their addresses: the thread loads names only).
  const ids = [...new Set([...[root, ...replies].map((c) => c.authorId), o.tutorial.authorId].filter((id): id is string => !!id))];
  const audience = await User.findAll({ where: { id: { [Op.in]: ids } } });
  await notify({
    studioId: o.tutorial.studioId,
    kind: 'replies',
    to: audience,
    except: [o.by.id, ...told],
    subject: `${o.by.name} replied on “${o.tutorial.title}”`,
    lines: () => [`${o.by.name} replied to “${quoteBody(root.body).slice(0, 120)}”${where ? ` (${where})` : ''}:`, quoteBody(o.body)],
    link: commentPath(o.tutorial.id, rootId),
    linkLabel: 'Open the thread',
  });
  return reply;
}

/** Resolves or reopens a thread; who and when are kept. */
export async function setResolved(comment: Comment, by: User, resolved: boolean): Promise<Comment> {
  if (comment.parentId) throw new BadRequestError('Replies are resolved with their thread: resolve the thread’s first comment');
  if (resolved && !comment.resolvedAt) await comment.update({ resolvedAt: new Date(), resolvedById: by.id });
  if (!resolved && comment.resolvedAt) await comment.update({ resolvedAt: null, resolvedById: null });
  return comment;
}

/** Changes a comment's words (its author only: the policy checks); newly mentioned people are told. */
export async function editComment(o: { tutorial: Tutorial; comment: Comment; by: User; body: string; mentions?: string[] }): Promise<Comment> {
  const people = await resolveMentions(o.tutorial.studioId, o.body, o.mentions);
  const before = new Set(o.comment.mentionedIds ?? []);
  await o.comment.update({ body: o.body, mentionedIds: people.map((p) => p.id), editedAt: new Date() });
  const fresh = people.filter((p) => !before.has(p.id));
  if (fresh.length) await mailMentions({ tutorial: o.tutorial, by: o.by, comment: o.comment, people: fresh, where: o.comment.anchorLabel });
  return o.comment;
}

/** The open threads as they read now, for a send-back note and the checklist. */
export async function openThreads(tutorial: Tutorial): Promise<OpenCommentDto[]> {
  const [rows, targets] = await Promise.all([
    Comment.findAll({
      where: { tutorialId: tutorial.id, parentId: null, resolvedAt: null },
      include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
      order: [['createdAt', 'ASC']],
    }),
    anchorTargets(tutorial),
  ]);
  return rows.map((c) => {
    const a = describeAnchor(c.anchor, c.anchorLabel, targets);
    return {
      id: c.id,
      body: c.body,
      where: a ? (a.status === 'missing' ? `${a.label} (deleted)` : a.label) : 'The whole tutorial',
      author: c.author?.name ?? 'A former member',
    };
  });
}

/** How many threads are open, per tutorial (the board's cards show it). */
export async function openCommentCounts(tutorialIds: string[]): Promise<Map<string, number>> {
  if (!tutorialIds.length) return new Map();
  const rows = (await Comment.count({
    where: { tutorialId: { [Op.in]: tutorialIds }, parentId: null, resolvedAt: null },
    group: ['tutorialId'],
  })) as unknown as { tutorialId: string; count: number }[];
  return new Map(rows.map((r) => [r.tutorialId, Number(r.count)]));
}
