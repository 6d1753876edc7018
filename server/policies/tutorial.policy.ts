import { reviewState, type TutorialState, type UpdateState } from '@shared/schemas/tutorial';
import type { Actor } from './actor';

type TutorialLike = { authorId: string | null; state: TutorialState; updateState?: UpdateState | null };

/**
 * What a person (or a visitor: see `ANONYMOUS`) may do with one tutorial. Makers see the studio's
 * tutorials (a design team works in the open) but change only their own; coordinators review and
 * edit any; students read published ones. Published means public: anyone reads its page, its
 * exports and its media (ADR 005). Once published, the review moves act on its update (the
 * changes made since), and readers (students) see the published version, not the workspace.
 */
export function tutorialAbilities(actor: Actor, t: TutorialLike) {
  const r = actor.role;
  const staff = r === 'owner' || r === 'coordinator';
  const author = r === 'maker' && actor.userId !== null && t.authorId === actor.userId;
  const published = t.state === 'published';
  const review = reviewState(t);
  const read = staff || r === 'maker' || (r === 'student' && published);
  return {
    /** Members of the studio learn that it exists; anyone else gets 404, so ids do not leak. */
    visible: r !== null,
    read,
    update: staff || author,
    delete: r === 'owner' || (author && !published),
    submit: (staff || author) && (review === 'draft' || review === 'needs_changes'),
    approve: staff && review === 'in_review',
    sendBack: staff && (review === 'in_review' || review === 'approved'),
    publish: staff && review === 'approved',
    unpublish: staff && published,
    /** The workspace: the draft of the write-up, cut list, supplies and footage, and its versions. */
    readDraft: staff || r === 'maker',
    /** Set, change or cancel the time an approved tutorial publishes itself. */
    schedulePublish: staff && t.state === 'approved',
    /**
     * The write-up's revisions: the studio's team. Students read the published text only, never
     * what it said before (drafts, review rounds).
     */
    readRevisions: staff || r === 'maker',
    /** Comments and review history: the studio's team reads them (students do not). */
    readComments: staff || r === 'maker',
    /** Comment, reply, resolve and reopen: those who review it and its maker. */
    comment: staff || author,
    /** Schedule a class from it: those who run the studio's classes, and the tutorial's maker. */
    scheduleClass: staff || author,
    /** The page at /t/<studio>/<tutorial>: published tutorials only, whoever asks. */
    readPublicPage: published,
    /** Blog HTML, zip, handout, template, description and the print view. */
    readExports: published || read,
    /** Previews, posters, thumbnails, stills and blog images under /media. */
    readMedia: published || read,
  };
}
export type TutorialAbilities = ReturnType<typeof tutorialAbilities>;
