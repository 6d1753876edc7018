import { forbidden } from '../lib/http-error';

export type { Actor } from './actor';
export { studioAbilities } from './studio.policy';
export { tutorialAbilities } from './tutorial.policy';

/** Throws 403 unless the ability is granted; handlers call this with a policy's abilities. */
export function authorize<A extends Record<string, boolean>>(abilities: A, action: keyof A, message?: string): void {
  if (!abilities[action]) throw forbidden(message);
}
