import { describe, expect, it } from 'vitest';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';
import { MAIL_KINDS } from '@shared/schemas/mail-settings';

const app = testApp();

describe('/api/studios/:id/mail-settings', () => {
  it('401 signed out, 400 for an unknown kind or nothing to change, 404 for another studio', async () => {
    const f = await makeStudio(app);
    const url = `/api/studios/${f.studio.id}/mail-settings`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    const c = await f.clientFor('maker');
    expect((await c.put(url, { gossip: false })).status).toBe(400);
    expect((await c.put(url, {})).status).toBe(400);
    expect((await c.put(url, { comments: 'no' })).status).toBe(400);
    expect((await (await f.clientFor('outsider')).get(url)).status).toBe(404);
  });

  it('every kind is on until turned off; changes are per person and per studio', async () => {
    const f = await makeStudio(app);
    const url = `/api/studios/${f.studio.id}/mail-settings`;
    const maker = await f.clientFor('maker');
    const start = (await maker.get(url)).body;
    expect(start.kinds.map((k: { kind: string }) => k.kind)).toEqual([...MAIL_KINDS]);
    expect(start.kinds.every((k: { enabled: boolean }) => k.enabled)).toBe(true);
    const off = (await maker.put(url, { replies: false, mentions: false })).body;
    expect(off.kinds.filter((k: { enabled: boolean }) => !k.enabled).map((k: { kind: string }) => k.kind)).toEqual(['replies', 'mentions']);
    const on = (await maker.put(url, { mentions: true })).body;
    expect(on.kinds.filter((k: { enabled: boolean }) => !k.enabled).map((k: { kind: string }) => k.kind)).toEqual(['replies']);
    // The coordinator's settings are their own.
    expect((await (await f.clientFor('coordinator')).get(url)).body.kinds.every((k: { enabled: boolean }) => k.enabled)).toBe(true);
    // Another studio of the maker's is not touched.
    const g = await makeStudio(app);
    expect((await (await g.clientFor('maker')).get(`/api/studios/${g.studio.id}/mail-settings`)).body.kinds.every((k: { enabled: boolean }) => k.enabled)).toBe(
      true,
    );
  });
});
