import type { Role } from '@shared/schemas/roles';
import type { ExportVersion } from '@shared/schemas/publish';
import type { BundleSource } from './publish/bundle';
import { Chapter, CraftClass, Membership, Recording, Still, Studio, Tutorial, type User } from '../models';
import { NotFoundError } from '../lib/errors';
import { findStored } from '../lib/plain-rows';
import { ANONYMOUS, authorize, briefAbilities, classAbilities, studioAbilities, tutorialAbilities, type Actor } from '../policies';
import { findBrief } from './briefs';
import { findTutorialWithAuthor } from './tutorials';

/**
 * Loaders: find a record, work out who is asking (the `Actor`) and ask the record's policy. They
 * take the signed-in `User` (or null for a visitor), never an Express request. Records of studios
 * the caller is not in answer 404, so ids do not leak; the policy's 403s come from `authorize`.
 */

/** The person's role in a studio, or null when they are not a member. */
export async function roleIn(userId: string, studioId: string): Promise<Role | null> {
  const m = await Membership.findOne({ where: { userId, studioId }, attributes: ['role'] });
  return m?.role ?? null;
}

/**
 * Who is asking about a record of this studio; a visitor is `ANONYMOUS`. The signed-in person
 * arrives with their memberships (`loadUser` reads them in the same query as the person), so
 * this asks the database only for a `User` loaded some other way.
 */
export async function actorIn(user: User | null, studioId: string): Promise<Actor> {
  if (!user) return ANONYMOUS;
  if (user.memberships) return { userId: user.id, role: user.memberships.find((m) => m.studioId === studioId)?.role ?? null };
  return { userId: user.id, role: await roleIn(user.id, studioId) };
}

/**
 * A studio for one of its members; outsiders get 404. The signed-in person arrives with their
 * studios (`loadUser`), so a member's studio comes from there and an outsider is answered without
 * a query; a `User` loaded some other way has the studio read.
 */
export async function loadStudio(user: User, id: string) {
  const membership = user.memberships?.find((m) => m.studioId === id);
  // Known memberships and none here: an outsider, 404 whether or not the studio exists.
  const studio = membership?.studio ?? (user.memberships && !membership ? null : await findStored(Studio, id));
  if (!studio) throw new NotFoundError('Studio');
  const actor = await actorIn(user, studio.id);
  const abilities = studioAbilities(actor);
  if (!abilities.read) throw new NotFoundError('Studio');
  return { studio, actor, abilities };
}

/**
 * A tutorial for a member of its studio: 404 when it does not exist or they are not in its
 * studio. Whether they may read it (a student and a draft: 403) is the handler's `authorize`.
 */
export async function loadTutorial(user: User, id: string, o: { withAuthor?: boolean } = {}) {
  // The author (id and name) in the same query when the answer shows them.
  const tutorial = o.withAuthor ? await findTutorialWithAuthor(id) : await findStored(Tutorial, id);
  if (!tutorial) throw new NotFoundError('Tutorial');
  const actor = await actorIn(user, tutorial.studioId);
  const abilities = tutorialAbilities(actor, tutorial);
  if (!abilities.visible) throw new NotFoundError('Tutorial');
  return { tutorial, actor, abilities };
}

/** A recording with its tutorial's access rules. */
export async function loadRecording(user: User, id: string) {
  const recording = await Recording.findByPk(id);
  if (!recording) throw new NotFoundError('Recording');
  return { recording, ...(await loadTutorial(user, recording.tutorialId)) };
}

/** A chapter through its recording. */
export async function loadChapter(user: User, id: string) {
  const chapter = await Chapter.findByPk(id);
  if (!chapter) throw new NotFoundError('Chapter');
  return { chapter, ...(await loadRecording(user, chapter.recordingId)) };
}

/** A still through its recording. */
export async function loadStill(user: User, id: string) {
  const still = await Still.findByPk(id);
  if (!still) throw new NotFoundError('Still');
  return { still, ...(await loadRecording(user, still.recordingId)) };
}

/**
 * A tutorial for an export or a print view, asked by anyone (the policy's `readExports`):
 * published ones are open; a draft answers 404 to visitors and outsiders, 403 to a member who may
 * not read it.
 */
