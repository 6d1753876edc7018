import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CraftClass, Material, Membership, PasswordReset, PieceRow, Recording, Revision, sequelize, Studio, User } from '@server/models';
import { createApp } from '@server/app';
import { storage } from '@server/services/storage';
import { stopQueue } from '@server/jobs';
import { ffmpegMake, tempDir } from '@server/services/media/test-clips';
import { heardEverything } from '@server/services/signed-in-cache';
import { testApp } from '../../tests/harness/app';
import { TestClient } from '../../tests/harness/client';
import { makeStudio, makeUser, TEST_PASSWORD } from '../../tests/harness/factories';
import { lastMailTo } from '../../tests/harness/mail';

const app = testApp();
afterAll(async () => {
  await stopQueue();
});

describe('sessions, invitations and owners', () => {
  it('a password reset signs the account out everywhere else', async () => {
    const f = await makeStudio(app);
    const elsewhere = await f.clientFor('maker');
    expect((await elsewhere.get('/api/auth/me')).status).toBe(200);
    const c = new TestClient(app);
    expect((await c.post('/api/auth/reset-request', { email: f.users.maker.email })).status).toBe(202);
    const token = (await lastMailTo(f.users.maker.email)).text.match(/\/reset\/([\w-]+)/)![1];
    const reset = await c.post('/api/auth/reset', { token, password: 'a brand new passphrase' });
    expect(reset.status).toBe(200);
    // the old session is gone; the one the reset started works
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect((await c.get('/api/auth/me')).status).toBe(200);
  });

  it('an invitation is accepted only by an account with the invited address, or a new account made with it', async () => {
    const f = await makeStudio(app);
    const owner = await f.clientFor('owner');
    const invitee = `${crypto.randomUUID()}@test.example`;
    await owner.post(`/api/studios/${f.studio.id}/invitations`, { email: invitee, role: 'coordinator' });
    const token = (await lastMailTo(invitee)).text.match(/\/invite\/([\w-]+)/)![1];
    // someone else who got hold of the link
    const other = await f.clientFor('outsider');
    const refused = await other.post('/api/invitations/accept', { token });
    expect(refused.status).toBe(403);
    expect(refused.body.error).toContain(invitee);
    expect(await Membership.count({ where: { studioId: f.studio.id, userId: f.outsider.id } })).toBe(0);
    const wrongSignUp = await new TestClient(app).post('/api/auth/sign-up', {
      name: 'Not invited',
      email: `${crypto.randomUUID()}@test.example`,
      password: 'a long enough passphrase',
      invitationToken: token,
    });
    expect(wrongSignUp.status).toBe(400);
    expect(wrongSignUp.body.issues).toEqual([expect.objectContaining({ path: 'email' })]);
    const right = await new TestClient(app).post('/api/auth/sign-up', {
      name: 'Invited',
      email: invitee,
      password: 'a long enough passphrase',
      invitationToken: token,
    });
    expect(right.status).toBe(201);
    expect(right.body.studios).toEqual([expect.objectContaining({ id: f.studio.id, role: 'coordinator' })]);
  });

  it('two owners demoting each other at the same moment leave the studio an owner (row lock)', async () => {
    const f = await makeStudio(app);
    const a = await f.clientFor('owner');
    const b = await f.clientFor('coordinator');
    for (let round = 0; round < 6; round++) {
      await Membership.update({ role: 'owner' }, { where: { studioId: f.studio.id, userId: [f.users.owner.id, f.users.coordinator.id] } });
      const [ra, rb] = await Promise.all([
        a.patch(`/api/studios/${f.studio.id}/members/${f.users.coordinator.id}`, { role: 'maker' }),
        b.patch(`/api/studios/${f.studio.id}/members/${f.users.owner.id}`, { role: 'maker' }),
      ]);
      expect(await Membership.count({ where: { studioId: f.studio.id, role: 'owner' } }), `round ${round}`).toBe(1);
      expect([ra.status, rb.status].filter((s) => s === 200)).toHaveLength(1);
    }
  });
});

