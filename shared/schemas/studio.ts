import { z } from 'zod';
import { emailSchema } from './auth';
import { roleSchema, type Role } from './roles';

export const uuidSchema = z.uuid('Not a valid id');
export const idParams = z.object({ id: uuidSchema });
export const memberParams = z.object({ id: uuidSchema, userId: uuidSchema });
export const invitationParams = z.object({ id: uuidSchema, invitationId: uuidSchema });

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteInput = z.infer<typeof inviteSchema>;
export const changeRoleSchema = z.object({ role: roleSchema });
export const updateStudioSchema = z.object({ name: z.string().trim().min(1).max(120) });

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/** What the caller may do in a studio (server/policies/studio.policy.ts decides). */
export type StudioAbilitiesDto = {
  read: boolean;
  update: boolean;
  delete: boolean;
  manageMembers: boolean;
  seeMemberEmails: boolean;
  createTutorial: boolean;
  seeAllTutorials: boolean;
  runClasses: boolean;
  listClasses: boolean;
  scheduleClasses: boolean;
  readBoard: boolean;
  createBrief: boolean;
  setTargets: boolean;
};

/** GET /studios/:id. */
export type StudioDto = { id: string; name: string; slug: string; role: Role | null; abilities: StudioAbilitiesDto };

/** `email` is null for callers who may not see members' addresses (students). */
export type MemberDto = { userId: string; name: string; email: string | null; role: Role; since: string };
export type PendingInvitationDto = { id: string; email: string; role: Role; expiresAt: string; createdAt: string };

/** GET /studios/:id/members: invitations only for those who manage members. */
export type MembersDto = { members: MemberDto[]; invitations: PendingInvitationDto[]; abilities: StudioAbilitiesDto };

/** POST /studios/:id/invitations. */
/** POST /studios/:id/invitations: 201 for a new invitation, 200 with `resent` when the address's open one was sent again. */
export type InvitationCreatedDto = { id: string; resent: boolean; email: string; role: Role; expiresAt: string };

/** PATCH /studios/:id/members/:userId. */
export type RoleChangedDto = { userId: string; role: Role };