export async function loadExportable(user: User | null, id: string): Promise<Tutorial> {
  const tutorial = await Tutorial.findByPk(id);
  if (!tutorial) throw new NotFoundError('Tutorial');
  const actor = await actorIn(user, tutorial.studioId);
  const abilities = tutorialAbilities(actor, tutorial);
  if (abilities.readExports) return tutorial;
  if (!abilities.visible) throw new NotFoundError('Tutorial');
  authorize(abilities, 'readExports', 'This tutorial is not published yet');
  return tutorial;
}

/**
 * Which content an export shows: what readers see, unless the people working on the tutorial
 * ask for its draft (`?version=draft`, a pending update's preview); anyone else asking gets 403.
 */
export async function exportSource(user: User | null, tutorial: Tutorial, version: ExportVersion | undefined): Promise<BundleSource> {
  if (version !== 'draft') return 'readers';
  authorize(tutorialAbilities(await actorIn(user, tutorial.studioId), tutorial), 'readDraft', 'Only the people working on this tutorial see its draft');
  return 'draft';
}

/** A published tutorial by its public address (the policy's `readPublicPage`), or null. */
export async function loadPublicPage(studioSlug: string, tutorialSlug: string) {
  const studio = await Studio.findOne({ where: { slug: studioSlug } });
  if (!studio) return null;
  const tutorial = await Tutorial.findOne({ where: { studioId: studio.id, slug: tutorialSlug } });
  if (!tutorial || !tutorialAbilities(ANONYMOUS, tutorial).readPublicPage) return null;
  return { studio, tutorial };
}

/** How a file may be cached: published media are public (any cache may keep them), a draft's private and never stored. */
export type MediaVisibility = 'public' | 'private';

/**
 * Whether the caller may see a tutorial's media (the policy's `readMedia`) and how it may be
 * cached (`readPublicPage`: published means public); 404 otherwise, so drafts' files do not leak.
 */
export async function loadMediaVisibility(user: User | null, tutorialId: string): Promise<MediaVisibility> {
  const tutorial = await Tutorial.findByPk(tutorialId, { attributes: ['id', 'studioId', 'authorId', 'state'] });
  if (!tutorial) throw new NotFoundError('File');
  const abilities = tutorialAbilities(await actorIn(user, tutorial.studioId), tutorial);
  if (!abilities.readMedia) throw new NotFoundError('File');
  return abilities.readPublicPage ? 'public' : 'private';
}

/** A recording's files (preview, poster, thumbnails) for whoever may see them; 404 otherwise. */
export async function loadRecordingMedia(user: User | null, id: string) {
  const recording = await Recording.findByPk(id);
  if (!recording) throw new NotFoundError('File');
  return { recording, visibility: await loadMediaVisibility(user, recording.tutorialId) };
}

/** A still's file for whoever may see it; 404 otherwise. */
export async function loadStillMedia(user: User | null, id: string) {
  const still = await Still.findByPk(id, { include: [{ model: Recording, as: 'recording', attributes: ['tutorialId'] }] });
  if (!still?.recording) throw new NotFoundError('File');
  return { still, visibility: await loadMediaVisibility(user, still.recording.tutorialId) };
}

/**
 * A class with its tutorial for a member of its studio (outsiders: 404). Whether they may read
 * its roster is the handler's `authorize` (the class policy: 403 for students and other makers).
 */
export async function loadClass(user: User, id: string) {
  const klass = await CraftClass.findByPk(id, {
    include: [
      { model: Tutorial, as: 'tutorial' },
      { model: Studio, as: 'studio' },
    ],
  });
  if (!klass?.tutorial || !klass.studio) throw new NotFoundError('Class');
  const actor = await actorIn(user, klass.studioId);
  if (!actor.role) throw new NotFoundError('Class');
  return { klass, tutorial: klass.tutorial, studio: klass.studio, actor, abilities: classAbilities(actor, { tutorialAuthorId: klass.tutorial.authorId }) };
}

/**
 * A brief for a member of its studio (outsiders: 404). Whether they may read it (the maker it is
 * for, coordinators and owners; 403 for others) is the handler's `authorize`.
 */
export async function loadBrief(user: User, id: string) {
  const brief = await findBrief(id);
  const actor = await actorIn(user, brief.studioId);
  if (!actor.role) throw new NotFoundError('Brief');
  return { brief, actor, abilities: briefAbilities(actor, brief) };
}
