import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import type { Role } from '@shared/schemas/roles';
import { Membership, Studio, Tutorial, User } from '@server/models';
import { hashPassword } from '@server/services/passwords';
import { TestClient } from './client';

export const TEST_PASSWORD = 'a long test passphrase';
let hash: Promise<string> | null = null;

/** A person with a known password (hashed once per test file to keep bcrypt cost down). */
export async function makeUser(name = 'Test person') {
  hash ??= hashPassword(TEST_PASSWORD);
  return User.create({ email: `${randomUUID()}@test.example`, name, passwordHash: await hash });
}

export type StudioFixture = {
  studio: Studio;
  users: Record<Role, User>;
  outsider: User;
  tutorial: Tutorial;
  clientFor: (who: Role | 'outsider' | 'anonymous') => Promise<TestClient>;
};

/**
 * A fresh studio per test with one person in each role, an outsider who owns another studio,
 * and a draft tutorial made by the maker. No truncation between tests.
 */
export async function makeStudio(app: Express): Promise<StudioFixture> {
  const studio = await Studio.create({ name: 'Test studio', slug: `test-${randomUUID()}` });
  const users = {} as Record<Role, User>;
  for (const role of ['owner', 'coordinator', 'maker', 'student'] as Role[]) {
    users[role] = await makeUser(`Test ${role}`);
    await Membership.create({ userId: users[role].id, studioId: studio.id, role });
  }
  const outsider = await makeUser('Outsider');
  const other = await Studio.create({ name: 'Other studio', slug: `other-${randomUUID()}` });
  await Membership.create({ userId: outsider.id, studioId: other.id, role: 'owner' });
  const tutorial = await Tutorial.create({ studioId: studio.id, authorId: users.maker.id, title: 'Test tutorial', slug: `t-${randomUUID().slice(0, 8)}` });
  const clients = new Map<string, TestClient>();
  const clientFor = async (who: Role | 'outsider' | 'anonymous') => {
    const cached = clients.get(who);
    if (cached) return cached;
    const c = new TestClient(app);
    if (who !== 'anonymous') {
      const user = who === 'outsider' ? outsider : users[who];
      const res = await c.signIn(user.email, TEST_PASSWORD);
      if (res.status !== 200) throw new Error(`sign-in failed for ${who}: ${res.status}`);
    }
    clients.set(who, c);
    return c;
  };
  return { studio, users, outsider, tutorial, clientFor };
}
