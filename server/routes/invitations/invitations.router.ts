import { Router } from 'express';
import { z } from 'zod';
import { acceptInvitationSchema, type InvitationAcceptedDto } from '@shared/schemas/auth';
import { openRoute, route } from '../../lib/route';
import { acceptInvitation, invitationPreview, studiosOf } from '../../services/accounts';

const tokenParams = z.object({ token: z.string().min(10) });

/** Looking at and accepting an invitation from its e-mailed link. */
export function invitationsRouter() {
  const r = Router();

  r.get(
    '/:token',
    openRoute({ params: tokenParams }, async ({ params, res }) => {
      res.json(await invitationPreview(params.token));
    }),
  );

  r.post(
    '/accept',
    route({ body: acceptInvitationSchema }, async ({ body, user, res }) => {
      const { studioId } = await acceptInvitation(user, body.token);
      const answer: InvitationAcceptedDto = { studioId, studios: await studiosOf(user.id) };
      res.json(answer);
    }),
  );

  return r;
}