describe('media and uploads', () => {
  it('a draft’s media are private, no-store; once published they may be cached publicly', async () => {
    const f = await makeStudio(app);
    const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: 'x.mp4', mime: 'video/mp4', sizeBytes: 1, sourceKey: 'x' });
    const posterKey = `recordings/${rec.id}/poster.jpg`;
    await storage.put(posterKey, Buffer.from([0xff, 0xd8, 0xff, 0xd9]), 'image/jpeg');
    await rec.update({ posterKey, status: 'ready' });
    const draft = await (await f.clientFor('maker')).get(`/media/recordings/${rec.id}/poster.jpg`);
    expect(draft.status).toBe(200);
    expect(draft.headers['cache-control']).toBe('private, no-store');
    await f.tutorial.update({ state: 'published' });
    const open = await new TestClient(app).get(`/media/recordings/${rec.id}/poster.jpg`);
    expect(open.status).toBe(200);
    expect(open.headers['cache-control']).toBe('public, max-age=3600');
  });

  it('keeps a UTF-8 file name as sent', async () => {
    const f = await makeStudio(app);
    const clip = await ffmpegMake(path.join(await tempDir(), 'clip.mp4'), ['-f', 'lavfi', '-i', 'color=c=red:s=160x120:d=1', '-pix_fmt', 'yuv420p']);
    const name = 'Schachtel für Ostern – Teil 1 ✂.mp4';
    const res = await (await f.clientFor('maker')).upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', clip, name);
    expect(res.status).toBe(201);
    expect(res.body.originalName).toBe(name);
  });
});

