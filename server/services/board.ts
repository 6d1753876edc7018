import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { boardQuery } from '@shared/schemas/board';
import { TRANSITIONS, type Transition, type TutorialState } from '@shared/schemas/tutorial';
import { dayIn, monthOf } from '@shared/board/dates';
import { Brief, Membership, MonthlyTarget, sequelize, Tutorial, User, type Studio } from '../models';
import type { Actor } from '../policies';
import { tutorialAbilities, type TutorialAbilities } from '../policies';
import { openCommentCounts } from './comments';

/** The review moves open to someone now: their abilities, and the state each move starts from. */
export function allowedMoves(abilities: TutorialAbilities, state: TutorialState): Transition[] {
  return (Object.keys(TRANSITIONS) as Transition[]).filter((a) => abilities[a] && (TRANSITIONS[a].from as readonly TutorialState[]).includes(state));
}

/**
 * When each tutorial last changed: its own record, its write-up, cut list or supplies, whichever
 * is latest (a maker at work touches those, not the tutorial row).
 */
async function lastChanges(ids: string[]): Promise<Map<string, Date>> {
  if (!ids.length) return new Map();
  const rows = await sequelize.query<{ id: string; at: Date }>(
    `SELECT id, max(at) AS at FROM (
       SELECT id, updated_at AS at FROM tutorials WHERE id IN (:ids)
       UNION ALL SELECT tutorial_id, updated_at FROM articles WHERE tutorial_id IN (:ids)
       UNION ALL SELECT tutorial_id, max(updated_at) FROM pieces WHERE tutorial_id IN (:ids) GROUP BY tutorial_id
       UNION ALL SELECT tutorial_id, max(updated_at) FROM supplies WHERE tutorial_id IN (:ids) GROUP BY tutorial_id
     ) t GROUP BY id`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.id, new Date(r.at)]));
}

export type LastMove = { at: Date; by: string | null; toState: TutorialState };

/** Each tutorial's latest review move (from its history) with who made it. */
async function lastMoves(ids: string[]): Promise<Map<string, LastMove>> {
  if (!ids.length) return new Map();
  const rows = await sequelize.query<{ tutorial_id: string; created_at: Date; to_state: TutorialState; name: string | null }>(
    `SELECT DISTINCT ON (s.tutorial_id) s.tutorial_id, s.created_at, s.to_state, u.name
       FROM state_changes s LEFT JOIN users u ON u.id = s.by_id
      WHERE s.tutorial_id IN (:ids)
      ORDER BY s.tutorial_id, s.created_at DESC`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.tutorial_id, { at: new Date(r.created_at), by: r.name, toState: r.to_state }]));
}

export type BoardInput = z.output<typeof boardQuery>;

export type Board = {
  month: string;
  today: string;
  timeZone: string;
  filtered: boolean;
  tutorials: { tutorial: Tutorial; abilities: TutorialAbilities; moves: Transition[]; lastChange: Date; lastMove: LastMove | null; openComments: number }[];
  briefs: Brief[];
  makers: { user: User; target: number | null }[];
};

/**
 * The studio's tutorials for the board, with what the caller may do with each, the open briefs,
 * and the makers to count against their targets. With a month, only tutorials due, published or
 * scheduled in it (in the viewer's time zone); with a maker, only theirs.
 */
export async function loadBoard(studio: Studio, actor: Actor, q: BoardInput): Promise<Board> {
  const tz = q.timeZone;
  const today = dayIn(new Date(), tz);
  const month = q.month ?? monthOf(today);
  const where: WhereOptions<Tutorial> = { studioId: studio.id };
  if (q.makerId) Object.assign(where, { authorId: q.makerId });
  let rows = await Tutorial.findAll({ where, include: [{ model: User, as: 'author', attributes: ['id', 'name'] }] });
  if (q.month) rows = rows.filter((t) => inMonth(t, month, tz));

  const ids = rows.map((t) => t.id);
  const [changes, moves, comments] = await Promise.all([lastChanges(ids), lastMoves(ids), openCommentCounts(ids)]);
  const tutorials = rows.map((t) => {
    const abilities = tutorialAbilities(actor, t);
    return {
      tutorial: t,
      abilities,
      moves: allowedMoves(abilities, t.state),
      lastChange: changes.get(t.id) ?? t.updatedAt,
      lastMove: moves.get(t.id) ?? null,
      openComments: comments.get(t.id) ?? 0,
    };
  });

  const briefWhere: WhereOptions<Brief> = { studioId: studio.id };
  if (q.makerId) Object.assign(briefWhere, { makerId: q.makerId });
  const briefs = (await Brief.findAll({ where: briefWhere, include: [{ model: Tutorial, as: 'tutorial', attributes: ['id'] }] })).filter((b) => !b.tutorial);

  return { month, today, timeZone: tz, filtered: Boolean(q.month || q.makerId), tutorials, briefs, makers: await boardMakers(studio, q.makerId) };
}

/** Due, published or scheduled to publish in the month (days in the viewer's zone). */
function inMonth(t: Tutorial, month: string, tz: string): boolean {
  if (t.dueDate && monthOf(t.dueDate) === month) return true;
  if (t.state === 'published' && t.publishedAt && monthOf(dayIn(t.publishedAt, tz)) === month) return true;
  return Boolean(t.state === 'approved' && t.publishAt && monthOf(dayIn(t.publishAt, tz)) === month);
}

/** The studio's makers (and anyone else with a target), by name; one when the board is filtered to them. */
async function boardMakers(studio: Studio, makerId?: string): Promise<{ user: User; target: number | null }[]> {
  const [members, targets] = await Promise.all([
    Membership.findAll({ where: { studioId: studio.id, role: { [Op.ne]: 'student' } }, include: [{ model: User, as: 'user', attributes: ['id', 'name'] }] }),
    MonthlyTarget.findAll({ where: { studioId: studio.id } }),
  ]);
  const target = new Map(targets.map((t) => [t.userId, t.perMonth]));
  return members
    .filter((m) => (makerId ? m.userId === makerId : m.role === 'maker' || target.has(m.userId)))
    .map((m) => ({ user: m.user!, target: target.get(m.userId) ?? null }))
    .sort((a, b) => a.user.name.localeCompare(b.user.name));
}
