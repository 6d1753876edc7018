import { ForbiddenError } from '../lib/errors';

export { ANONYMOUS, type Actor } from './actor';
export { studioAbilities, type StudioAbilities } from './studio.policy';
export { tutorialAbilities, type TutorialAbilities } from './tutorial.policy';
export { classAbilities, type ClassAbilities } from './class.policy';
export { commentAbilities } from './comment.policy';
export { attendeeAbilities } from './registration.policy';
export { mailboxAbilities, outboxRecipient, type Connection } from './mailbox.policy';
export { briefAbilities, type BriefAbilities } from './brief.policy';

/** Throws 403 unless the ability is granted; handlers call this with a policy's abilities. */
export function authorize<A extends Record<string, boolean>>(abilities: A, action: keyof A, message?: string): void {
  if (!abilities[action]) throw new ForbiddenError(message);
}
