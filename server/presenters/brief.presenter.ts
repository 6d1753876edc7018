import type { BriefDto, BriefListDto, MonthlyTargetDto } from '@shared/schemas/brief';
import type { PersonDto } from '@shared/schemas/tutorial';
import type { Brief, User } from '../models';
import type { BriefAbilities } from '../policies';

const person = (u: User): PersonDto => ({ id: u.id, name: u.name });

/** A brief as the API shows it, with the caller's abilities. */
export function presentBrief(b: Brief, abilities: BriefAbilities): BriefDto {
  return {
    id: b.id,
    studioId: b.studioId,
    title: b.title,
    maker: b.maker ? person(b.maker) : { id: b.makerId, name: 'A former member' },
    createdBy: b.createdBy ? person(b.createdBy) : null,
    dueDate: b.dueDate,
    features: b.features,
    notes: b.notes,
    tutorial: b.tutorial ? { id: b.tutorial.id, title: b.tutorial.title, state: b.tutorial.state } : null,
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
    abilities: { update: abilities.update, delete: abilities.delete, startTutorial: abilities.startTutorial && !b.tutorial },
  };
}

/** The brief list with whom a brief can go to and what the caller may do. */
export function presentBriefList(rows: { brief: Brief; abilities: BriefAbilities }[], makers: User[], abilities: BriefListDto['abilities']): BriefListDto {
  return { briefs: rows.map((r) => presentBrief(r.brief, r.abilities)), makers: makers.map(person), abilities };
}

export function presentTarget(t: { user: User; perMonth: number | null }): MonthlyTargetDto {
  return { userId: t.user.id, name: t.user.name, perMonth: t.perMonth };
}
