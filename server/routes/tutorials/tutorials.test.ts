import { describe, expect, it } from 'vitest';
import { Membership, Tutorial } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, makeUser, TEST_PASSWORD } from '../../../tests/harness/factories';
import { TestClient } from '../../../tests/harness/client';

const app = testApp();

describe('POST /api/tutorials', () => {
  it('401 when signed out', async () => {
    const f = await makeStudio(app);
    expect((await (await f.clientFor('anonymous')).post('/api/tutorials', { studioId: f.studio.id, title: 'x' })).status).toBe(401);
  });
  it('400 with issues for a missing title or a malformed studio id', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('maker');
    const res = await c.post('/api/tutorials', { studioId: 'nope' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['studioId', 'title']);
  });
  it('403 for a student', async () => {
    const f = await makeStudio(app);
    expect((await (await f.clientFor('student')).post('/api/tutorials', { studioId: f.studio.id, title: 'x' })).status).toBe(403);
  });
  it('201 with the tutorial, a slug and the caller’s abilities', async () => {
    const f = await makeStudio(app);
    const res = await (await f.clientFor('maker')).post('/api/tutorials', { studioId: f.studio.id, title: 'Pop-up Snowflake Card' });
    expect(res.status).toBe(201);
    expect(res.body.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.body.slug).toBe('pop-up-snowflake-card');
    expect(res.body.state).toBe('draft');
    expect(res.body.abilities).toMatchObject({ read: true, update: true, delete: true });
  });
});

describe('GET /api/studios/:id/tutorials', () => {
  it('students see only published tutorials', async () => {
    const f = await makeStudio(app);
    await Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, title: 'Done', slug: 'done', state: 'published' });
    const staff = await (await f.clientFor('coordinator')).get(`/api/studios/${f.studio.id}/tutorials`);
    const student = await (await f.clientFor('student')).get(`/api/studios/${f.studio.id}/tutorials`);
    expect(staff.body.tutorials).toHaveLength(2);
    expect(student.body.tutorials.map((t: { title: string }) => t.title)).toEqual(['Done']);
    expect(student.body.tutorials[0].abilities.update).toBe(false);
    expect(student.body.abilities.seeAllTutorials).toBe(false);
  });
  it("a student's state filter filters: published finds the published ones, another state finds none", async () => {
    const f = await makeStudio(app);
    await Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, title: 'Done', slug: 'done', state: 'published' });
    const student = await f.clientFor('student');
    const list = async (state: string) =>
      (await student.get(`/api/studios/${f.studio.id}/tutorials?state=${state}`)).body.tutorials.map((t: { title: string }) => t.title);
    expect(await list('published')).toEqual(['Done']);
    expect(await list('draft')).toEqual([]);
    expect(await list('in_review')).toEqual([]);
  });
  it('400 for an unknown state filter', async () => {
    const f = await makeStudio(app);
    expect((await (await f.clientFor('owner')).get(`/api/studios/${f.studio.id}/tutorials?state=lost`)).status).toBe(400);
  });
});

describe('PATCH and DELETE /api/tutorials/:id', () => {
  it('404 for an unknown id, 400 for a malformed one', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('owner');
    expect((await c.get(`/api/tutorials/${crypto.randomUUID()}`)).status).toBe(404);
    expect((await c.get('/api/tutorials/12')).status).toBe(400);
  });
  it('a maker cannot change another maker’s tutorial', async () => {
    const f = await makeStudio(app);
    const other = await makeUser('Second maker');
    await Membership.create({ userId: other.id, studioId: f.studio.id, role: 'maker' });
    const c = new TestClient(app);
    await c.signIn(other.email, TEST_PASSWORD);
    expect((await c.get(`/api/tutorials/${f.tutorial.id}`)).body.abilities.update).toBe(false);
    expect((await c.patch(`/api/tutorials/${f.tutorial.id}`, { title: 'Mine now' })).status).toBe(403);
    expect((await c.delete(`/api/tutorials/${f.tutorial.id}`)).status).toBe(403);
  });
  it('renames, changing the slug of a draft, and deletes', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('maker');
    const res = await c.patch(`/api/tutorials/${f.tutorial.id}`, { title: 'Tri-fold Easel Card', precision: 32 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ title: 'Tri-fold Easel Card', slug: 'tri-fold-easel-card', precision: 32 });
    expect((await c.patch(`/api/tutorials/${f.tutorial.id}`, { precision: 12 })).status).toBe(400);
    expect((await c.patch(`/api/tutorials/${f.tutorial.id}`, {})).status).toBe(400);
    expect((await c.delete(`/api/tutorials/${f.tutorial.id}`)).status).toBe(204);
    expect(await Tutorial.findByPk(f.tutorial.id)).toBeNull();
  });
});

describe('POST /api/tutorials/:id/state (review, T2)', () => {
  it('maker sends for review, a student cannot approve, the coordinator approves and publishes; mail goes out', async () => {
    const { OutboxMessage } = await import('@server/models');
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/state`;
    expect((await (await f.clientFor('anonymous')).post(url, { action: 'submit' })).status).toBe(401);
    expect((await (await f.clientFor('maker')).post(url, { action: 'fly' })).status).toBe(400);
    expect((await (await f.clientFor('maker')).post(url, { action: 'publish' })).status).toBe(409);
    const sent = await (await f.clientFor('maker')).post(url, { action: 'submit' });
    expect(sent.body.state).toBe('in_review');
    expect((await (await f.clientFor('student')).post(url, { action: 'approve' })).status).toBe(403);
    expect((await (await f.clientFor('maker')).post(url, { action: 'approve' })).status).toBe(403);
    expect((await (await f.clientFor('coordinator')).post(url, { action: 'approve' })).body.state).toBe('approved');
    const pub = await (await f.clientFor('coordinator')).post(url, { action: 'publish' });
    expect(pub.body.state).toBe('published');
    expect(pub.body.publishedAt).toBeTruthy();
    for (let i = 0; i < 30 && (await OutboxMessage.count({ where: { to: f.users.maker.email } })) < 2; i++) await new Promise((r) => setTimeout(r, 100));
    expect(await OutboxMessage.count({ where: { to: f.users.maker.email } })).toBe(2);
    expect(await OutboxMessage.count({ where: { to: f.users.coordinator.email } })).toBe(1);
  });
});
