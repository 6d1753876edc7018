import type { Role } from '@shared/schemas/roles';

/** Who is asking, with their role in the studio the record belongs to (null: not a member). */
export type Actor = { userId: string; role: Role | null };
