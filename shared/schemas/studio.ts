import { z } from 'zod';
import { emailSchema } from './auth';
import { roleSchema } from './roles';

export const uuidSchema = z.uuid('Not a valid id');
export const idParams = z.object({ id: uuidSchema });
export const memberParams = z.object({ id: uuidSchema, userId: uuidSchema });
export const invitationParams = z.object({ id: uuidSchema, invitationId: uuidSchema });

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteInput = z.infer<typeof inviteSchema>;
export const changeRoleSchema = z.object({ role: roleSchema });
export const updateStudioSchema = z.object({ name: z.string().trim().min(1).max(120) });
