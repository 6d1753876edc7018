import { Op, type Transaction } from 'sequelize';
import { reviewState, stateLabel, TRANSITIONS, type Transition, type TutorialState } from '@shared/schemas/tutorial';
import type { OpenCommentDto } from '@shared/schemas/review';
import { Membership, StateChange, Studio, User, type Tutorial } from '../models';
import { ConflictError } from '../lib/errors';
import { authorize, type TutorialAbilities } from '../policies';
import { openThreads } from './comments';
import { notify } from './notify';
import { publishWarnings } from './supply-checks';
import { applyMove, refusedMove } from './versions/versions';
import { endSentence } from '@shared/sentence';

/**
 * Moves a tutorial between review states (DESIGN.md T2): 409 when its state does not allow the
 * move, 403 when the caller's role does not. The move is kept in the tutorial's history (who,
 * when, from, to, note; a send-back also keeps the comments still open), then the people it
 * concerns hear about it. Once it is published, the moves act on its update (DESIGN.md T4): the
 * changes made since go through review while readers keep the published version, and "Publish"
 * replaces that version.
 */
export async function moveTutorial(o: {
  tutorial: Tutorial;
  abilities: TutorialAbilities;
  action: Transition;
  by: User;
  note?: string;
  /** False when the caller sends its own e-mail about the move (a scheduled publish does). */
  notify?: boolean;
  /** Publish although cross-check warnings are open; without it such a publish is refused with 409 naming them. */
  confirmWarnings?: boolean;
}): Promise<Tutorial> {
  const { tutorial, action } = o;
  const step = TRANSITIONS[action];
  // Unpublishing acts on the tutorial itself, whatever its update is doing.
  const from = action === 'unpublish' ? tutorial.state : reviewState(tutorial);
  const update = tutorial.state === 'published' && action !== 'unpublish';
  if (!(step.from as readonly string[]).includes(from) || (action === 'submit' && from === 'published')) throw refusedMove(tutorial, action, step.label);
  authorize(
    o.abilities,
    action,
    action === 'submit' ? 'Only the maker or a coordinator can send it for review' : 'Only coordinators and owners review and publish',
  );
  if (action === 'publish' && !o.confirmWarnings) {
    const warnings = await publishWarnings(tutorial);
    if (warnings.length)
      throw new ConflictError(
        `${warnings.length === 1 ? 'A check warning is' : `${warnings.length} check warnings are`} still open: ${warnings.join('; ')}. Resolve ${warnings.length === 1 ? 'it' : 'them'} or confirm to publish anyway.`,
        { code: 'unconfirmed-warnings', warnings },
      );
  }
  const openComments = action === 'sendBack' ? await openThreads(tutorial) : [];
  await applyMove({ tutorial, action, to: step.to, by: o.by, note: o.note });
  // Leaving "approved" (published, or sent back) ends any scheduled publish; its queued job then finds nothing to do.
  if (!update && step.to !== 'approved' && tutorial.publishAt)
    await tutorial.update({ publishAt: null, publishTimeZone: null, publishScheduledById: null, publishJobId: null });
  await recordStateChange({ tutorialId: tutorial.id, byId: o.by.id, action, from, to: step.to, note: o.note, openComments, update });
  if (o.notify !== false) await notifyStateChange({ tutorial, from, to: step.to, by: o.by, note: o.note, openComments, update });
  return tutorial;
}

/**
 * Keeps one move in a tutorial's history. Other moves (a scheduled publish, an update's review)
 * call this too, with `byId` null when the app moved it itself.
 */
export async function recordStateChange(
  o: {
    tutorialId: string;
    byId: string | null;
    action: string;
    from: TutorialState;
    to: TutorialState;
    note?: string;
    openComments?: OpenCommentDto[];
    /** A move of a published tutorial's update (from and to are the update's states). */
    update?: boolean;
  },
  transaction?: Transaction,
): Promise<StateChange> {
  return StateChange.create(
    {
      tutorialId: o.tutorialId,
      byId: o.byId,
      action: o.action,
      fromState: o.from,
      toState: o.to,
      note: o.note?.trim() ?? '',
      openComments: o.openComments ?? [],
      ofUpdate: o.update ?? false,
    },
    { transaction },
  );
}

/** The tutorial's moves, newest first, with who made them. */
export function stateHistory(tutorialId: string): Promise<StateChange[]> {
  return StateChange.findAll({
    where: { tutorialId },
    include: [{ model: User, as: 'by', attributes: ['id', 'name'] }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: 500,
  });
}

/** The lines of a send-back that list the open comments, one a line with where each points. */
export function openCommentLines(open: OpenCommentDto[]): string[] {
  if (!open.length) return [];
  const list = open.map((c, i) => `${i + 1}. ${c.where}: ${c.body.length > 200 ? `${c.body.slice(0, 197)}…` : c.body} (${c.author})`);
  return [`Open comments (${open.length}):`, ...list];
}

/** The subject's words for a move: "was sent for review", "was sent back", ... */
export function movedWords(from: TutorialState, to: TutorialState): string {
  if (to === 'in_review') return 'was sent for review';
  if (to === 'needs_changes') return 'was sent back';
  if (to === 'approved') return from === 'published' ? 'was unpublished' : 'was approved';
  if (to === 'published') return 'was published';
  return `is ${stateLabel(to)}`;
}

/**
 * E-mails the people a change of review state concerns: the maker when a coordinator acts, the
 * studio's coordinators and owners when a maker sends for review. The person acting gets none,
 * nor anyone who turned review mail off for the studio.
 */
export async function notifyStateChange(o: {
  tutorial: Tutorial;
  from: TutorialState;
  /** Where it went (the update's state for an update's move); the tutorial's review state when left out. */
  to?: TutorialState;
  by: User | null;
  note?: string;
  openComments?: OpenCommentDto[];
  /** A move of a published tutorial's update: the mail says so. */
  update?: boolean;
}): Promise<void> {
  const t = o.tutorial;
  const now = o.to ?? reviewState(t);
  const studio = await Studio.findByPk(t.studioId, { attributes: ['name'] });
  const to: User[] = [];
  if (now === 'in_review') {
    const staff = await Membership.findAll({
      where: { studioId: t.studioId, role: { [Op.in]: ['owner', 'coordinator'] } },
      include: [{ model: User, as: 'user' }],
    });
    to.push(...staff.map((m) => m.user!));
  } else if (t.authorId) {
    const author = await User.findByPk(t.authorId);
    if (author) to.push(author);
  }
  const who = o.by?.name ?? 'Cardwright';
  await notify({
    studioId: t.studioId,
    kind: 'stateMoves',
    to,
    except: o.by ? [o.by.id] : [],
    subject: o.update ? `The update to “${t.title}” ${movedWords(o.from, now)}` : `“${t.title}” ${movedWords(o.from, now)}`,
    lines: () => [
      o.update && now === 'published'
        ? `${who} published the update to “${t.title}” in ${studio?.name ?? 'your studio'}: readers now see it.`
        : endSentence(
            `${who} moved ${o.update ? 'the update to ' : ''}“${t.title}” from ${stateLabel(o.from)} to ${stateLabel(now)} in ${studio?.name ?? 'your studio'}`,
          ),
      ...(o.note ? [`Their note: ${o.note}`] : []),
      ...openCommentLines(o.openComments ?? []),
    ],
    link: `/tutorials/${t.id}/publish`,
    linkLabel: 'Open the tutorial',
  });
}
