import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Studio, Tutorial } from '@server/models';
import { findStored } from './plain-rows';

// The reference is Sequelize's own findByPk: the plain read must give the same record.
describe('findStored (the plain findByPk of the hot reads)', () => {
  it('reads a studio and a tutorial with every field as findByPk does', async () => {
    const studio = await Studio.create({ name: 'Plain studio', slug: `plain-${randomUUID()}` });
    const tutorial = await Tutorial.create({
      studioId: studio.id,
      title: 'Plain tutorial',
      slug: `p-${randomUUID().slice(0, 8)}`,
      dueDate: '2027-02-14',
      publishAt: new Date('2027-02-10T08:15:00Z'),
      publishTimeZone: 'America/Chicago',
    });
    expect((await findStored(Studio, studio.id))!.get({ plain: true })).toEqual((await Studio.findByPk(studio.id))!.get({ plain: true }));
    const plain = (await findStored(Tutorial, tutorial.id))!.get({ plain: true });
    expect(plain).toEqual((await Tutorial.findByPk(tutorial.id))!.get({ plain: true }));
    expect(plain).toMatchObject({ dueDate: '2027-02-14', publishTimeZone: 'America/Chicago' });
  });

  it('answers null for an unknown id, and its record saves as an update', async () => {
    expect(await findStored(Studio, randomUUID())).toBeNull();
    const studio = await Studio.create({ name: 'Before', slug: `before-${randomUUID()}` });
    const found = (await findStored(Studio, studio.id))!;
    found.name = 'After';
    await found.save();
    expect((await Studio.findByPk(studio.id))!.name).toBe('After');
  });
});
