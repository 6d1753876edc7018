import type { TutorialState } from '@shared/schemas/tutorial';
import type { Actor } from './actor';

type TutorialLike = { authorId: string | null; state: TutorialState };

/**
 * What a person may do with one tutorial. Makers see the studio's tutorials (a design team works
 * in the open) but change only their own; coordinators review and edit any; students read published ones.
 */
export function tutorialAbilities(actor: Actor, t: TutorialLike) {
  const r = actor.role;
  const staff = r === 'owner' || r === 'coordinator';
  const author = r === 'maker' && t.authorId === actor.userId;
  return {
    read: staff || r === 'maker' || (r === 'student' && t.state === 'published'),
    update: staff || author,
    delete: r === 'owner' || (author && t.state !== 'published'),
    submit: (staff || author) && (t.state === 'draft' || t.state === 'needs_changes'),
    approve: staff && t.state === 'in_review',
    sendBack: staff && (t.state === 'in_review' || t.state === 'approved'),
    publish: staff && t.state === 'approved',
    unpublish: staff && t.state === 'published',
    comment: staff || author,
  };
}
export type TutorialAbilities = ReturnType<typeof tutorialAbilities>;
