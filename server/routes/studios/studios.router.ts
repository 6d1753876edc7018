import { Router } from 'express';
import { Op, type WhereOptions } from 'sequelize';
import { changeRoleSchema, idParams, invitationParams, inviteSchema, memberParams, updateStudioSchema } from '@shared/schemas/studio';
import { listTutorialsQuery } from '@shared/schemas/tutorial';
import { Invitation, Membership, Tutorial, User } from '../../models';
import { validate } from '../../middlewares/validate';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { authorize, tutorialAbilities } from '../../policies';
import { HttpError, notFound } from '../../lib/http-error';
import { loadStudio } from '../../services/access';
import { invite } from '../../services/accounts';
import { presentTutorial } from '../tutorials/tutorial.presenter';

/** A studio, its tutorials, members and invitations. */
export function studiosRouter() {
  const r = Router();
  r.use(requireUser);

  r.get('/:id', validate({ params: idParams }), async (req, res) => {
    const { studio, actor, abilities } = await loadStudio(req, req.params.id as string);
    res.json({ id: studio.id, name: studio.name, slug: studio.slug, role: actor.role, abilities });
  });

  r.patch('/:id', validate({ params: idParams, body: updateStudioSchema }), async (req, res) => {
    const { studio, actor, abilities } = await loadStudio(req, req.params.id as string);
    authorize(abilities, 'update', 'Only the owner can rename the studio');
    await studio.update({ name: req.body.name });
    res.json({ id: studio.id, name: studio.name, slug: studio.slug, role: actor.role, abilities });
  });

  r.get('/:id/tutorials', validate({ params: idParams, query: listTutorialsQuery }), async (req, res) => {
    const { studio, actor, abilities } = await loadStudio(req, req.params.id as string);
    const q = req.query as { state?: string; q?: string };
    const where: WhereOptions = { studioId: studio.id };
    if (!abilities.seeAllTutorials) Object.assign(where, { state: 'published' });
    else if (q.state) Object.assign(where, { state: q.state });
    if (q.q) Object.assign(where, { title: { [Op.iLike]: `%${q.q.replace(/[%_\\]/g, '\\$&')}%` } });
    const rows = await Tutorial.findAll({
      where,
      include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
      order: [['updatedAt', 'DESC']],
    });
    res.json({ tutorials: rows.map((t) => presentTutorial(t, tutorialAbilities(actor, t))), abilities });
  });

  r.get('/:id/members', validate({ params: idParams }), async (req, res) => {
    const { studio, abilities } = await loadStudio(req, req.params.id as string);
    const members = await Membership.findAll({ where: { studioId: studio.id }, include: [{ model: User, as: 'user' }], order: [['createdAt', 'ASC']] });
    const invitations = abilities.manageMembers
      ? await Invitation.findAll({ where: { studioId: studio.id, acceptedAt: { [Op.is]: null }, expiresAt: { [Op.gt]: new Date() } }, order: [['createdAt', 'DESC']] })
      : [];
    res.json({
      members: members.map((m) => ({ userId: m.userId, name: m.user!.name, email: m.user!.email, role: m.role, since: m.createdAt })),
      invitations: invitations.map((i) => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt, createdAt: i.createdAt })),
      abilities,
    });
  });

  r.post('/:id/invitations', validate({ params: idParams, body: inviteSchema }), async (req, res) => {
    const { studio, abilities } = await loadStudio(req, req.params.id as string);
    authorize(abilities, 'manageMembers', 'Only the owner can invite people');
    const inv = await invite({ studio, email: req.body.email, role: req.body.role, invitedBy: currentUser(req) });
    res.status(201).json({ id: inv.id, email: inv.email, role: inv.role, expiresAt: inv.expiresAt });
  });

  r.delete('/:id/invitations/:invitationId', validate({ params: invitationParams }), async (req, res) => {
    const { studio, abilities } = await loadStudio(req, req.params.id as string);
    authorize(abilities, 'manageMembers', 'Only the owner can withdraw invitations');
    const n = await Invitation.destroy({ where: { id: req.params.invitationId as string, studioId: studio.id } });
    if (!n) throw notFound('Invitation');
    res.status(204).end();
  });

  /** A studio always keeps at least one owner. */
  const guardLastOwner = async (studioId: string, m: Membership) => {
    if (m.role !== 'owner') return;
    const owners = await Membership.count({ where: { studioId, role: 'owner' } });
    if (owners <= 1) throw new HttpError(409, 'A studio needs at least one owner; make someone else owner first');
  };

  r.patch('/:id/members/:userId', validate({ params: memberParams, body: changeRoleSchema }), async (req, res) => {
    const { studio, abilities } = await loadStudio(req, req.params.id as string);
    authorize(abilities, 'manageMembers', 'Only the owner can change roles');
    const m = await Membership.findOne({ where: { studioId: studio.id, userId: req.params.userId as string } });
    if (!m) throw notFound('Member');
    if (req.body.role !== 'owner') await guardLastOwner(studio.id, m);
    await m.update({ role: req.body.role });
    res.json({ userId: m.userId, role: m.role });
  });

  r.delete('/:id/members/:userId', validate({ params: memberParams }), async (req, res) => {
    const { studio, abilities } = await loadStudio(req, req.params.id as string);
    authorize(abilities, 'manageMembers', 'Only the owner can remove members');
    const m = await Membership.findOne({ where: { studioId: studio.id, userId: req.params.userId as string } });
    if (!m) throw notFound('Member');
    await guardLastOwner(studio.id, m);
    await m.destroy();
    res.status(204).end();
  });

  return r;
}
