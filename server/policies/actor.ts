import type { Role } from '@shared/schemas/roles';

/**
 * Who is asking, with their role in the studio the record belongs to: `role` is null for a
 * signed-in person who is not a member, and both are null for a visitor who is not signed in.
 */
export type Actor = { userId: string | null; role: Role | null };

/** A visitor who is not signed in: policies answer for them too (published pages, exports, media). */
export const ANONYMOUS: Actor = { userId: null, role: null };
