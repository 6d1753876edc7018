import { Router } from 'express';
import { z } from 'zod';
import { acceptInvitationSchema } from '@shared/schemas/auth';
import { validate } from '../../middlewares/validate';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { acceptInvitation, studiosOf, usableInvitation } from '../../services/accounts';
import { User } from '../../models';

/** Looking at and accepting an invitation from its e-mailed link. */
export function invitationsRouter() {
  const r = Router();

  r.get('/:token', validate({ params: z.object({ token: z.string().min(10) }) }), async (req, res) => {
    const inv = await usableInvitation(req.params.token as string);
    const hasAccount = Boolean(await User.findOne({ where: { email: inv.email }, attributes: ['id'] }));
    res.json({ email: inv.email, role: inv.role, studio: { id: inv.studio!.id, name: inv.studio!.name }, hasAccount, expiresAt: inv.expiresAt });
  });

  r.post('/accept', requireUser, validate({ body: acceptInvitationSchema }), async (req, res) => {
    const user = currentUser(req);
    const { studioId } = await acceptInvitation(user, req.body.token);
    res.json({ studioId, studios: await studiosOf(user.id) });
  });

  return r;
}
