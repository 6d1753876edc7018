import { Op } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import type { SignUpInput } from '@shared/schemas/auth';
import { Invitation, Membership, PasswordReset, Studio, User, sequelize } from '../models';
import { HttpError } from '../lib/http-error';
import { config } from '../config';
import { hashPassword } from './passwords';
import { hashToken, newToken } from './tokens';
import { linkMail, sendMail } from './mail';
import { uniqueStudioSlug } from './studios';

const RESET_TTL_MS = 60 * 60_000;
const INVITE_TTL_MS = 14 * 24 * 60 * 60_000;

/** The studios a person belongs to, with their role in each. */
export async function studiosOf(userId: string) {
  const ms = await Membership.findAll({ where: { userId }, include: [{ model: Studio, as: 'studio' }], order: [['createdAt', 'ASC']] });
  return ms.map((m) => ({ id: m.studio!.id, name: m.studio!.name, slug: m.studio!.slug, role: m.role }));
}

/** Finds an invitation by its link token that can still be used. */
export async function usableInvitation(token: string) {
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) }, include: [{ model: Studio, as: 'studio' }] });
  if (!inv) throw new HttpError(404, 'This invitation link is not valid');
  if (inv.acceptedAt) throw new HttpError(410, 'This invitation has already been used');
  if (inv.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'This invitation has expired; ask for a new one');
  return inv;
}

/**
 * Creates an account. Without an invitation the person gets a studio of their own as owner;
 * with one, they join the inviting studio with the offered role.
 */
export async function signUp(input: SignUpInput): Promise<User> {
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) throw new HttpError(409, 'An account with this e-mail already exists; sign in or reset the password', { issues: [{ path: 'email', message: 'Already registered' }] });
  const invitation = input.invitationToken ? await usableInvitation(input.invitationToken) : null;
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
    if (invitation) {
      await Membership.create({ userId: user.id, studioId: invitation.studioId, role: invitation.role }, { transaction });
      await invitation.update({ acceptedAt: new Date() }, { transaction });
    } else {
      const name = input.studioName ?? `${input.name}'s studio`;
      const studio = await Studio.create({ name, slug: await uniqueStudioSlug(name, transaction) }, { transaction });
      await Membership.create({ userId: user.id, studioId: studio.id, role: 'owner' }, { transaction });
    }
    return user;
  });
}

/** Adds the signed-in person to the inviting studio (or changes their role there to the offered one). */
export async function acceptInvitation(user: User, token: string) {
  const inv = await usableInvitation(token);
  await sequelize.transaction(async (transaction) => {
    const m = await Membership.findOne({ where: { userId: user.id, studioId: inv.studioId }, transaction });
    if (m) {
      if (m.role !== 'owner') await m.update({ role: inv.role }, { transaction });
    } else {
      await Membership.create({ userId: user.id, studioId: inv.studioId, role: inv.role }, { transaction });
    }
    await inv.update({ acceptedAt: new Date() }, { transaction });
  });
  return { studioId: inv.studioId };
}

/**
 * Mails a single-use reset link valid for an hour. Unknown addresses get no mail but the same
 * answer, so the form does not reveal who has an account.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const { token, hash } = newToken();
  await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_TTL_MS) });
  await sendMail(
    linkMail({
      to: user.email,
      subject: 'Reset your Cardwright password',
      lines: [`Hello ${user.name},`, 'Someone asked to reset the password of your Cardwright account. The link works once, for one hour.', 'If it was not you, ignore this message; nothing changes.'],
      link: `${config.publicUrl}/reset/${token}`,
      linkLabel: 'Choose a new password',
    }),
  );
}

/** Sets a new password from a reset link; the link is spent and every other open reset is closed. */
export async function resetPassword(token: string, password: string): Promise<User> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) } });
  if (!reset || reset.usedAt || reset.expiresAt.getTime() < Date.now()) {
    throw new HttpError(400, 'This reset link is not valid any more; ask for a new one', { issues: [{ path: 'token', message: 'Expired or already used' }] });
  }
  const user = await User.findByPk(reset.userId);
  if (!user) throw new HttpError(400, 'This reset link is not valid any more');
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction });
  });
  return user;
}

/** Creates an invitation and mails its link. */
export async function invite(opts: { studio: Studio; email: string; role: Role; invitedBy: User }) {
  const member = await User.findOne({ where: { email: opts.email }, include: [{ model: Membership, as: 'memberships', where: { studioId: opts.studio.id }, required: true }] });
  if (member) throw new HttpError(409, `${opts.email} is already a member of this studio`, { issues: [{ path: 'email', message: 'Already a member' }] });
  const { token, hash } = newToken();
  const inv = await Invitation.create({
    studioId: opts.studio.id,
    email: opts.email,
    role: opts.role,
    tokenHash: hash,
    invitedById: opts.invitedBy.id,
    expiresAt: new Date(Date.now() + INVITE_TTL_MS),
  });
  await sendMail(
    linkMail({
      to: opts.email,
      subject: `${opts.invitedBy.name} invited you to ${opts.studio.name} on Cardwright`,
      lines: [`Hello,`, `${opts.invitedBy.name} invited you to join ${opts.studio.name} on Cardwright as ${opts.role}.`, 'The invitation is valid for 14 days.'],
      link: `${config.publicUrl}/invite/${token}`,
      linkLabel: 'Accept the invitation',
    }),
  );
  return inv;
}
