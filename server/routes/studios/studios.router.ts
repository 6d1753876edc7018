import { Router } from 'express';
import { changeRoleSchema, idParams, invitationParams, inviteSchema, memberParams, updateStudioSchema, type RoleChangedDto } from '@shared/schemas/studio';
import { listTutorialsQuery, type TutorialListDto } from '@shared/schemas/tutorial';
import { route } from '../../lib/route';
import { authorize, tutorialAbilities } from '../../policies';
import { loadStudio } from '../../services/access';
import { invite } from '../../services/accounts';
import { changeRole, listMembers, pendingInvitations, removeMember, renameStudio, withdrawInvitation } from '../../services/studios';
import { listTutorials } from '../../services/tutorials';
import { presentTutorial } from '../../presenters/tutorial.presenter';
import { presentInvitationCreated, presentMembers, presentStudio } from '../../presenters/studio.presenter';

/** A studio, its tutorials, members and invitations. */
export function studiosRouter() {
  const r = Router();

  r.get(
    '/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      res.json(presentStudio(studio, actor, abilities));
    }),
  );

  r.patch(
    '/:id',
    route({ params: idParams, body: updateStudioSchema }, async ({ params, body, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'update', 'Only the owner can rename the studio');
      res.json(presentStudio(await renameStudio(studio, body.name), actor, abilities));
    }),
  );

  r.get(
    '/:id/tutorials',
    route({ params: idParams, query: listTutorialsQuery }, async ({ params, query, user, res }) => {
      const { studio, actor, abilities } = await loadStudio(user, params.id);
      const rows = await listTutorials(studio, { seeAll: abilities.seeAllTutorials, ...query });
      const answer: TutorialListDto = { tutorials: rows.map((t) => presentTutorial(t, tutorialAbilities(actor, t))), abilities };
      res.json(answer);
    }),
  );

  r.get(
    '/:id/members',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      const [members, invitations] = await Promise.all([listMembers(studio), abilities.manageMembers ? pendingInvitations(studio) : []]);
      res.json(presentMembers(members, invitations, abilities));
    }),
  );

  r.post(
    '/:id/invitations',
    route({ params: idParams, body: inviteSchema }, async ({ params, body, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'manageMembers', 'Only the owner can invite people');
      const { invitation, resent } = await invite({ studio, email: body.email, role: body.role, invitedBy: user });
      res.status(resent ? 200 : 201).json(presentInvitationCreated(invitation, resent));
    }),
  );

  r.delete(
    '/:id/invitations/:invitationId',
    route({ params: invitationParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'manageMembers', 'Only the owner can withdraw invitations');
      await withdrawInvitation(studio, params.invitationId);
      res.status(204).end();
    }),
  );

  r.patch(
    '/:id/members/:userId',
    route({ params: memberParams, body: changeRoleSchema }, async ({ params, body, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'manageMembers', 'Only the owner can change roles');
      const m = await changeRole(studio, params.userId, body.role);
      res.json({ userId: m.userId, role: m.role } satisfies RoleChangedDto);
    }),
  );

  r.delete(
    '/:id/members/:userId',
    route({ params: memberParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'manageMembers', 'Only the owner can remove members');
      await removeMember(studio, params.userId);
      res.status(204).end();
    }),
  );

  return r;
}
