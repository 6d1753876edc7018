import { Op, type Transaction } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import type { InvitationPreviewDto, SignUpInput, StudioMembershipDto } from '@shared/schemas/auth';
import { Invitation, Membership, PasswordReset, Studio, User, sequelize } from '../models';
import { BadRequestError, ConflictError, ForbiddenError, GoneError, InvalidInputError, NotFoundError, NotSignedInError } from '../lib/errors';
import { config } from '../config';
import { retryOnUnique, violatedConstraint } from '../lib/unique';
import { whenCommitted } from '../lib/when-committed';
import { columnsOf, jsonOf, selectRows, stored, storedFromJson } from '../lib/plain-rows';
import { studioAbilities } from '../policies';
import { burnPasswordCheck, hashPassword, verifyPassword } from './passwords';
import { hashToken, newToken } from './tokens';
import { linkMail, sendMail } from './mail';
import { uniqueStudioSlug } from './studios';
import { forgetSessionsOf, keptPeople, type SignedInRow } from './signed-in-cache';

/** Unique indexes a sign-up can run into (migration create-accounts: PostgreSQL's default names). */
const USER_EMAIL = 'users_email_key';
const STUDIO_SLUG = 'studios_slug_key';

const RESET_TTL_MS = 60 * 60_000;
const INVITE_TTL_MS = 14 * 24 * 60 * 60_000;

/**
 * The signed-in person with their roles and their studios, read on every request: one plain
 * query, the roles gathered by PostgreSQL's json_agg (see lib/plain-rows for why not Sequelize's
 * include). The row is kept for a few seconds and forgotten as soon as the person, a membership
 * of theirs or one of their studios changes (services/signed-in-cache); each request gets model
 * instances of its own.
 */
export async function findSignedInUser(id: string): Promise<User | null> {
  let row = keptPeople.get(id);
  if (!row) {
    const mark = keptPeople.mark();
    [row] = await selectRows<SignedInRow>(
      `SELECT ${columnsOf(User, 'u')},
              COALESCE(json_agg(json_build_object('id', m.id, 'studioId', m.studio_id, 'role', m.role, 'studio', ${jsonOf(Studio, 's')}))
                         FILTER (WHERE m.id IS NOT NULL), '[]'::json) AS memberships
         FROM users u LEFT JOIN memberships m ON m.user_id = u.id LEFT JOIN studios s ON s.id = m.studio_id
        WHERE u.id = $id
        GROUP BY u.id`,
      { id },
    );
    if (!row) return null;
    keptPeople.keep(id, row, mark);
  }
  const { memberships, ...attributes } = row;
  const user = stored(User, attributes);
  user.memberships = memberships.map(({ studio, ...m }) => {
    const membership = stored(Membership, { ...m, userId: id });
    membership.studio = storedFromJson(Studio, studio);
    return membership;
  });
  return user;
}

/** The studios a person belongs to, with their role in each. */
export async function studiosOf(userId: string): Promise<StudioMembershipDto[]> {
  const ms = await Membership.findAll({ where: { userId }, include: [{ model: Studio, as: 'studio' }], order: [['createdAt', 'ASC']] });
  return ms.map((m) => ({
    id: m.studio!.id,
    name: m.studio!.name,
    slug: m.studio!.slug,
    role: m.role,
    abilities: (({ listClasses, readBoard }) => ({ listClasses, readBoard }))(studioAbilities({ userId, role: m.role })),
  }));
}

/**
 * The account for an e-mail and password; 401 otherwise. An unknown address costs the same hash
 * time as a known one, so timing does not tell who has an account.
 */
export async function signIn(email: string, password: string): Promise<User> {
  const user = await User.findOne({ where: { email } });
  const ok = user ? await verifyPassword(password, user.passwordHash) : (await burnPasswordCheck(password), false);
  if (!user || !ok) throw new NotSignedInError('That e-mail and password do not match an account');
  return user;
}

/** Finds an invitation by its link token that can still be used. */
export async function usableInvitation(token: string) {
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) }, include: [{ model: Studio, as: 'studio' }] });
  if (!inv) throw NotFoundError.saying('This invitation link is not valid');
  if (inv.acceptedAt) throw new GoneError('This invitation has already been used');
  if (inv.expiresAt.getTime() < Date.now()) throw new GoneError('This invitation has expired; ask for a new one');
  return inv;
}

