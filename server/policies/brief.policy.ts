import type { Actor } from './actor';

/**
 * What a person may do with one brief: coordinators and owners hand briefs out and change them;
 * the maker it is for reads it and starts the tutorial from it. Other members of the studio get
 * 403 (a brief is between the coordinator and one maker); outsiders never get this far (404).
 */
export function briefAbilities(actor: Actor, b: { makerId: string }) {
  const staff = actor.role === 'owner' || actor.role === 'coordinator';
  const mine = actor.userId !== null && actor.userId === b.makerId && actor.role !== null && actor.role !== 'student';
  return {
    read: staff || mine,
    update: staff,
    delete: staff,
    /** Start the tutorial: the maker, or a coordinator on their behalf (the maker stays its author). */
    startTutorial: staff || mine,
  };
}
export type BriefAbilities = ReturnType<typeof briefAbilities>;
