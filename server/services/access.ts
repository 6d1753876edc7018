import type { Request } from 'express';
import type { Role } from '@shared/schemas/roles';
import { Membership, Studio, Tutorial } from '../models';
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
