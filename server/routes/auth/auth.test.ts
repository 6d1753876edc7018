import { describe, expect, it } from 'vitest';
import bcrypt from 'bcryptjs';
import { OutboxMessage, User } from '@server/models';
import { lastMailTo } from '../../../tests/harness/mail';
import { testApp } from '../../../tests/harness/app';
import { TestClient } from '../../../tests/harness/client';
import { makeUser, TEST_PASSWORD } from '../../../tests/harness/factories';
import { createApp } from '@server/app';

const app = testApp();
const email = () => `${crypto.randomUUID()}@test.example`;

describe('CSRF (OWASP CSRF Prevention: token on state-changing requests)', () => {
  it('refuses a state change without the X-CSRF-Token header with 403', async () => {
    const c = new TestClient(app);
    const res = await c.agent.post('/api/auth/sign-in').send({ email: 'x@example.com', password: 'whatever' });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf');
  });
  it('refuses a token from another session', async () => {
    const a = new TestClient(app);
    const b = new TestClient(app);
    const res = await b.agent
      .post('/api/auth/sign-in')
      .set('X-CSRF-Token', await a.token())
      .send({ email: 'x@example.com', password: 'p' });
    expect(res.status).toBe(403);
  });
});

describe('POST /api/auth/sign-up', () => {
  it('400 with issues for a short password (NIST SP 800-63B-4: at least 15 characters)', async () => {
    const res = await new TestClient(app).post('/api/auth/sign-up', { name: 'Pat', email: email(), password: 'short pass' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'password' })]));
  });
  it('400 for a common password and for one over 72 bytes (bcrypt limit, OWASP Password Storage)', async () => {
    const c = new TestClient(app);
    expect((await c.post('/api/auth/sign-up', { name: 'Pat', email: email(), password: 'passwordpassword' })).status).toBe(400);
    const long = 'é'.repeat(37); // 37 characters but 74 bytes in UTF-8
    const res = await c.post('/api/auth/sign-up', { name: 'Pat', email: email(), password: long });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].message).toMatch(/72 bytes/);
  });
  it('accepts a long password with no composition rules and makes the person owner of a new studio', async () => {
    const c = new TestClient(app);
    const address = email();
    const res = await c.post('/api/auth/sign-up', { name: 'Pat Doe', email: address, password: 'all lower case words here' });
    expect(res.status).toBe(201);
    expect(res.body.studios).toHaveLength(1);
    expect(res.body.studios[0].role).toBe('owner');
    const user = await User.findOne({ where: { email: address } });
    // bcrypt work factor at least 10 (OWASP Password Storage Cheat Sheet)
    expect(bcrypt.getRounds(user!.passwordHash)).toBeGreaterThanOrEqual(10);
    const me = await c.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(address);
  });
  it('409 for an e-mail that already has an account', async () => {
    const u = await makeUser();
    const res = await new TestClient(app).post('/api/auth/sign-up', { name: 'Again', email: u.email, password: TEST_PASSWORD });
    expect(res.status).toBe(409);
  });
});

describe('POST /api/auth/sign-in and sign-out', () => {
  it('401 for a wrong password, same message as an unknown e-mail', async () => {
    const u = await makeUser();
    const a = await new TestClient(app).post('/api/auth/sign-in', { email: u.email, password: 'not the right one at all' });
    const b = await new TestClient(app).post('/api/auth/sign-in', { email: email(), password: 'not the right one at all' });
    expect(a.status).toBe(401);
    expect(b.status).toBe(401);
    expect(a.body.error).toBe(b.body.error);
  });
  it('400 for a malformed body', async () => {
    const res = await new TestClient(app).post('/api/auth/sign-in', { email: 'not-an-email' });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'password']);
  });
  it('signs in with a new session id and HttpOnly, SameSite=Lax cookie (OWASP Session Management)', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    const before = await c.agent.get('/api/auth/csrf');
    const sidBefore = String(before.headers['set-cookie']).match(/cardwright\.sid=([^;]+)/)?.[1];
    const res = await c.signIn(u.email, TEST_PASSWORD);
    expect(res.status).toBe(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const sidAfter = cookie.match(/cardwright\.sid=([^;]+)/)?.[1];
    expect(sidAfter).toBeTruthy();
    expect(sidAfter).not.toBe(sidBefore);
    expect(res.body.csrfToken).toBeTruthy();
    expect((await c.get('/api/auth/me')).status).toBe(200);
  });
  it('sign-out destroys the session', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    await c.signIn(u.email, TEST_PASSWORD);
    expect((await c.post('/api/auth/sign-out')).status).toBe(204);
    expect((await c.get('/api/auth/me')).status).toBe(401);
  });
  it('the session answers 200 for everyone: null for a visitor, the person once signed in', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    const before = await c.get('/api/auth/session');
    expect(before.status).toBe(200);
    expect(before.body).toEqual({ me: null });
    await c.signIn(u.email, TEST_PASSWORD);
    const after = await c.get('/api/auth/session');
    expect(after.status).toBe(200);
    expect(after.body.me.user.email).toBe(u.email);
  });
  it('rate-limits sign-in attempts with 429', async () => {
    const limited = createApp({ rateLimit: { signIn: 3 } });
    const c = new TestClient(limited);
    const statuses = [];
    for (let i = 0; i < 5; i++) statuses.push((await c.post('/api/auth/sign-in', { email: 'nobody@example.com', password: 'wrong wrong wrong' })).status);
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses[4]).toBe(429);
    await limited.close();
  });
  it('counts only refused sign-ins: people signing in from one address one after another are let in', async () => {
    const limited = createApp({ rateLimit: { signIn: 3 } });
    const u = await makeUser();
    const statuses = [];
    for (let i = 0; i < 5; i++) {
      const c = new TestClient(limited);
      statuses.push((await c.post('/api/auth/sign-in', { email: u.email, password: TEST_PASSWORD })).status);
    }
    expect(statuses).toEqual([200, 200, 200, 200, 200]);
    await limited.close();
  });
  it('counts every reset request, since each one sends mail', async () => {
    const limited = createApp({ rateLimit: { signIn: 3 } });
    const c = new TestClient(limited);
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await c.post('/api/auth/reset-request', { email: `nobody${i}@example.com` })).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
    await limited.close();
  });
});

