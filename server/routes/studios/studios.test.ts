import { describe, expect, it } from 'vitest';
import { Invitation, Membership } from '@server/models';
import { lastMailTo } from '../../../tests/harness/mail';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';
import { TestClient } from '../../../tests/harness/client';

const app = testApp();

describe('invitations', () => {
  it('400 for a bad role or e-mail; 409 for someone already a member', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('owner');
    expect((await c.post(`/api/studios/${f.studio.id}/invitations`, { email: 'nope', role: 'boss' })).body.issues).toHaveLength(2);
    expect((await c.post(`/api/studios/${f.studio.id}/invitations`, { email: f.users.maker.email, role: 'maker' })).status).toBe(409);
  });
  it('a new person signs up from the e-mailed link and joins with the offered role', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    const email = `${crypto.randomUUID()}@test.example`;
    expect((await owner.post(`/api/studios/${f.studio.id}/invitations`, { email, role: 'coordinator' })).status).toBe(201);
    const token = (await lastMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1];
    const guest = new TestClient(app);
    const preview = await guest.get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({ email, role: 'coordinator', hasAccount: false, studio: { id: f.studio.id } });
    const res = await guest.post('/api/auth/sign-up', { name: 'New Person', email, password: 'the invitation worked', invitationToken: token });
    expect(res.status).toBe(201);
    expect(res.body.studios).toEqual([expect.objectContaining({ id: f.studio.id, role: 'coordinator' })]);
    expect((await new TestClient(app).get(`/api/invitations/${token}`)).status).toBe(410);
  });
  it('an existing person accepts while signed in', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    await owner.post(`/api/studios/${f.studio.id}/invitations`, { email: f.outsider.email, role: 'maker' });
    const token = (await lastMailTo(f.outsider.email)).text.match(/\/invite\/([\w-]+)/)![1];
    const outsider = await f.clientFor('outsider');
    const res = await outsider.post('/api/invitations/accept', { token });
    expect(res.status).toBe(200);
    expect(await Membership.findOne({ where: { userId: f.outsider.id, studioId: f.studio.id } })).toMatchObject({ role: 'maker' });
  });
  it('inviting an address with an open invitation sends it again: one row, the new role, a new link, the old link dead', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    const email = `${crypto.randomUUID()}@test.example`;
    const first = await owner.post(`/api/studios/${f.studio.id}/invitations`, { email, role: 'student' });
    expect(first.status).toBe(201);
    expect(first.body.resent).toBe(false);
    const oldToken = (await lastMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1];
    const again = await owner.post(`/api/studios/${f.studio.id}/invitations`, { email: email.toUpperCase(), role: 'maker' });
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ id: first.body.id, resent: true, email, role: 'maker' });
    const list = await owner.get(`/api/studios/${f.studio.id}/members`);
    expect(list.body.invitations.filter((i: { email: string }) => i.email === email)).toHaveLength(1);
    const newToken = (await lastMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1];
    expect(newToken).not.toBe(oldToken);
    expect((await new TestClient(app).get(`/api/invitations/${oldToken}`)).status).toBe(404);
    expect((await new TestClient(app).get(`/api/invitations/${newToken}`)).body).toMatchObject({ email, role: 'maker' });
  });
  it('accepting removes every open invitation of that address to the studio', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    await owner.post(`/api/studios/${f.studio.id}/invitations`, { email: f.outsider.email, role: 'maker' });
    const token = (await lastMailTo(f.outsider.email)).text.match(/\/invite\/([\w-]+)/)![1];
    // A second open row for the same address, as a class registration's mail makes one.
    await Invitation.create({
      studioId: f.studio.id,
      email: f.outsider.email,
      role: 'student',
      tokenHash: crypto.randomUUID(),
      expiresAt: new Date(Date.now() + 86_400_000),
    });
    expect((await (await f.clientFor('outsider')).post('/api/invitations/accept', { token })).status).toBe(200);
    expect(await Invitation.count({ where: { studioId: f.studio.id, email: f.outsider.email, acceptedAt: null } })).toBe(0);
    expect((await owner.get(`/api/studios/${f.studio.id}/members`)).body.invitations).toHaveLength(0);
  });
  it('signing up from an invitation removes the other open invitations to the studio', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    const email = `${crypto.randomUUID()}@test.example`;
    await owner.post(`/api/studios/${f.studio.id}/invitations`, { email, role: 'maker' });
    const token = (await lastMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1];
    await Invitation.create({ studioId: f.studio.id, email, role: 'student', tokenHash: crypto.randomUUID(), expiresAt: new Date(Date.now() + 86_400_000) });
    const res = await new TestClient(app).post('/api/auth/sign-up', { name: 'New Person', email, password: 'the invitation worked', invitationToken: token });
    expect(res.status).toBe(201);
    expect((await owner.get(`/api/studios/${f.studio.id}/members`)).body.invitations).toHaveLength(0);
  });
});

describe('members', () => {
  it('the owner changes a role and removes a member; the last owner stays', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('owner');
    expect((await c.patch(`/api/studios/${f.studio.id}/members/${f.users.student.id}`, { role: 'maker' })).body.role).toBe('maker');
    expect((await c.delete(`/api/studios/${f.studio.id}/members/${f.users.student.id}`)).status).toBe(204);
    expect((await c.patch(`/api/studios/${f.studio.id}/members/${f.users.owner.id}`, { role: 'maker' })).status).toBe(409);
    expect((await c.delete(`/api/studios/${f.studio.id}/members/${f.users.owner.id}`)).status).toBe(409);
    expect((await c.delete(`/api/studios/${f.studio.id}/members/${crypto.randomUUID()}`)).status).toBe(404);
  });
  it('lists members; invitations only for the owner', async () => {
    const f = await makeStudio(app);
    await (await f.clientFor('owner')).post(`/api/studios/${f.studio.id}/invitations`, { email: `${crypto.randomUUID()}@test.example`, role: 'student' });
    const asOwner = await (await f.clientFor('owner')).get(`/api/studios/${f.studio.id}/members`);
    const asMaker = await (await f.clientFor('maker')).get(`/api/studios/${f.studio.id}/members`);
    expect(asOwner.body.members).toHaveLength(4);
    expect(asOwner.body.invitations).toHaveLength(1);
    expect(asMaker.body.invitations).toHaveLength(0);
    expect(asMaker.body.abilities.manageMembers).toBe(false);
  });
});
