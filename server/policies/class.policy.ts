import type { Actor } from './actor';

type ClassLike = { tutorialAuthorId: string | null };

/**
 * What a person may do with a class. Owners and coordinators run every class of the studio; a
 * maker runs the classes of the tutorials they made. The roster holds attendees' names and
 * addresses, so nobody else reads it; attendees see their own registration through its link.
 */
export function classAbilities(actor: Actor, c: ClassLike) {
  const r = actor.role;
  const staff = r === 'owner' || r === 'coordinator';
  const author = r === 'maker' && actor.userId !== null && c.tutorialAuthorId === actor.userId;
  const runs = staff || author;
  return { read: runs, update: runs, manageRoster: runs };
}
export type ClassAbilities = ReturnType<typeof classAbilities>;