/** What the invitation page shows before accepting: who invites, as what, and whether the address already has an account. */
export async function invitationPreview(token: string): Promise<InvitationPreviewDto> {
  const inv = await usableInvitation(token);
  const hasAccount = Boolean(await User.findOne({ where: { email: inv.email }, attributes: ['id'] }));
  return { email: inv.email, role: inv.role, studio: { id: inv.studio!.id, name: inv.studio!.name }, hasAccount, expiresAt: inv.expiresAt.toISOString() };
}

/**
 * Creates an account. Without an invitation the person gets a studio of their own as owner;
 * with one, they join the inviting studio with the offered role.
 */
export async function signUp(input: SignUpInput): Promise<User> {
  const alreadyRegistered = () =>
    new ConflictError('An account with this e-mail already exists; sign in or reset the password', {
      issues: [{ path: 'email', message: 'Already registered' }],
    });
  if (await User.findOne({ where: { email: input.email }, attributes: ['id'] })) throw alreadyRegistered();
  const invitation = input.invitationToken ? await usableInvitation(input.invitationToken) : null;
  if (invitation && invitation.email.toLowerCase() !== input.email.toLowerCase())
    throw new InvalidInputError(
      [{ path: 'email', message: `The invitation was sent to ${invitation.email}` }],
      `This invitation was sent to ${invitation.email}; create the account with that address`,
    );
  const passwordHash = await hashPassword(input.password);
  // Two sign-ups at the same moment: the same e-mail is a conflict in words; the same studio name
  // picks the next free address on a second try.
  const create = () =>
    sequelize.transaction(async (transaction) => {
      const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
      if (invitation) {
        await Membership.create({ userId: user.id, studioId: invitation.studioId, role: invitation.role }, { transaction });
        await invitation.update({ acceptedAt: new Date() }, { transaction });
        await closeOtherInvitations(invitation, transaction);
      } else {
        const name = input.studioName ?? `${input.name}'s studio`;
        const studio = await Studio.create({ name, slug: await uniqueStudioSlug(name, transaction) }, { transaction });
        await Membership.create({ userId: user.id, studioId: studio.id, role: 'owner' }, { transaction });
      }
      return user;
    });
  try {
    return await retryOnUnique([STUDIO_SLUG], create);
  } catch (e) {
    if (violatedConstraint(e) === USER_EMAIL) throw alreadyRegistered();
    throw e;
  }
}

/** Adds the signed-in person to the inviting studio (or changes their role there to the offered one). */
export async function acceptInvitation(user: User, token: string) {
  const inv = await usableInvitation(token);
  // A link that reached someone else (a forward, a shared inbox) does not let them in.
  if (user.email.toLowerCase() !== inv.email.toLowerCase())
    throw new ForbiddenError(`This invitation was sent to ${inv.email}; sign in with that address to accept it`);
  await sequelize.transaction(async (transaction) => {
    const m = await Membership.findOne({ where: { userId: user.id, studioId: inv.studioId }, transaction });
    if (m) {
      if (m.role !== 'owner') await m.update({ role: inv.role }, { transaction });
    } else {
      await Membership.create({ userId: user.id, studioId: inv.studioId, role: inv.role }, { transaction });
    }
    await inv.update({ acceptedAt: new Date() }, { transaction });
    await closeOtherInvitations(inv, transaction);
  });
  return { studioId: inv.studioId };
}

/**
 * Starts a reset in the background and returns at once: the caller answers before any look-up,
 * so the answer takes as long for an unknown address as for a known one. A failure (mail server
 * down) is logged; the person can ask again.
 */
export function startPasswordReset(email: string): void {
  requestPasswordReset(email).catch((e: unknown) => console.error('[password reset]', e));
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
      lines: [
        `Hello ${user.name},`,
        'Someone asked to reset the password of your Cardwright account. The link works once, for one hour.',
        'If it was not you, ignore this message; nothing changes.',
      ],
      link: `${config.publicUrl}/reset/${token}`,
      linkLabel: 'Choose a new password',
    }),
  );
}