describe('4xx where a 500 was', () => {
  it('renaming a material to a name in use is a 409 like creating it; huge saidAtMs and position are 400s', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/materials`;
    await maker.post(url, { name: 'kraft', sheetWidth: '12', sheetHeight: '12' });
    const white = await maker.post(url, { name: 'white', sheetWidth: '12', sheetHeight: '12' });
    const rename = await maker.patch(`/api/materials/${white.body.id}`, { name: 'kraft' });
    expect(rename.status).toBe(409);
    expect(rename.body.issues).toEqual([expect.objectContaining({ path: 'name' })]);
    const piece = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Base', width: '4', height: '5', saidAtMs: 2 ** 31 });
    expect(piece.status).toBe(400);
    expect(piece.body.issues).toEqual([expect.objectContaining({ path: 'saidAtMs' })]);
    const ok = await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Base', width: '4', height: '5' });
    expect((await maker.patch(`/api/pieces/${ok.body.id}`, { position: 2 ** 40 })).status).toBe(400);
  });
});

describe('transcript times past the integer column', () => {
  it('refuses a time past 2^31 ms with its line number, in every format (422, not a 500)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: 'x.mp4', mime: 'video/mp4', sizeBytes: 1, sourceKey: 'x', status: 'ready' });
    // 596:31:23 is 2^31 ms and a little more; 600 hours is well past it.
    const files: [string, string, number][] = [
      ['far.vtt', 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\nHello\n\n600:00:00.000 --> 600:00:01.000\nLate\n', 6],
      ['far.srt', '1\n00:00:01,000 --> 00:00:02,000\nHello\n\n2\n596:31:24,000 --> 596:31:25,000\nLate\n', 6],
      ['far.txt', '0:00 Hello\n0:05 Next\n35791:24 Late\n', 3],
    ];
    for (const [name, text, line] of files) {
      const res = await maker.upload(`/api/recordings/${rec.id}/transcript`, 'file', Buffer.from(text), name);
      expect(res.status, name).toBe(422);
      expect(res.body.line, name).toBe(line);
      expect(res.body.error, name).toMatch(new RegExp(`^line ${line}: .*past the longest recording`));
    }
    // Just under the limit still reads (596:31:23.646 is 2^31 - 2 ms).
    const ok = await maker.upload(`/api/recordings/${rec.id}/transcript`, 'file', Buffer.from('0:00 Hello\n596:31:23 Late\n'), 'ok.txt');
    expect(ok.status).toBe(201);
  });
});

describe('same-moment creates', () => {
  it('tutorials with the same title made at once all get their own address (never a 500)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await maker.token();
    const answers = await Promise.all(Array.from({ length: 6 }, () => maker.post('/api/tutorials', { studioId: f.studio.id, title: 'Twin Easel Card' })));
    expect(answers.map((r) => r.status)).toEqual(Array(6).fill(201));
    expect(new Set(answers.map((r) => r.body.slug)).size).toBe(6);
  });

  it('sign-ups with the same e-mail at once: one account, the others a 409 with words', async () => {
    const email = `${crypto.randomUUID()}@test.example`;
    const clients = Array.from({ length: 5 }, () => new TestClient(app));
    await Promise.all(clients.map((c) => c.token()));
    const answers = await Promise.all(clients.map((c, i) => c.post('/api/auth/sign-up', { name: `Twin ${i}`, email, password: 'a long enough passphrase' })));
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409, 409]);
    for (const r of answers.filter((a) => a.status === 409)) {
      expect(r.body.error).toMatch(/already exists/);
      expect(r.body.issues).toEqual([expect.objectContaining({ path: 'email' })]);
    }
  });

  it('sign-ups with the same studio name at once each get a studio with its own address', async () => {
    const studioName = `Paper Lantern ${crypto.randomUUID().slice(0, 8)}`;
    const clients = Array.from({ length: 5 }, () => new TestClient(app));
    await Promise.all(clients.map((c) => c.token()));
    const answers = await Promise.all(
      clients.map((c, i) =>
        c.post('/api/auth/sign-up', { name: `Maker ${i}`, email: `${crypto.randomUUID()}@test.example`, password: 'a long enough passphrase', studioName }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual(Array(5).fill(201));
    expect(new Set(answers.map((r) => r.body.studios[0].slug)).size).toBe(5);
  });

  it('pieces and supplies added at once get distinct positions', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    await maker.token();
    const pieces = await Promise.all(
      Array.from({ length: 8 }, (_, i) => maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: `Layer ${i}`, width: '4', height: '5' })),
    );
    expect(pieces.map((r) => r.status)).toEqual(Array(8).fill(201));
    expect(new Set(pieces.map((r) => r.body.position)).size).toBe(8);
    const supplies = await Promise.all(
      Array.from({ length: 8 }, (_, i) => maker.post(`/api/tutorials/${f.tutorial.id}/supplies`, { name: `Glue ${i}`, category: 'adhesive' })),
    );
    expect(supplies.map((r) => r.status)).toEqual(Array(8).fill(201));
    expect(new Set(supplies.map((r) => r.body.position)).size).toBe(8);
  });
});

const sessionRows = async () => Number(((await sequelize.query('SELECT count(*)::int AS n FROM "session"', { plain: true })) as { n: number }).n);

describe('sessions and CSRF for signed-out forms', () => {
  it('an anonymous GET /api/auth/csrf stores no session row, and signed-out forms still pass the CSRF check', async () => {
    const before = await sessionRows();
    for (let i = 0; i < 5; i++) {
      const res = await new TestClient(app).get('/api/auth/csrf');
      expect(res.status).toBe(200);
      expect(res.body.token).toEqual(expect.any(String));
    }
    expect(await sessionRows()).toBe(before);
    // The signed-out forms with that token: sign-up, reset request, sign-in.
    const u = await makeUser();
    const c = new TestClient(app);
    expect((await c.post('/api/auth/reset-request', { email: u.email })).status).toBe(202);
    expect(
      (await c.post('/api/auth/sign-up', { name: 'New', email: `${crypto.randomUUID()}@test.example`, password: 'a long enough passphrase' })).status,
    ).toBe(201);
    const d = new TestClient(app);
    expect((await d.signIn(u.email, TEST_PASSWORD)).status).toBe(200);
    expect((await d.get('/api/auth/me')).status).toBe(200);
  });

  it('refuses a signed-out form without the token, with another browser’s token, or with a made-up one', async () => {
    const u = await makeUser();
    const mine = new TestClient(app);
    const theirs = new TestClient(app);
    const theirToken = await theirs.token();
    await mine.token();
    const body = { email: u.email, password: TEST_PASSWORD };
    expect((await mine.agent.post('/api/auth/sign-in').send(body)).status).toBe(403);
    const crossed = await mine.agent.post('/api/auth/sign-in').set('X-CSRF-Token', theirToken).send(body);
    expect(crossed.status).toBe(403);
    expect(crossed.body.code).toBe('csrf');
    expect((await mine.agent.post('/api/auth/sign-in').set('X-CSRF-Token', 'x'.repeat(43)).send(body)).status).toBe(403);
    // No cookie at all (a page elsewhere posting a token it somehow learned)
    const bare = await new TestClient(app).agent.post('/api/auth/sign-in').set('X-CSRF-Token', theirToken).send(body);
    expect(bare.status).toBe(403);
  });

  it('after sign-in the signed-out token no longer works; the session’s own does', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    const anonymous = await c.token();
    const signIn = await c.signIn(u.email, TEST_PASSWORD);
    expect(signIn.body.csrfToken).not.toBe(anonymous);
    const stale = await c.agent.post('/api/auth/sign-out').set('X-CSRF-Token', anonymous);
    expect(stale.status).toBe(403);
    expect((await c.get('/api/auth/csrf')).body.token).toBe(signIn.body.csrfToken);
    expect((await c.post('/api/auth/sign-out')).status).toBe(204);
  });

  it('a session ends 30 days after sign-in however active it stayed (absolute lifetime), and its row goes', async () => {
    const u = await makeUser();
    const c = new TestClient(app);
    await c.signIn(u.email, TEST_PASSWORD);
    expect((await c.get('/api/auth/me')).status).toBe(200);
    const rows = () => sequelize.query(`SELECT sid FROM "session" WHERE sess->>'userId' = :id`, { replacements: { id: u.id }, type: 'SELECT' });
    expect(await rows()).toHaveLength(1);
    // 29 days in: still signed in (and still active, so the rolling cookie alone would keep it).
    const ago = (days: number) => Date.now() - days * 24 * 60 * 60_000;
    const setSignedIn = (at: number) =>
      sequelize.query(`UPDATE "session" SET sess = jsonb_set(sess::jsonb, '{signedInAt}', to_jsonb(:at::bigint))::json WHERE sess->>'userId' = :id`, {
        replacements: { id: u.id, at },
      });
    // Each change by hand is heard before asking: the app keeps sessions in memory until told.
    await setSignedIn(ago(29));
    await heardEverything();
    expect((await c.get('/api/auth/me')).status).toBe(200);
    await setSignedIn(ago(31));
    await heardEverything();
    expect((await c.get('/api/auth/me')).status).toBe(401);
    expect(await rows()).toHaveLength(0);
  });
});

describe('trust proxy is a setting, off by default', () => {
  /** Five refused sign-ins, each claiming another forwarded address, against an app with a limit of 3; their statuses. */
  async function forwardedSignIns(overrides: Parameters<typeof createApp>[0]) {
    const app = createApp({ rateLimit: { signIn: 3 }, ...overrides });
    try {
      const c = new TestClient(app);
      const statuses = [];
      for (let i = 0; i < 5; i++) {
        const token = await c.token();
        const res = await c.agent
          .post('/api/auth/sign-in')
          .set('X-CSRF-Token', token)
          .set('X-Forwarded-For', `198.51.100.${i + 1}`)
          .send({ email: 'nobody@example.com', password: 'wrong wrong wrong' });
        statuses.push(res.status);
      }
      return statuses;
    } finally {
      await app.close();
    }
  }

  it('without TRUST_PROXY a made-up X-Forwarded-For does not dodge the sign-in limit', async () => {
    expect(await forwardedSignIns({})).toEqual([401, 401, 401, 429, 429]);
  });

  it('with TRUST_PROXY=loopback (a proxy on this machine) the forwarded address counts', async () => {
    expect(await forwardedSignIns({ config: { trustProxy: 'loopback' } })).toEqual([401, 401, 401, 401, 401]);
  });
});

describe('what a reset request and a sign-up tell a stranger', () => {
  it('a reset request answers before any work, for known and unknown addresses alike', async () => {
    const u = await makeUser();
    // Hold the table the work writes to: a request that did its work first would wait for the lock.
    const t = await sequelize.transaction();
    try {
      await sequelize.query('LOCK TABLE password_resets IN ACCESS EXCLUSIVE MODE', { transaction: t });
      for (const email of [u.email, `${crypto.randomUUID()}@test.example`]) {
        const c = new TestClient(app);
        const token = await c.token();
        const res = await c.agent.post('/api/auth/reset-request').set('X-CSRF-Token', token).timeout(4000).send({ email });
        expect(res.status).toBe(202);
        expect(res.body.message).toMatch(/If that address has an account/);
      }
    } finally {
      await t.rollback();
    }
    // The work runs once the answer is out: the known address gets its link.
    expect((await lastMailTo(u.email)).text).toMatch(/\/reset\//);
    expect(await PasswordReset.count({ where: { userId: u.id } })).toBe(1);
  });

  it('“already registered” answers are rate-limited per address they come from', async () => {
    const limited = createApp({ rateLimit: { signUpTaken: 3 } });
    try {
      const taken = await Promise.all([makeUser(), makeUser(), makeUser(), makeUser()]);
      const c = new TestClient(limited);
      const statuses = [];
      for (const u of taken) statuses.push((await c.post('/api/auth/sign-up', { name: 'Probe', email: u.email, password: 'a long enough passphrase' })).status);
      expect(statuses).toEqual([409, 409, 409, 429]);
      const blocked = await c.post('/api/auth/sign-up', { name: 'Probe', email: `${crypto.randomUUID()}@test.example`, password: 'a long enough passphrase' });
      expect(blocked.status).toBe(429);
      expect(blocked.body.error).toMatch(/wait/);
      // The refused sign-up made nothing.
      expect(await User.count({ where: { name: 'Probe' } })).toBe(0);
    } finally {
      await limited.close();
    }
  });
});

describe('odd lengths stored in the database never break what goes out', () => {
  // Rows written straight through the model, as an old bug, a manual fix or a restore might leave them.
  const odd = {
    huge: '123456789012345678901234567890 in',
    hugeFraction: '1/123456789012345678901234567890 in',
    negative: '-3 in',
    zero: '0 mm',
    garbage: 'twelve-ish',
  };

  it('every output of a published tutorial answers, whatever the stored lengths', async () => {
    const f = await makeStudio(app);
    const t = f.tutorial;
    await Material.create({ tutorialId: t.id, name: 'kraft', sheetWidth: odd.huge, sheetHeight: '12 in' });
    await Material.create({ tutorialId: t.id, name: 'vellum', sheetWidth: odd.zero, sheetHeight: odd.negative });
    //V
    const rows: [string, Partial<PieceRow>][] = [
      ['Huge', { width: odd.huge, height: '4 in', material: 'kraft', quantity: 3, scoreLines: [{ axis: 'width', at: odd.huge }] }],
      ['Tiny', { width: odd.hugeFraction, height: odd.hugeFraction, material: 'vellum' }],
      ['Negative', { width: odd.negative, height: '4 in', shape: 'rounded-rect', params: { cornerRadius: odd.huge } }],
      ['Zero', { width: odd.zero, height: odd.zero, shape: 'circle' }],
      ['Garbage', { width: odd.garbage, height: '4 in', scoreLines: [{ axis: 'height', at: odd.garbage }] }],
      ['Scallops', { width: '4 in', height: odd.huge, shape: 'scalloped-rect', params: { scallopSize: odd.hugeFraction } }],
      ['Box', { width: odd.huge, height: '3 in', shape: 'pillow-box', params: { depth: odd.huge } }],
    ];
    let position = 0;
    for (const [name, r] of rows) await PieceRow.create({ tutorialId: t.id, position: position++, name, width: '1 in', height: '1 in', ...r } as never);
    await t.update({ state: 'published' });
    const studio = await Studio.findByPk(f.studio.id);
    const coordinator = await f.clientFor('coordinator');
    const visitor = new TestClient(app);
    // A class of the tutorial reads the same pieces for its kits and handout.
    const k = await CraftClass.create({
      studioId: f.studio.id,
      tutorialId: t.id,
      title: 'Odd lengths class',
      startsAt: new Date(Date.now() + 7 * 86_400_000),
      durationMinutes: 60,
      place: 'Studio',
      seats: 8,
      kitFeeCents: 0,
      currency: 'USD',
    });
    const urls = [
      `/api/tutorials/${t.id}/materials`,
      `/api/tutorials/${t.id}/mentions`,
      `/api/tutorials/${t.id}/mentionable`,
      `/api/tutorials/${t.id}/assembly`,
      `/api/classes/${k.id}`,
      `/api/classes/${k.id}/kit-plan`,
      `/api/classes/${k.id}/kits.pdf`,
      `/api/classes/${k.id}/handout.pdf`,
      `/api/public/classes/${studio!.slug}/${k.id}`,
      `/api/tutorials/${t.id}/pieces`,
      `/api/tutorials/${t.id}/checks`,
      `/api/tutorials/${t.id}/sheet-plan`,
      `/api/tutorials/${t.id}/sheet-plan?kits=3&spares=1`,
      `/api/tutorials/${t.id}/article/markdown`,
      `/api/tutorials/${t.id}/export/html`,
      `/api/tutorials/${t.id}/export/html?format=json`,
      `/api/tutorials/${t.id}/export/zip`,
      `/api/tutorials/${t.id}/export/handout.pdf?paper=letter`,
      `/api/tutorials/${t.id}/export/handout.pdf?paper=a4`,
      `/api/tutorials/${t.id}/export/template.pdf?paper=letter`,
      `/api/tutorials/${t.id}/export/template.json?paper=a4`,
      `/api/tutorials/${t.id}/export/template.svg?paper=letter&page=1`,
      `/api/tutorials/${t.id}/export/description.txt`,
      `/t/${studio!.slug}/${t.slug}`,
      `/t/${studio!.slug}/${t.slug}/print?paper=a4`,
      `/print/${t.id}?paper=letter`,
    ];
    const failures: string[] = [];
    for (const url of urls) {
      for (const [who, c] of [
        ['coordinator', coordinator],
        ['visitor', visitor],
      ] as const) {
        if (who === 'visitor' && /\/(pieces|checks|sheet-plan|article|materials|mention|assembly)|\/api\/classes/.test(url)) continue;
        const res = await c.get(url).buffer(true);
        if (res.status >= 500) failures.push(`${who} ${url}: ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
      }
    }
    expect(failures).toEqual([]);
    // ... and the class's kits and handout are really made, not refused.
    for (const url of [`/api/classes/${k.id}/kit-plan`, `/api/classes/${k.id}/kits.pdf`, `/api/classes/${k.id}/handout.pdf`, `/api/tutorials/${t.id}/assembly`])
      expect((await coordinator.get(url).buffer(true)).status, url).toBe(200);
    // The maker sees why, piece by piece, and the sheet plan names what it left out.
    const cut = await coordinator.get(`/api/tutorials/${t.id}/pieces`);
    const huge = cut.body.pieces.find((p: { name: string }) => p.name === 'Huge');
    expect(huge.checks).toContainEqual(expect.objectContaining({ code: 'stored-size', field: 'width', severity: 'error' }));
    const garbage = cut.body.pieces.find((p: { name: string }) => p.name === 'Garbage');
    expect(garbage.checks[0].reason).toMatch(/twelve-ish.*Enter it again/);
    const plan = await coordinator.get(`/api/tutorials/${t.id}/sheet-plan`);
    const errors = plan.body.materials.flatMap((m: { errors: { name: string; reason: string }[] }) => m.errors);
    expect(errors).toContainEqual(expect.objectContaining({ name: 'Tiny', reason: expect.stringMatching(/stock sheet size of “vellum” cannot be used/) }));
    expect(errors).toContainEqual(expect.objectContaining({ name: 'Garbage', reason: expect.stringMatching(/cannot be used/) }));
    // Nothing published claims a size it cannot know.
    const blog = await visitor.get(`/api/tutorials/${t.id}/export/html?format=json`);
    expect(blog.body.text).not.toMatch(/Huge|Garbage|Negative/);
  });

  it('the largest and smallest lengths the bounds allow still render every output', async () => {
    const f = await makeStudio(app);
    const t = f.tutorial;
    const maker = await f.clientFor('maker');
    const add = (body: object) => maker.post(`/api/tutorials/${t.id}/pieces`, body);
    expect((await maker.post(`/api/tutorials/${t.id}/materials`, { name: 'roll', sheetWidth: '1000 cm', sheetHeight: '1000 cm' })).status).toBe(201);
    const made = [
      await add({ name: 'Banner', material: 'roll', width: '1000 cm', height: '1000 cm', scoreLines: [{ axis: 'width', at: '9999 mm' }] }),
      await add({ name: 'Garland', width: '1 in', height: '10000 mm' }),
      await add({ name: 'Speck', width: '0.01 mm', height: '0.01 mm' }),
      await add({ name: 'Ring', shape: 'scalloped-circle', width: '1000 cm', params: { scallopSize: '1/2 in' } }),
      await add({ name: 'Frame', shape: 'scalloped-rect', width: '1000 cm', height: '1000 cm', params: { scallopSize: '1/8 in' } }),
    ];
    expect(made.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    await t.update({ state: 'published' });
    const studio = await Studio.findByPk(f.studio.id);
    const urls = [
      `/api/tutorials/${t.id}/pieces`,
      `/api/tutorials/${t.id}/sheet-plan`,
      `/api/tutorials/${t.id}/article/markdown`,
      `/api/tutorials/${t.id}/export/html?format=json`,
      `/api/tutorials/${t.id}/export/handout.pdf?paper=letter`,
      `/api/tutorials/${t.id}/export/template.pdf?paper=letter`,
      `/api/tutorials/${t.id}/export/template.json?paper=a4`,
      `/api/tutorials/${t.id}/export/template.svg?paper=letter&page=1`,
      `/api/tutorials/${t.id}/export/description.txt`,
      `/t/${studio!.slug}/${t.slug}`,
      `/print/${t.id}?paper=letter`,
    ];
    for (const url of urls) expect((await maker.get(url).buffer(true)).status, url).toBe(200);
    // The 10 m square takes too many pages to print in parts: the template says so instead.
    const svg = (await maker.get(`/api/tutorials/${t.id}/export/template.svg?paper=letter&page=1`).buffer(true)).body.toString();
    expect(svg).toMatch(/Banner.*too large to print/);
    const frame = (await maker.get(`/api/tutorials/${t.id}/pieces`)).body.pieces.find((p: { name: string }) => p.name === 'Frame');
    expect(frame.checks).toContainEqual(expect.objectContaining({ code: 'shape-size', reason: expect.stringMatching(/scallops \(at most 4,000\)/) }));
  });
});

