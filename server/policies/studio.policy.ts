import type { Actor } from './actor';

/** What a person may do in a studio, by role (DESIGN.md, Roles). */
export function studioAbilities(actor: Actor) {
  const r = actor.role;
  return {
    read: r !== null,
    update: r === 'owner',
    delete: r === 'owner',
    manageMembers: r === 'owner',
    /** Members' e-mail addresses: the team that works together; students see names only. */
    seeMemberEmails: r === 'owner' || r === 'coordinator' || r === 'maker',
    createTutorial: r === 'owner' || r === 'coordinator' || r === 'maker',
    seeAllTutorials: r === 'owner' || r === 'coordinator' || r === 'maker',
    /** Owners and coordinators run every class of the studio. */
    runClasses: r === 'owner' || r === 'coordinator',
    /** The studio's classes page: those who run classes see all, a maker those of the tutorials they made. */
    listClasses: r === 'owner' || r === 'coordinator' || r === 'maker',
    /** Schedule a class (from which tutorial: the tutorial policy's `scheduleClass`). */
    scheduleClasses: r === 'owner' || r === 'coordinator' || r === 'maker',
    /** The board and the brief list: the design team (students only see published work). */
    readBoard: r === 'owner' || r === 'coordinator' || r === 'maker',
    /** Hand out briefs and set each maker's monthly target. */
    createBrief: r === 'owner' || r === 'coordinator',
    setTargets: r === 'owner' || r === 'coordinator',
  };
}
export type StudioAbilities = ReturnType<typeof studioAbilities>;