/** Sets a new password from a reset link; the link is spent and every other open reset is closed. */
export async function resetPassword(token: string, password: string): Promise<User> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) } });
  if (!reset || reset.usedAt || reset.expiresAt.getTime() < Date.now()) {
    throw new InvalidInputError([{ path: 'token', message: 'Expired or already used' }], 'This reset link is not valid any more; ask for a new one');
  }
  const user = await User.findByPk(reset.userId);
  if (!user) throw new BadRequestError('This reset link is not valid any more');
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction });
    // Whoever knew the old password is signed out everywhere; the reset starts one fresh session.
    await endSessionsOf(user.id, transaction);
  });
  return user;
}

/**
 * A signed-in person changes their password, proving the current one (a session left open on
 * someone else's computer must not be enough). Every session of theirs ends, as after a reset;
 * the route starts a fresh one for the browser that asked.
 */
export async function changePassword(userId: string, currentPassword: string, password: string): Promise<User> {
  const user = await User.findByPk(userId);
  if (!user) throw new NotSignedInError();
  if (!(await verifyPassword(currentPassword, user.passwordHash))) {
    throw new InvalidInputError([{ path: 'currentPassword', message: 'Not your current password' }], 'That is not your current password');
  }
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await endSessionsOf(user.id, transaction);
  });
  return user;
}

/** Ends every stored session of a person (express-session keeps them in the `session` table). */
export async function endSessionsOf(userId: string, transaction?: Transaction): Promise<void> {
  await sequelize.query(`DELETE FROM "session" WHERE sess->>'userId' = :userId`, { replacements: { userId }, transaction });
  // This process forgets them before the request answers; the others hear of it from the table's trigger.
  whenCommitted({ transaction }, () => forgetSessionsOf(userId));
}

/**
 * Invites an address to a studio and mails the link. An address with an invitation not yet accepted
 * gets that one sent again (a new link, the role now chosen, 14 days from now) instead of a second
 * row; older links to it stop working. `resent` says which happened.
 */
export async function invite(opts: { studio: Studio; email: string; role: Role; invitedBy: User }): Promise<{ invitation: Invitation; resent: boolean }> {
  const member = await User.findOne({
    where: { email: opts.email },
    include: [{ model: Membership, as: 'memberships', where: { studioId: opts.studio.id }, required: true }],
  });
  if (member) throw new ConflictError(`${opts.email} is already a member of this studio`, { issues: [{ path: 'email', message: 'Already a member' }] });
  const { token, hash } = newToken();
  const offer = { role: opts.role, tokenHash: hash, invitedById: opts.invitedBy.id, expiresAt: new Date(Date.now() + INVITE_TTL_MS) };
  const { inv, resent } = await sequelize.transaction(async (transaction) => {
    // The studio row's lock makes two invitations of one address at the same moment one after the other.
    await Studio.findByPk(opts.studio.id, { attributes: ['id'], lock: transaction.LOCK.UPDATE, transaction });
    const open = await Invitation.findAll({
      where: { studioId: opts.studio.id, email: opts.email.trim().toLowerCase(), acceptedAt: { [Op.is]: null } },
      order: [['createdAt', 'DESC']],
      transaction,
    });
    const [kept, ...older] = open;
    if (older.length) await Invitation.destroy({ where: { id: older.map((i) => i.id) }, transaction });
    if (kept) return { inv: await kept.update(offer, { transaction }), resent: true };
    return { inv: await Invitation.create({ studioId: opts.studio.id, email: opts.email, ...offer }, { transaction }), resent: false };
  });
  await sendMail(
    linkMail({
      to: opts.email,
      subject: `${opts.invitedBy.name} invited you to ${opts.studio.name} on Cardwright`,
      lines: [
        `Hello,`,
        `${opts.invitedBy.name} invited you to join ${opts.studio.name} on Cardwright as ${opts.role}.`,
        'The invitation is valid for 14 days.',
      ],
      link: `${config.publicUrl}/invite/${token}`,
      linkLabel: 'Accept the invitation',
    }),
  );
  return { invitation: inv, resent };
}

/** Accepting one invitation settles the address's others to the same studio (resent copies, class links). */
function closeOtherInvitations(inv: Invitation, transaction: Transaction) {
  return Invitation.destroy({ where: { studioId: inv.studioId, email: inv.email, acceptedAt: { [Op.is]: null }, id: { [Op.ne]: inv.id } }, transaction });
}