describe('lengths are bounded where they are typed', () => {
  it('refuses negative, zero and past-10 m lengths in words on every length field of pieces and materials (400 naming the field)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const pieces = `/api/tutorials/${f.tutorial.id}/pieces`;
    const base = { name: 'Base', width: '4 1/4', height: '5 1/2' };
    const cases: [object, string, RegExp][] = [
      [{ ...base, width: '-3 in' }, 'width', /cannot be negative/],
      [{ ...base, width: '−3 in' }, 'width', /cannot be negative/],
      [{ ...base, height: 'minus three inches' }, 'height', /cannot be negative/],
      [{ ...base, width: '0' }, 'width', /above zero/],
      [{ ...base, height: 'zero inches' }, 'height', /above zero/],
      [{ ...base, width: '12345678901234567890' }, 'width', /at most 10 m/],
      [{ ...base, width: '1001 cm' }, 'width', /at most 10 m/],
      [{ ...base, width: '0.001 mm' }, 'width', /Too small/],
      [{ ...base, scoreLines: [{ axis: 'width', at: '-1' }] }, 'scoreLines.0.at', /cannot be negative/],
      [{ ...base, scoreLines: [{ axis: 'width', at: '0 in' }] }, 'scoreLines.0.at', /above zero/],
      [{ ...base, shape: 'rounded-rect', params: { cornerRadius: '-1/4' } }, 'params.cornerRadius', /cannot be negative/],
      [{ ...base, shape: 'pillow-box', params: { depth: '20000 mm' } }, 'params.depth', /at most 10 m/],
    ];
    for (const [body, field, message] of cases) {
      const res = await maker.post(pieces, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.issues, JSON.stringify(body)).toContainEqual({ path: field, message: expect.stringMatching(message) });
    }
    const ok = await maker.post(pieces, base);
    expect(ok.status).toBe(201);
    const patch = await maker.patch(`/api/pieces/${ok.body.id}`, { width: '-3 in' });
    expect(patch.status).toBe(400);
    expect(patch.body.issues).toContainEqual({ path: 'width', message: expect.stringMatching(/cannot be negative/) });
    expect((await maker.get(pieces)).body.pieces[0].width.display).toBe('4 1/4 in');
    const materials = `/api/tutorials/${f.tutorial.id}/materials`;
    const m = await maker.post(materials, { name: 'kraft', sheetWidth: '12', sheetHeight: '-12' });
    expect(m.status).toBe(400);
    expect(m.body.issues).toContainEqual({ path: 'sheetHeight', message: expect.stringMatching(/cannot be negative/) });
    expect((await maker.post(materials, { name: 'kraft', sheetWidth: '0 mm', sheetHeight: '12' })).body.issues).toContainEqual({
      path: 'sheetWidth',
      message: expect.stringMatching(/above zero/),
    });
  });

  it('a bare number is bounded in the tutorial’s own unit: 400 is 400 mm in a metric tutorial, past 10 m in inches', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const pieces = `/api/tutorials/${f.tutorial.id}/pieces`;
    const inInches = await maker.post(pieces, { name: 'Long', width: '400', height: '1' });
    expect(inInches.status).toBe(400);
    expect(inInches.body.issues).toContainEqual({ path: 'width', message: expect.stringMatching(/at most 10 m/) });
    await f.tutorial.update({ defaultUnit: 'mm' });
    const inMm = await maker.post(pieces, { name: 'Long', width: '400', height: '10' });
    expect(inMm.status).toBe(201);
    expect(inMm.body.width.value).toBe('400 mm');
  });
});

