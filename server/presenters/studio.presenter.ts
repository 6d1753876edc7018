import type { InvitationCreatedDto, MemberDto, MembersDto, PendingInvitationDto, StudioDto } from '@shared/schemas/studio';
import type { Invitation, Membership, Studio } from '../models';
import type { Actor, StudioAbilities } from '../policies';

/** A studio with the caller's role and abilities there. */
export function presentStudio(studio: Studio, actor: Actor, abilities: StudioAbilities): StudioDto {
  return { id: studio.id, name: studio.name, slug: studio.slug, role: actor.role, abilities };
}

/** A member; the e-mail address only for those the studio policy lets see it. */
export const presentMember = (m: Membership, abilities: Pick<StudioAbilities, 'seeMemberEmails'>): MemberDto => ({
  userId: m.userId,
  name: m.user!.name,
  email: abilities.seeMemberEmails ? m.user!.email : null,
  role: m.role,
  since: m.createdAt.toISOString(),
});

export const presentPendingInvitation = (i: Invitation): PendingInvitationDto => ({
  id: i.id,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});

export function presentMembers(members: Membership[], invitations: Invitation[], abilities: StudioAbilities): MembersDto {
  return { members: members.map((m) => presentMember(m, abilities)), invitations: invitations.map(presentPendingInvitation), abilities };
}

export const presentInvitationCreated = (i: Invitation, resent: boolean): InvitationCreatedDto => ({
  id: i.id,
  resent,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
});
