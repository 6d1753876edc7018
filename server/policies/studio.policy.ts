import type { Actor } from './actor';

/** What a person may do in a studio, by role (DESIGN.md, Roles). */
export function studioAbilities(actor: Actor) {
  const r = actor.role;
  return {
    read: r !== null,
    update: r === 'owner',
    delete: r === 'owner',
    manageMembers: r === 'owner',
    createTutorial: r === 'owner' || r === 'coordinator' || r === 'maker',
    seeAllTutorials: r === 'owner' || r === 'coordinator' || r === 'maker',
    runClasses: r === 'owner' || r === 'coordinator',
  };
}
export type StudioAbilities = ReturnType<typeof studioAbilities>;
