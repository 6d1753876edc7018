import type { Request } from 'express';
import type { Role } from '@shared/schemas/roles';
import { Chapter, Membership, Recording, Still, Studio, Tutorial } from '../models';
import { notFound } from '../lib/http-error';
import { currentUser } from '../middlewares/authenticate';
import { studioAbilities, tutorialAbilities, type Actor } from '../policies';

/** The person's role in a studio, or null when they are not a member. */
export async function roleIn(userId: string, studioId: string): Promise<Role | null> {
  const m = await Membership.findOne({ where: { userId, studioId }, attributes: ['role'] });
  return m?.role ?? null;
}

/**
 * Loads a studio for the signed-in person. Outsiders get 404, so studio ids do not leak.
 */
export async function loadStudio(req: Request, id: string) {
  const user = currentUser(req);
  const studio = await Studio.findByPk(id);
  if (!studio) throw notFound('Studio');
  const actor: Actor = { userId: user.id, role: await roleIn(user.id, studio.id) };
  if (!actor.role) throw notFound('Studio');
  return { studio, actor, abilities: studioAbilities(actor) };
}

/**
 * Loads a tutorial for the signed-in person: 404 when it does not exist or they are not in its
 * studio, 403 when they are a member who may not read it (a student and a draft).
 */
export async function loadTutorial(req: Request, id: string) {
  const user = currentUser(req);
  const tutorial = await Tutorial.findByPk(id);
  if (!tutorial) throw notFound('Tutorial');
  const actor: Actor = { userId: user.id, role: await roleIn(user.id, tutorial.studioId) };
  if (!actor.role) throw notFound('Tutorial');
  const abilities = tutorialAbilities(actor, tutorial);
  return { tutorial, actor, abilities };
}

/** Loads a recording with its tutorial's access rules. */
export async function loadRecording(req: Request, id: string) {
  const recording = await Recording.findByPk(id);
  if (!recording) throw notFound('Recording');
  return { recording, ...(await loadTutorial(req, recording.tutorialId)) };
}

/** Loads a chapter through its recording. */
export async function loadChapter(req: Request, id: string) {
  const chapter = await Chapter.findByPk(id);
  if (!chapter) throw notFound('Chapter');
  return { chapter, ...(await loadRecording(req, chapter.recordingId)) };
}

/** Loads a still through its recording. */
export async function loadStill(req: Request, id: string) {
  const still = await Still.findByPk(id);
  if (!still) throw notFound('Still');
  return { still, ...(await loadRecording(req, still.recordingId)) };
}

/**
 * May this request see the media of a tutorial? Published tutorials are public; anything else
 * needs a signed-in member who may read it. Callers answer 404 otherwise, so drafts do not leak.
 */
export async function canSeeMedia(req: Request, tutorialId: string): Promise<boolean> {
  const tutorial = await Tutorial.findByPk(tutorialId, { attributes: ['id', 'studioId', 'authorId', 'state'] });
  if (!tutorial) return false;
  if (tutorial.state === 'published') return true;
  if (!req.user) return false;
  const role = await roleIn(req.user.id, tutorial.studioId);
  return role !== null && tutorialAbilities({ userId: req.user.id, role }, tutorial).read;
}
