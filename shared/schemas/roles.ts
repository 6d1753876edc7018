import { z } from 'zod';

export const ROLES = ['owner', 'coordinator', 'maker', 'student'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

/** Words the interface shows for each role. */
export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  coordinator: 'Coordinator',
  maker: 'Maker',
  student: 'Student',
};
