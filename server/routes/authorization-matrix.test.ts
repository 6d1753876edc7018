import { describe, expect, it, beforeAll } from 'vitest';
import { Tutorial } from '@server/models';
import { testApp } from '../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../tests/harness/factories';

/**
 * Every route with every role (DESIGN.md, Roles) and an owner of another studio. Outsiders get
 * 404 so ids of other studios do not leak; members without the right role get 403.
 */
const app = testApp();
type Who = 'owner' | 'coordinator' | 'maker' | 'student' | 'outsider' | 'anonymous';
const WHO: Who[] = ['owner', 'coordinator', 'maker', 'student', 'outsider', 'anonymous'];

type Route = {
  name: string;
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: (f: StudioFixture, t: Tutorial) => string;
  body?: (f: StudioFixture) => object;
  expect: Record<Who, number>;
  /** Destructive routes get a fresh tutorial per caller. */
  fresh?: boolean;
};

const ROUTES: Route[] = [
  { name: 'read studio', method: 'get', path: (f) => `/api/studios/${f.studio.id}`, expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 } },
  { name: 'rename studio', method: 'patch', path: (f) => `/api/studios/${f.studio.id}`, body: () => ({ name: 'Renamed' }), expect: { owner: 200, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list tutorials', method: 'get', path: (f) => `/api/studios/${f.studio.id}/tutorials`, expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 } },
  { name: 'list members', method: 'get', path: (f) => `/api/studios/${f.studio.id}/members`, expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 } },
  { name: 'invite', method: 'post', path: (f) => `/api/studios/${f.studio.id}/invitations`, body: () => ({ email: `${crypto.randomUUID()}@test.example`, role: 'maker' }), expect: { owner: 201, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'change a role', method: 'patch', path: (f) => `/api/studios/${f.studio.id}/members/${f.users.student.id}`, body: () => ({ role: 'student' }), expect: { owner: 200, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'create tutorial', method: 'post', path: () => '/api/tutorials', body: (f) => ({ studioId: f.studio.id, title: 'Matrix tutorial' }), expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'read draft tutorial', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'rename tutorial', method: 'patch', path: (_f, t) => `/api/tutorials/${t.id}`, body: () => ({ title: 'Renamed tutorial' }), expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'delete tutorial', method: 'delete', path: (_f, t) => `/api/tutorials/${t.id}`, fresh: true, expect: { owner: 204, coordinator: 403, maker: 204, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list recordings', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/recordings`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list pieces', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/pieces`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'add a piece', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/pieces`, body: () => ({ name: 'Mat', width: '4', height: '5 1/4' }), expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list mentions', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/mentions`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'sheet plan', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/sheet-plan?kits=2`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'add a material', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/materials`, fresh: true, body: () => ({ name: 'vellum', sheetWidth: '8 1/2', sheetHeight: '11' }), expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list supplies', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/supplies`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'add a supply', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/supplies`, body: () => ({ category: 'tool', name: 'Bone folder' }), expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'read the write-up', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/article`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'save the write-up', method: 'put', path: (_f, t) => `/api/tutorials/${t.id}/article`, fresh: true, body: () => ({ version: 0, doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Hello' }] }] } }), expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'list revisions', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/revisions`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'draft (no footage yet)', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/draft`, expect: { owner: 409, coordinator: 409, maker: 409, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'send for review', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/state`, fresh: true, body: () => ({ action: 'submit' }), expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 } },
  { name: 'export a draft’s description', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/export/description.txt`, expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 404 } },
  { name: 'read outbox', method: 'get', path: () => '/api/outbox', expect: { owner: 200, coordinator: 403, maker: 403, student: 403, outsider: 200, anonymous: 401 } },
];

let f: StudioFixture;
beforeAll(async () => {
  f = await makeStudio(app);
});

describe.each(ROUTES)('$name', (route) => {
  it.each(WHO)('as %s', async (who) => {
    const t = route.fresh
      ? await Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, title: 'Doomed', slug: `d-${crypto.randomUUID().slice(0, 8)}` })
      : f.tutorial;
    const c = await f.clientFor(who);
    const url = route.path(f, t);
    const res = route.method === 'get' ? await c.get(url) : await c[route.method](url, route.body?.(f));
    expect(res.status, `${route.method.toUpperCase()} ${url} as ${who}: ${JSON.stringify(res.body)}`).toBe(route.expect[who]);
  });
});
