import { describe, expect, it } from 'vitest';
import { DEFAULT_DISCLOSURE } from '@shared/schemas/supply';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';

const app = testApp();

describe('supplies', () => {
  it('401, 400 (bad category, javascript: link), 403 for a student', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/supplies`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    const maker = await f.clientFor('maker');
    const bad = await maker.post(url, { category: 'glitter', name: 'x', url: 'javascript:alert(1)' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['category', 'url']);
    expect((await (await f.clientFor('student')).post(url, { category: 'tool', name: 'Bone folder' })).status).toBe(403);
  });
  it('a sponsored link makes the disclosure required, with a default wording the maker can replace', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/supplies`;
    await maker.post(url, { category: 'cardstock', name: 'Kraft cardstock 12 x 12', quantity: '2 sheets' });
    expect((await maker.get(url)).body.disclosure.required).toBe(false);
    const s = await maker.post(url, {
      category: 'adhesive',
      name: 'Liquid glue',
      url: 'https://shop.example/glue',
      sponsored: true,
      discountCode: 'JUNIPER10',
    });
    expect(s.status).toBe(201);
    const list = await maker.get(url);
    expect(list.body.supplies.map((x: { name: string }) => x.name)).toEqual(['Kraft cardstock 12 x 12', 'Liquid glue']);
    expect(list.body.disclosure).toEqual({ required: true, text: DEFAULT_DISCLOSURE, custom: false });
    const custom = await maker.put(`/api/tutorials/${f.tutorial.id}/disclosure`, { disclosure: 'The shop sent me these supplies.' });
    expect(custom.body).toMatchObject({ text: 'The shop sent me these supplies.', custom: true });
    expect((await maker.patch(`/api/supplies/${s.body.id}`, { sponsored: false })).body.sponsored).toBe(false);
    expect((await (await f.clientFor('outsider')).patch(`/api/supplies/${s.body.id}`, { name: 'x' })).status).toBe(404);
    expect((await maker.delete(`/api/supplies/${s.body.id}`)).status).toBe(204);
  });
});
