import { Op, UniqueConstraintError, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { createBriefSchema, listBriefsQuery, updateBriefSchema } from '@shared/schemas/brief';
import { daysOfMonth } from '@shared/board/dates';
import { Brief, Membership, MonthlyTarget, Studio, Tutorial, User } from '../models';
import { ConflictError, fieldError, NotFoundError } from '../lib/errors';
import { notify } from './notify';
import { uniqueTutorialSlug } from './studios';
import { endSentence } from '@shared/sentence';

/** Roles that make tutorials, so a brief can go to them (students cannot). */
const MAKING_ROLES = ['maker', 'coordinator', 'owner'] as const;

const withPeople = [
  { model: User, as: 'maker', attributes: ['id', 'name', 'email'] },
  { model: User, as: 'createdBy', attributes: ['id', 'name'] },
  { model: Tutorial, as: 'tutorial', attributes: ['id', 'title', 'state'] },
];

/** A brief with its maker, author and tutorial; 404 when there is none. */
export async function findBrief(id: string): Promise<Brief> {
  const brief = await Brief.findByPk(id, { include: withPeople });
  if (!brief) throw new NotFoundError('Brief');
  return brief;
}

/** Members a brief can go to (those who make tutorials), makers first, then by name. */
export async function assignableMakers(studio: Studio): Promise<User[]> {
  const rows = await Membership.findAll({
    where: { studioId: studio.id, role: { [Op.in]: [...MAKING_ROLES] } },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
  });
  const rank = (r: string) => (r === 'maker' ? 0 : 1);
  return rows.sort((a, b) => rank(a.role) - rank(b.role) || a.user!.name.localeCompare(b.user!.name)).map((m) => m.user!);
}

/** The maker, if they are a member of the studio who makes tutorials; a 400 on `makerId` otherwise. */
async function makerIn(studioId: string, makerId: string): Promise<User> {
  const m = await Membership.findOne({ where: { studioId, userId: makerId }, include: [{ model: User, as: 'user' }] });
  if (!m?.user || !(MAKING_ROLES as readonly string[]).includes(m.role)) {
    throw fieldError('makerId', 'Pick a member of this studio who makes tutorials', 'Pick a maker of this studio');
  }
  return m.user;
}

/**
 * The studio's briefs, soonest due first. Coordinators and owners see all of them; anyone else
 * only the briefs given to them.
 */
export async function listBriefs(studio: Studio, o: { seeAll: boolean; userId: string } & z.output<typeof listBriefsQuery>): Promise<Brief[]> {
  const where: WhereOptions<Brief> = { studioId: studio.id };
  if (!o.seeAll) Object.assign(where, { makerId: o.userId });
  else if (o.makerId) Object.assign(where, { makerId: o.makerId });
  if (o.month) {
    const days = daysOfMonth(o.month);
    Object.assign(where, { dueDate: { [Op.between]: [days[0], days.at(-1)] } });
  }
  const rows = await Brief.findAll({
    where,
    include: withPeople,
    order: [
      ['dueDate', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  if (o.status === 'open') return rows.filter((b) => !b.tutorial);
  if (o.status === 'started') return rows.filter((b) => b.tutorial);
  return rows;
}

/** Hands a brief to a maker; they get an e-mail (unless they wrote it themselves). */
export async function createBrief(studio: Studio, by: User, input: z.output<typeof createBriefSchema>): Promise<Brief> {
  const maker = await makerIn(studio.id, input.makerId);
  const brief = await Brief.create({
    studioId: studio.id,
    makerId: maker.id,
    createdById: by.id,
    title: input.title,
    dueDate: input.dueDate,
    features: input.features,
    notes: input.notes,
  });
  await mailAssignment({ brief, studio, maker, by });
  return findBrief(brief.id);
}

/**
 * Changes a brief. A new maker hears about it; once the tutorial is started the brief stays with
 * its maker (409), and a new due date moves the tutorial's along if it still had the brief's.
 */
export async function updateBrief(brief: Brief, by: User, input: z.output<typeof updateBriefSchema>): Promise<Brief> {
  const tutorial = brief.tutorial ? await Tutorial.findByPk(brief.tutorial.id) : null;
  let newMaker: User | null = null;
  if (input.makerId && input.makerId !== brief.makerId) {
    if (tutorial) throw new ConflictError('The maker has started the tutorial for this brief; it stays with them');
    newMaker = await makerIn(brief.studioId, input.makerId);
  }
  const oldDue = brief.dueDate;
  await brief.update(input);
  if (tutorial && input.dueDate && tutorial.dueDate === oldDue && input.dueDate !== oldDue) await tutorial.update({ dueDate: input.dueDate });
  if (newMaker) {
    const studio = await Studio.findByPk(brief.studioId);
    await mailAssignment({ brief, studio: studio!, maker: newMaker, by });
  }
  return findBrief(brief.id);
}

/**
 * Starts the tutorial for a brief: a draft by the brief's maker with its title and due date,
 * linked to it. One tutorial per brief (409 for a second).
 */
export async function startTutorialFromBrief(brief: Brief): Promise<Tutorial> {
  if (brief.tutorial) throw new ConflictError('The tutorial for this brief is started already', { tutorialId: brief.tutorial.id });
  try {
    return await Tutorial.create({
      studioId: brief.studioId,
      authorId: brief.makerId,
      briefId: brief.id,
      title: brief.title,
      slug: await uniqueTutorialSlug(brief.studioId, brief.title),
      dueDate: brief.dueDate,
    });
  } catch (e) {
    // Two clicks at once: the unique index on tutorials.brief_id lets one through.
    if (e instanceof UniqueConstraintError) throw new ConflictError('The tutorial for this brief is started already');
    throw e;
  }
}

/** The brief a tutorial was started from, if any. */
export async function briefOfTutorial(tutorial: Tutorial): Promise<Brief | null> {
  return tutorial.briefId ? Brief.findByPk(tutorial.briefId, { include: withPeople }) : null;
}

const longDate = (day: string) =>
  new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${day}T00:00:00Z`));

/** The maker's e-mail about a new brief, with a link to it (kind "assignments": they can turn it off). */
async function mailAssignment(o: { brief: Brief; studio: Studio; maker: User; by: User }): Promise<void> {
  const { brief, studio, maker, by } = o;
  await notify({
    studioId: studio.id,
    kind: 'assignments',
    to: [maker],
    except: [by.id],
    subject: `New brief: “${brief.title}”, due ${brief.dueDate}`,
    lines: () => [
      `${by.name} has a brief for you in ${studio.name}: “${brief.title}”, due ${longDate(brief.dueDate)}.`,
      ...(brief.features.length ? [endSentence(`Products or papers to feature: ${brief.features.join('; ')}`)] : []),
      ...(brief.notes ? [`Notes: ${brief.notes}`] : []),
      'Start the tutorial from the brief when you are ready: it takes the brief’s title and due date.',
    ],
    link: `/studios/${studio.id}/briefs#brief-${brief.id}`,
    linkLabel: 'Open the brief',
  });
}

/** Each member who makes tutorials, with their monthly target (null when none is set). */
export async function listTargets(studio: Studio): Promise<{ user: User; perMonth: number | null }[]> {
  const [makers, targets] = await Promise.all([assignableMakers(studio), MonthlyTarget.findAll({ where: { studioId: studio.id } })]);
  const by = new Map(targets.map((t) => [t.userId, t.perMonth]));
  return makers.map((user) => ({ user, perMonth: by.get(user.id) ?? null }));
}

/** Sets (or with null, clears) a maker's monthly target; 404 for someone who makes nothing here. */
export async function setTarget(studio: Studio, userId: string, perMonth: number | null): Promise<{ user: User; perMonth: number | null }> {
  const m = await Membership.findOne({ where: { studioId: studio.id, userId }, include: [{ model: User, as: 'user' }] });
  if (!m?.user || !(MAKING_ROLES as readonly string[]).includes(m.role)) throw NotFoundError.saying('That person does not make tutorials in this studio');
  if (perMonth === null) await MonthlyTarget.destroy({ where: { studioId: studio.id, userId } });
  else {
    const [row, created] = await MonthlyTarget.findOrCreate({ where: { studioId: studio.id, userId }, defaults: { studioId: studio.id, userId, perMonth } });
    if (!created) await row.update({ perMonth });
  }
  return { user: m.user, perMonth };
}