describe('password reset by e-mail', () => {
  it('answers the same for unknown addresses and sends no mail', async () => {
    const address = email();
    const res = await new TestClient(app).post('/api/auth/reset-request', { email: address });
    expect(res.status).toBe(202);
    await new Promise((r) => setTimeout(r, 300));
    expect(await OutboxMessage.count({ where: { to: address } })).toBe(0);
  });
  it('mails a single-use link that sets a new password', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    expect((await c.post('/api/auth/reset-request', { email: u.email })).status).toBe(202);
    const mail = await lastMailTo(u.email);
    const token = mail.text.match(/\/reset\/([\w-]+)/)![1];
    const bad = await c.post('/api/auth/reset', { token, password: 'short' });
    expect(bad.status).toBe(400);
    const ok = await c.post('/api/auth/reset', { token, password: 'a brand new passphrase' });
    expect(ok.status).toBe(200);
    const again = await new TestClient(app).post('/api/auth/reset', { token, password: 'another new passphrase' });
    expect(again.status).toBe(400);
    expect((await new TestClient(app).signIn(u.email, 'a brand new passphrase')).status).toBe(200);
    expect((await new TestClient(app).signIn(u.email, TEST_PASSWORD)).status).toBe(401);
  });
});

describe('POST /api/auth/password (change it while signed in)', () => {
  const NEW = 'a changed passphrase for cards';

  it('401 signed out; 400 naming the field for a wrong current password, a short or common new one, or the same one', async () => {
    const token = await new TestClient(app).token();
    expect(
      (await new TestClient(app).agent.post('/api/auth/password').set('X-CSRF-Token', token).send({ currentPassword: TEST_PASSWORD, password: NEW })).status,
    ).toBe(403);
    const anon = new TestClient(app);
    expect((await anon.post('/api/auth/password', { currentPassword: TEST_PASSWORD, password: NEW })).status).toBe(401);

    const u = await makeUser();
    const c = new TestClient(app);
    await c.signIn(u.email, TEST_PASSWORD);
    const wrong = await c.post('/api/auth/password', { currentPassword: 'not the password at all', password: NEW });
    expect(wrong.status).toBe(400);
    expect(wrong.body.issues).toEqual([{ path: 'currentPassword', message: 'Not your current password' }]);
    // NIST SP 800-63B-4 (at least 15 characters, common ones refused), as at sign-up
    const short = await c.post('/api/auth/password', { currentPassword: TEST_PASSWORD, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.issues[0].path).toBe('password');
    expect((await c.post('/api/auth/password', { currentPassword: TEST_PASSWORD, password: 'passwordpassword' })).status).toBe(400);
    const same = await c.post('/api/auth/password', { currentPassword: TEST_PASSWORD, password: TEST_PASSWORD });
    expect(same.status).toBe(400);
    expect(same.body.issues[0].path).toBe('password');
    // nothing changed: the old password still signs in, and this browser is still signed in
    expect((await new TestClient(app).signIn(u.email, TEST_PASSWORD)).status).toBe(200);
    expect((await c.get('/api/auth/me')).status).toBe(200);
  });

  it('changes it, signs every other session out, and keeps this browser signed in with a new session', async () => {
    const u = await makeUser();
    const elsewhere = new TestClient(app);
    await elsewhere.signIn(u.email, TEST_PASSWORD);
    const c = new TestClient(app);
    await c.signIn(u.email, TEST_PASSWORD);
    const res = await c.post('/api/auth/password', { currentPassword: TEST_PASSWORD, password: NEW });
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(u.email);
    expect(res.body.csrfToken).toEqual(expect.any(String));
    // Its old session ended with the others: it is still signed in only through the new one it was given.
    expect(String(res.headers['set-cookie'])).toContain('cardwright.sid=');
    c.csrf = res.body.csrfToken;
    expect((await c.get('/api/auth/me')).status).toBe(200);
    expect((await c.post('/api/auth/sign-out')).status).toBe(204);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect((await new TestClient(app).signIn(u.email, NEW)).status).toBe(200);
    expect((await new TestClient(app).signIn(u.email, TEST_PASSWORD)).status).toBe(401);
  });
});

describe('GET /api/health', () => {
  it('answers 200 with the database state', async () => {
    const res = await new TestClient(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.database).toBe('up');
  });
  it('unknown API paths answer JSON 404', async () => {
    const res = await new TestClient(app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toBeTruthy();
  });
});
