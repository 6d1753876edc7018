import { Op, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { classWhen } from '@shared/classes/when';
import { formatMoney } from '@shared/money';
import type { createClassSchema, updateClassSchema } from '@shared/schemas/class';
import { CraftClass, Registration, Studio, Tutorial, sequelize, type User } from '../models';
import { ConflictError, NotFoundError } from '../lib/errors';
import { config } from '../config';
import { cautionLines, defaultClassCautions } from './class-cautions';
import { detectHazards } from './publish/safety';
import { loadSupplies } from './supplies';
import { getArticle } from './write-up';
import { loadCutList } from './cut-list';
import { publicPath as tutorialPublicPath } from './publish/bundle';
import { tutorialAbilities, ANONYMOUS } from '../policies';

/** Statuses that hold a seat or a place in the queue. */
export const LIVE_STATUSES = ['awaiting_payment', 'confirmed', 'waitlisted'] as const;

/** The public page of a class: /c/<studio>/<class>. */
export const classPublicPath = (studioSlug: string, classId: string) => `/c/${studioSlug}/${classId}`;

/** The attendee's own page, with the token that stands in for an account. */
export const registrationPath = (studioSlug: string, classId: string, registrationId: string, token: string) =>
  `${classPublicPath(studioSlug, classId)}/r/${registrationId}?token=${encodeURIComponent(token)}`;

/** The class's title, or the tutorial's when it has none. */
export const classTitle = (k: CraftClass, t: Tutorial) => k.title || t.title;

/** When and how long, in words, in the class's time zone. */
export const whenText = (k: CraftClass) => classWhen(k.startsAt, k.durationMinutes, k.timeZone);

export const feeText = (k: Pick<CraftClass, 'kitFeeCents' | 'currency'>) => (k.kitFeeCents === 0 ? 'Free' : formatMoney(k.kitFeeCents, k.currency));

/** Why a class takes no registrations now, or null when it does. */
export function closedReason(k: CraftClass, at = new Date()): string | null {
  if (k.status === 'cancelled') return 'This class was cancelled, so it takes no registrations.';
  if (k.startsAt.getTime() <= at.getTime()) return 'This class has already started or taken place, so it takes no registrations.';
  return null;
}

/** Seats held or paid, and people waiting, counted inside the caller's transaction when given. */
export async function seatCounts(classId: string, transaction?: Transaction) {
  const rows = (await Registration.findAll({
    where: { classId, status: { [Op.in]: [...LIVE_STATUSES] } },
    attributes: ['status', [sequelize.fn('count', sequelize.col('id')), 'n']],
    group: ['status'],
    raw: true,
    transaction,
  })) as unknown as { status: string; n: string }[];
  const n = (s: string) => Number(rows.find((r) => r.status === s)?.n ?? 0);
  return { taken: n('awaiting_payment') + n('confirmed'), confirmed: n('confirmed'), waiting: n('waitlisted') };
}

/** The default cautions for a class of this tutorial: blades always; heat and adhesives when its supplies, words or cut list name them. */
export async function tutorialCautions(tutorial: Tutorial): Promise<string[]> {
  const [sup, article, cut] = await Promise.all([loadSupplies(tutorial), getArticle(tutorial), loadCutList(tutorial)]);
  const supplies = sup.rows.map((s) => s.get({ plain: true }));
  const notes = cut.pieces.map((p) => ({
    category: 'other',
    name: p.name,
    note: p.notes ?? '',
    quantity: '',
    url: null,
    sponsored: false,
    discountCode: null,
  }));
  return defaultClassCautions(detectHazards({ supplies: [...supplies, ...notes], doc: article.doc }));
}

/** The cautions a class shows: the teacher's wording, or the default for its tutorial. */
export async function classCautions(k: CraftClass, tutorial: Tutorial): Promise<{ lines: string[]; custom: boolean; defaults: string[] }> {
  const defaults = await tutorialCautions(tutorial);
  const custom = k.cautions !== null && cautionLines(k.cautions).length > 0;
  return { lines: custom ? cautionLines(k.cautions!) : defaults, custom, defaults };
}

/** The address of the tutorial's public page, when it is published. */
export function tutorialPublicUrl(t: Tutorial, studio: Studio): string | null {
  return tutorialAbilities(ANONYMOUS, t).readPublicPage ? `${config.publicUrl}${tutorialPublicPath(studio.slug, t.slug)}` : null;
}

type CreateInput = z.output<typeof createClassSchema>;

/** Schedules a class from a tutorial; the reminder job is queued by the caller (server/jobs). */
export async function createClass(tutorial: Tutorial, by: User, input: CreateInput): Promise<CraftClass> {
  const startsAt = new Date(input.startsAt);
  if (startsAt.getTime() <= Date.now())
    throw new ConflictError('The class would start in the past; pick a later date and time', { issues: [{ path: 'startsAt', message: 'In the past' }] });
  return CraftClass.create({
    studioId: tutorial.studioId,
    tutorialId: tutorial.id,
    createdById: by.id,
    title: input.title ?? tutorial.title,
    startsAt,
    timeZone: input.timeZone,
    durationMinutes: input.durationMinutes,
    place: input.place,
    seats: input.seats,
    spares: input.spares,
    kitFeeCents: input.kitFeeCents,
    currency: input.currency,
    whatToBring: input.whatToBring,
    cancellationDeadline: input.cancellationDeadline ? new Date(input.cancellationDeadline) : null,
    cautions: input.cautions ?? null,
    paper: input.paper,
  });
}

type UpdateInput = z.output<typeof updateClassSchema>;

/**
 * Changes a class. Seats cannot go below those taken; a fee or currency change applies to new
 * registrations only (people who paid keep what they paid).
 */
export function updateClass(classId: string, input: UpdateInput): Promise<{ klass: CraftClass; startsAtChanged: boolean }> {
  return sequelize.transaction(async (transaction) => {
    const k = await CraftClass.findByPk(classId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!k) throw new NotFoundError('Class');
    return { klass: k, ...(await applyClassChanges(k, input, transaction)) };
  });
}

/** The changes themselves, inside the class's lock (seats are counted against live registrations). */
async function applyClassChanges(k: CraftClass, input: UpdateInput, transaction: Transaction): Promise<{ startsAtChanged: boolean }> {
  if (k.status === 'cancelled') throw new ConflictError('This class was cancelled; schedule a new one instead');
  const { taken } = await seatCounts(k.id, transaction);
  if (input.seats !== undefined && input.seats < taken)
    throw new ConflictError(`${taken} seats are taken; cancel registrations before going below ${taken} seats`, {
      issues: [{ path: 'seats', message: `At least ${taken}` }],
    });
  const startsAt = input.startsAt ? new Date(input.startsAt) : k.startsAt;
  const deadline =
    input.cancellationDeadline !== undefined ? (input.cancellationDeadline ? new Date(input.cancellationDeadline) : null) : k.cancellationDeadline;
  if (deadline && deadline.getTime() > startsAt.getTime())
    throw new ConflictError('The cancellation deadline must be before the class starts', {
      issues: [{ path: 'cancellationDeadline', message: 'After the start' }],
    });
  const startsAtChanged = startsAt.getTime() !== k.startsAt.getTime();
  await k.update(
    {
      ...input,
      startsAt,
      cancellationDeadline: deadline,
      ...(input.cautions !== undefined ? { cautions: input.cautions && input.cautions.trim() ? input.cautions : null } : {}),
    },
    { transaction },
  );
  return { startsAtChanged };
}

/** A class by id with its studio and tutorial, or 404 (for the public page and the attendee's link). */
export async function findClass(id: string): Promise<CraftClass & { studio: Studio; tutorial: Tutorial }> {
  const k = await CraftClass.findByPk(id, {
    include: [
      { model: Tutorial, as: 'tutorial' },
      { model: Studio, as: 'studio' },
    ],
  });
  if (!k?.studio || !k.tutorial) throw new NotFoundError('Class');
  return k as CraftClass & { studio: Studio; tutorial: Tutorial };
}

/** The studio's classes, soonest first; a maker who is not staff sees those of the tutorials they made. */
export async function listClasses(studioId: string, onlyAuthorId: string | null) {
  return CraftClass.findAll({
    where: { studioId },
    include: [{ model: Tutorial, as: 'tutorial', where: onlyAuthorId ? { authorId: onlyAuthorId } : undefined, required: true }],
    order: [['startsAt', 'ASC']],
  });
}
