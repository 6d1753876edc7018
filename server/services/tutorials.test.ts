import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Op, type WhereOptions } from 'sequelize';
import { Studio, Tutorial, User } from '@server/models';
import { makeUser } from '../../tests/harness/factories';
import { findTutorialWithAuthor, listTutorials } from './tutorials';

// The reference is Sequelize's own finder with an include: the plain reads must give the same records.
const reference = (where: WhereOptions<Tutorial>) =>
  Tutorial.findAll({ where, include: [{ model: User, as: 'author', attributes: ['id', 'name'] }], order: [['updatedAt', 'DESC']] });
const shape = (ts: Tutorial[]) =>
  ts.map((t) => {
    const { author: _author, ...attributes } = t.get({ plain: true }) as Record<string, unknown>;
    return { ...attributes, author: t.author ? { id: t.author.id, name: t.author.name } : null };
  });

async function studioWithTutorials() {
  const studio = await Studio.create({ name: 'Plain reads', slug: `plain-${randomUUID()}` });
  const maker = await makeUser('Maker of three');
  const make = (title: string, extra: Partial<Tutorial> = {}) =>
    Tutorial.create({ studioId: studio.id, authorId: maker.id, title, slug: `s-${randomUUID().slice(0, 8)}`, ...extra });
  await make('Gift bag 100% recycled_kraft', { dueDate: '2026-12-24' });
  await make('Shutter card', { state: 'published', publishedAt: new Date('2026-11-30T10:00:00Z') });
  await make('Orphaned tag', { authorId: null, publishAt: new Date('2027-01-05T09:30:00Z'), publishTimeZone: 'Europe/London' });
  return { studio, maker };
}

describe('the plain reads of tutorials (every signed-in read of a tutorial or a studio list)', () => {
  it('list the same tutorials, fields and authors as Sequelize’s finder, newest change first', async () => {
    const { studio } = await studioWithTutorials();
    expect(shape(await listTutorials(studio, { seeAll: true }))).toEqual(shape(await reference({ studioId: studio.id })));
    expect(shape(await listTutorials(studio, { seeAll: false }))).toEqual(shape(await reference({ studioId: studio.id, state: 'published' })));
  });

  it('filter by state and by words, with LIKE’s own characters taken literally', async () => {
    const { studio } = await studioWithTutorials();
    const titles = async (o: Parameters<typeof listTutorials>[1]) => (await listTutorials(studio, o)).map((t) => t.title);
    expect(await titles({ seeAll: true, q: '100%' })).toEqual(['Gift bag 100% recycled_kraft']);
    expect(await titles({ seeAll: true, q: '_kraft' })).toEqual(['Gift bag 100% recycled_kraft']);
    expect(await titles({ seeAll: true, q: '%' })).toEqual(['Gift bag 100% recycled_kraft']);
    expect(await titles({ seeAll: true, q: 'CARD' })).toEqual(['Shutter card']);
    expect(await titles({ seeAll: true, state: 'draft', q: 'card' })).toEqual([]);
    expect(await titles({ seeAll: false, state: 'draft' })).toEqual([]);
    expect(shape(await listTutorials(studio, { seeAll: true, q: 'tag' }))).toEqual(
      shape(await reference({ studioId: studio.id, title: { [Op.iLike]: '%tag%' } })),
    );
  });

  it('read one tutorial with its author as the finder does, a missing author as none, an unknown id as null', async () => {
    const { studio } = await studioWithTutorials();
    for (const t of await reference({ studioId: studio.id })) expect(shape([(await findTutorialWithAuthor(t.id))!])).toEqual(shape([t]));
    expect(await findTutorialWithAuthor(randomUUID())).toBeNull();
  });

  it('give stored records: a change saves as an update', async () => {
    const { studio } = await studioWithTutorials();
    const [first] = await listTutorials(studio, { seeAll: true });
    first!.title = 'Renamed';
    await first!.save();
    expect((await Tutorial.findByPk(first!.id))!.title).toBe('Renamed');
    expect(await Tutorial.count({ where: { studioId: studio.id } })).toBe(3);
  });
});
