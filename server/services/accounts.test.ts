import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Membership, Studio, User } from '@server/models';
import { makeUser } from '../../tests/harness/factories';
import { findSignedInUser } from './accounts';

const studio = (name: string) => Studio.create({ name, slug: `${name.toLowerCase().replace(/\s+/g, '-')}-${randomUUID()}` });

describe('findSignedInUser (the person and their roles read on every request)', () => {
  it('gives the same person and roles as Sequelize’s own findByPk with include (the reference)', async () => {
    const user = await makeUser('Two studios');
    const [a, b] = [await studio('Paper shop'), await studio('Card club')];
    await Membership.create({ userId: user.id, studioId: a.id, role: 'owner' });
    await Membership.create({ userId: user.id, studioId: b.id, role: 'student' });

    const found = await findSignedInUser(user.id);
    const reference = await User.findByPk(user.id, { include: [{ model: Membership, as: 'memberships', attributes: ['id', 'studioId', 'role'] }] });

    expect(found!.get({ plain: true })).toMatchObject({
      id: reference!.id,
      email: reference!.email,
      name: reference!.name,
      passwordHash: reference!.passwordHash,
      createdAt: reference!.createdAt,
      updatedAt: reference!.updatedAt,
    });
    const roles = (ms: readonly Membership[]) => ms.map((m) => ({ id: m.id, studioId: m.studioId, role: m.role })).sort((x, y) => x.id.localeCompare(y.id));
    expect(roles(found!.memberships!)).toEqual(roles(reference!.memberships!));
    expect(found!.memberships).toHaveLength(2);
    // Each membership carries its studio, every field as Sequelize's findByPk reads it (dates as Dates).
    for (const m of found!.memberships!) {
      const reference = await Studio.findByPk(m.studioId);
      expect(m.studio!.get({ plain: true })).toEqual(reference!.get({ plain: true }));
      expect(m.studio!.createdAt).toBeInstanceOf(Date);
    }
  });

  it('gives an empty list of roles to a person in no studio, and null for an unknown id', async () => {
    const user = await makeUser('No studio');
    expect((await findSignedInUser(user.id))!.memberships).toEqual([]);
    expect(await findSignedInUser(randomUUID())).toBeNull();
  });

  it('is a stored record: a change saves as an update of the same row', async () => {
    const user = await makeUser('Renamed');
    const found = (await findSignedInUser(user.id))!;
    found.name = 'Renamed again';
    await found.save();
    expect((await User.findByPk(user.id))!.name).toBe('Renamed again');
    expect(await User.count({ where: { id: user.id } })).toBe(1);
  });
});