describe('the Markdown export writes only addresses a reader cannot turn into a script or another site', () => {
  const linked = (...hrefs: string[]) => ({
    type: 'doc',
    content: hrefs.map((href, i) => ({ type: 'paragraph', content: [{ type: 'text', text: `link ${i}`, marks: [{ type: 'link', attrs: { href } }] }] })),
  });

  it('keeps the words of entity-encoded script links and drops their address (CommonMark 0.31.2, 6.3: references are decoded in destinations)', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const saved = await maker.put(url, { doc: linked('javascript&colon;alert(1)', 'java&#x73;cript:alert(1)', 'https://shop.example/kraft'), version: 0 });
    expect(saved.status).toBe(200);
    const md = (await maker.get(`${url}/markdown`)).text;
    expect(md).toContain('link 0');
    expect(md).toContain('link 1');
    expect(md).toContain('[link 2](https://shop.example/kraft)');
    expect(md).not.toMatch(/\]\((?!https:\/\/shop\.example)/);
  });

  it('refuses a protocol-relative link ("//host") on save, as the HTML import does, naming it', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const res = await maker.put(`/api/tutorials/${f.tutorial.id}/article`, { doc: linked('//evil.example/steal'), version: 0 });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain('//evil.example/steal');
  });
});

describe('what a student reads of a published tutorial and of the studio', () => {
  it('the published write-up, not its revisions from before; members’ names, never their e-mail addresses', async () => {
    const f = await makeStudio(app);
    const t = f.tutorial;
    const maker = await f.clientFor('maker');
    const para = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
    expect((await maker.put(`/api/tutorials/${t.id}/article`, { doc: para('Secret first wording before review'), version: 0 })).status).toBe(200);
    const older = await Revision.create({ tutorialId: t.id, version: 1, doc: para('Secret first wording before review'), authorId: f.users.maker.id });
    expect((await maker.put(`/api/tutorials/${t.id}/article`, { doc: para('Fold along the score line.'), version: 1 })).status).toBe(200);
    await t.update({ state: 'published', publishedAt: new Date() });

    const student = await f.clientFor('student');
    // The published version, in the reader's view; the workspace's draft (which may hold an
    // update nobody approved yet) is the team's (DESIGN.md T4, C3).
    const published = await student.get(`/api/tutorials/${t.id}/published`);
    expect(published.status).toBe(200);
    expect(JSON.stringify(published.body)).toContain('Fold along the score line.');
    expect(JSON.stringify(published.body)).not.toContain('Secret first wording');
    expect((await student.get(`/api/tutorials/${t.id}/article`)).status).toBe(403);
    expect((await student.get(`/api/tutorials/${t.id}/revisions`)).status).toBe(403);
    expect((await student.get(`/api/revisions/${older.id}`)).status).toBe(403);
    // the team still reads them
    expect((await maker.get(`/api/revisions/${older.id}`)).status).toBe(200);

    const members = await student.get(`/api/studios/${f.studio.id}/members`);
    expect(members.status).toBe(200);
    expect(members.body.members.map((m: { name: string }) => m.name).sort()).toEqual(['Test coordinator', 'Test maker', 'Test owner', 'Test student']);
    expect(members.body.abilities.seeMemberEmails).toBe(false);
    const team = await maker.get(`/api/studios/${f.studio.id}/members`);
    expect(team.body.members.find((m: { name: string }) => m.name === 'Test owner').email).toBe(f.users.owner.email);

    // Nothing a student can read carries another member's address.
    const others = [f.users.owner, f.users.coordinator, f.users.maker].map((u) => u.email);
    const reads = [
      `/api/auth/me`,
      `/api/studios/${f.studio.id}`,
      `/api/studios/${f.studio.id}/members`,
      `/api/studios/${f.studio.id}/tutorials`,
      `/api/studios/${f.studio.id}/classes`,
      `/api/tutorials/${t.id}`,
      `/api/tutorials/${t.id}/article`,
      `/api/tutorials/${t.id}/article/markdown`,
      `/api/tutorials/${t.id}/pieces`,
      `/api/tutorials/${t.id}/supplies`,
      `/api/tutorials/${t.id}/recordings`,
      `/api/tutorials/${t.id}/history`,
      `/api/tutorials/${t.id}/comments`,
      `/api/outbox`,
      `/api/my/classes`,
    ];
    for (const url of reads) {
      const res = await student.get(url);
      const text = res.text ?? JSON.stringify(res.body);
      for (const email of others) expect(text, url).not.toContain(email);
    }
  });
});
