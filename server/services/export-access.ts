import type { Request } from 'express';
import { Tutorial } from '../models';
import { notFound } from '../lib/http-error';
import { loadTutorial } from './access';
import { authorize } from '../policies';

/**
 * A tutorial for an export or public view: published ones are open to anyone; anything else
 * needs a signed-in person who may read it, and answers 404 to outsiders so drafts stay private.
 */
export async function loadExportable(req: Request, id: string): Promise<Tutorial> {
  const t = await Tutorial.findByPk(id);
  if (!t) throw notFound('Tutorial');
  if (t.state === 'published') return t;
  if (!req.user) throw notFound('Tutorial');
  const { tutorial, abilities } = await loadTutorial(req, id);
  authorize(abilities, 'read', 'This tutorial is not published yet');
  return tutorial;
}
