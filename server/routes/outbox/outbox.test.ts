import { describe, expect, it } from 'vitest';
import type { Request } from 'express';
import request from 'supertest';
import { OutboxMessage } from '@server/models';
import { config } from '@server/config';
import { testApp } from '../../../tests/harness/app';
import { TestClient } from '../../../tests/harness/client';
import { makeStudio } from '../../../tests/harness/factories';
import { lastMailTo } from '../../../tests/harness/mail';
import { devMailAllowed } from '../dev-mail/dev-mail.router';

const app = testApp();

/** A caught message as the fake SMTP server stores it. */
const caught = (to: string, subject = 'A message') =>
  OutboxMessage.create({ messageId: null, from: 'studio@cardwright.local', to, recipients: [to.toLowerCase()], subject, text: `Hello ${to}`, html: null });

describe('Outbox: each person reads only mail addressed to them', () => {
  it('401 signed out', async () => {
    const c = new TestClient(app);
    expect((await c.get('/api/outbox')).status).toBe(401);
    expect((await c.get(`/api/outbox/${crypto.randomUUID()}`)).status).toBe(401);
  });

  it('an owner of one studio cannot list, read, follow or delete a reset link mailed to another studio’s owner', async () => {
    const f = await makeStudio(app);
    // The attack: a stranger with a studio of their own asks for a reset of this studio's owner.
    const stranger = await f.clientFor('outsider');
    expect((await stranger.post('/api/auth/reset-request', { email: f.users.owner.email })).status).toBe(202);
    const mail = await lastMailTo(f.users.owner.email);
    expect(mail.recipients).toEqual([f.users.owner.email]);

    const list = await stranger.get('/api/outbox');
    expect(list.status).toBe(200);
    expect(list.body.messages.map((m: { id: string }) => m.id)).not.toContain(mail.id);
    expect(JSON.stringify(list.body)).not.toContain('/reset/');
    expect((await stranger.get(`/api/outbox/${mail.id}`)).status).toBe(404);
    expect((await stranger.delete(`/api/outbox/${mail.id}`)).status).toBe(404);
    // "clear my mail" clears only the caller's own
    expect((await stranger.delete('/api/outbox')).status).toBe(204);
    expect(await OutboxMessage.findByPk(mail.id)).not.toBeNull();

    // the owner reads their own reset mail, and may delete it
    const owner = await f.clientFor('owner');
    const own = await owner.get('/api/outbox');
    expect(own.body.messages.map((m: { id: string }) => m.id)).toContain(mail.id);
    const read = await owner.get(`/api/outbox/${mail.id}`);
    expect(read.status).toBe(200);
    expect(read.body.message.text).toContain('/reset/');
    expect((await owner.delete(`/api/outbox/${mail.id}`)).status).toBe(204);
    expect(await OutboxMessage.findByPk(mail.id)).toBeNull();
  });

  it('an invitation is listed for nobody but the invited address; every role reads its own mail', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    const invitee = `${crypto.randomUUID()}@test.example`;
    expect((await owner.post(`/api/studios/${f.studio.id}/invitations`, { email: invitee, role: 'maker' })).status).toBe(201);
    const inv = await lastMailTo(invitee);
    for (const who of ['owner', 'coordinator', 'maker', 'student', 'outsider'] as const) {
      const c = await f.clientFor(who);
      const res = await c.get('/api/outbox');
      expect(res.status, who).toBe(200);
      expect(res.body.messages.map((m: { id: string }) => m.id)).not.toContain(inv.id);
      expect((await c.get(`/api/outbox/${inv.id}`)).status, who).toBe(404);
    }
    const mine = await caught(f.users.student.email.toUpperCase(), 'For the student');
    const student = await f.clientFor('student');
    expect((await student.get('/api/outbox')).body.messages.map((m: { subject: string }) => m.subject)).toEqual(['For the student']);
    expect((await student.get(`/api/outbox/${mine.id}`)).status).toBe(200);
    expect((await student.get('/api/auth/me')).body.outbox).toBe(true);
  });

  it('is gone when a real mail server is set', async () => {
    const real = testApp({ config: { mail: { ...config.mail, fake: false } } });
    const f = await makeStudio(real);
    const owner = await f.clientFor('owner');
    expect((await owner.get('/api/outbox')).status).toBe(404);
    expect((await owner.get('/api/auth/me')).body).toMatchObject({ outbox: false, devMailbox: false });
    expect((await request(real).get('/dev/mail')).status).toBe(404);
  });
});

describe('the development mailbox at /dev/mail: all caught mail, loopback only, never in production', () => {
  it('shows every address’s mail to a loopback request, with no sign-in and no studio role', async () => {
    const m = await caught(`${crypto.randomUUID()}@test.example`, 'Visible on this machine <b>only</b>');
    const list = await request(app).get('/dev/mail');
    expect(list.status).toBe(200);
    expect(list.headers['cache-control']).toBe('no-store');
    // escaped, never rendered as markup
    expect(list.text).toContain('Visible on this machine &#60;b&#62;only&#60;/b&#62;');
    const one = await request(app).get(`/dev/mail/${m.id}`);
    expect(one.status).toBe(200);
    expect(one.text).toContain(`Hello ${m.to}`);
    expect((await request(app).get(`/dev/mail/${crypto.randomUUID()}`)).status).toBe(404);
  });

  it('answers 404 through a proxy, to a foreign Host (DNS rebinding), in production, and to a remote address', async () => {
    expect((await request(app).get('/dev/mail').set('X-Forwarded-For', '203.0.113.9')).status).toBe(404);
    expect((await request(app).get('/dev/mail').set('Forwarded', 'for=203.0.113.9')).status).toBe(404);
    expect((await request(app).get('/dev/mail').set('Host', 'attacker.example')).status).toBe(404);
    const prod = testApp({ config: { env: 'production' } });
    expect((await request(prod).get('/dev/mail')).status).toBe(404);
    const f = await makeStudio(app);
    expect((await (await f.clientFor('owner')).get('/api/auth/me')).body.devMailbox).toBe(true);
    // a connection from another machine (the socket's own address, not a header)
    const remote = { socket: { remoteAddress: '192.0.2.7' }, get: (h: string) => (h === 'host' ? '127.0.0.1:3000' : undefined) } as unknown as Request;
    const local = { socket: { remoteAddress: '::ffff:127.0.0.1' }, get: (h: string) => (h === 'host' ? 'localhost:3000' : undefined) } as unknown as Request;
    expect(devMailAllowed(remote, { env: 'development', mail: config.mail })).toBe(false);
    expect(devMailAllowed(local, { env: 'development', mail: config.mail })).toBe(true);
  });
});
