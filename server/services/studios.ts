import type { Transaction } from 'sequelize';
import { slugify } from '@shared/slug';
import { Studio, Tutorial } from '../models';

/** A slug no other studio uses: "paper-lantern", then "paper-lantern-2" ... */
export async function uniqueStudioSlug(name: string, transaction?: Transaction): Promise<string> {
  const base = slugify(name);
  for (let n = 1; ; n++) {
    const slug = n === 1 ? base : `${base}-${n}`;
    if (!(await Studio.findOne({ where: { slug }, transaction, attributes: ['id'] }))) return slug;
  }
}

/** A tutorial slug unique within its studio, for the stable public address /t/:studio/:tutorial. */
export async function uniqueTutorialSlug(studioId: string, title: string, exceptId?: string): Promise<string> {
  const base = slugify(title);
  for (let n = 1; ; n++) {
    const slug = n === 1 ? base : `${base}-${n}`;
    const other = await Tutorial.findOne({ where: { studioId, slug }, attributes: ['id'] });
    if (!other || other.id === exceptId) return slug;
  }
}
