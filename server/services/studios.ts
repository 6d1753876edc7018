import { Op, type Transaction } from 'sequelize';
import { slugify } from '@shared/slug';
import type { Role } from '@shared/schemas/roles';
import { Invitation, Membership, Studio, Tutorial, User, sequelize } from '../models';
import { ConflictError, NotFoundError } from '../lib/errors';

/** Gives a studio a new name (its slug, in addresses people have shared, stays). */
export function renameStudio(studio: Studio, name: string): Promise<Studio> {
  return studio.update({ name });
}

/** A slug no other studio uses: "paper-lantern", then "paper-lantern-2" ... */
export async function uniqueStudioSlug(name: string, transaction?: Transaction): Promise<string> {
  const base = slugify(name);
  for (let n = 1; ; n++) {
    const slug = n === 1 ? base : `${base}-${n}`;
    if (!(await Studio.findOne({ where: { slug }, transaction, attributes: ['id'] }))) return slug;
  }
}

/** A tutorial slug unique within its studio, for the stable public address /t/:studio/:tutorial. */
export async function uniqueTutorialSlug(studioId: string, title: string, exceptId?: string): Promise<string> {
  const base = slugify(title);
  for (let n = 1; ; n++) {
    const slug = n === 1 ? base : `${base}-${n}`;
    const other = await Tutorial.findOne({ where: { studioId, slug }, attributes: ['id'] });
    if (!other || other.id === exceptId) return slug;
  }
}

/** The studio's members, longest-standing first, with their accounts. */
export function listMembers(studio: Studio): Promise<Membership[]> {
  return Membership.findAll({ where: { studioId: studio.id }, include: [{ model: User, as: 'user' }], order: [['createdAt', 'ASC']] });
}

/** Invitations not yet accepted and not expired, newest first. */
export function pendingInvitations(studio: Studio): Promise<Invitation[]> {
  return Invitation.findAll({
    where: { studioId: studio.id, acceptedAt: { [Op.is]: null }, expiresAt: { [Op.gt]: new Date() } },
    order: [['createdAt', 'DESC']],
  });
}

/** Withdraws an invitation of this studio; 404 for any other. */
export async function withdrawInvitation(studio: Studio, invitationId: string): Promise<void> {
  const n = await Invitation.destroy({ where: { id: invitationId, studioId: studio.id } });
  if (!n) throw new NotFoundError('Invitation');
}

/**
 * Runs a change to an owner's membership with the studio row locked, after checking another owner
 * stays: two owners demoting each other at the same moment queue on the lock, and the second sees
 * the first's change, so a studio always keeps at least one owner.
 */
async function withOwnerGuard(studio: Studio, userId: string, stepsDown: boolean, change: (m: Membership, t: Transaction) => Promise<unknown>) {
  return sequelize.transaction(async (transaction) => {
    await Studio.findByPk(studio.id, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    const m = await Membership.findOne({ where: { studioId: studio.id, userId }, transaction });
    if (!m) throw new NotFoundError('Member');
    if (stepsDown && m.role === 'owner') {
      const owners = await Membership.count({ where: { studioId: studio.id, role: 'owner' }, transaction });
      if (owners <= 1) throw new ConflictError('A studio needs at least one owner; make someone else owner first');
    }
    await change(m, transaction);
    return m;
  });
}

/** Gives a member another role; the last owner cannot step down. */
export async function changeRole(studio: Studio, userId: string, role: Role): Promise<Membership> {
  return withOwnerGuard(studio, userId, role !== 'owner', (m, transaction) => m.update({ role }, { transaction }));
}

/** Removes a member; the last owner cannot be removed. */
export async function removeMember(studio: Studio, userId: string): Promise<void> {
  await withOwnerGuard(studio, userId, true, (m, transaction) => m.destroy({ transaction }));
}
