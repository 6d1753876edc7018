import pg from 'pg';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { config } from '@server/config';
import { testApp } from '../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../tests/harness/factories';
import { statementsDuring } from '../../tests/harness/sql';
import { heardEverything, keptSessions, NotifiedCache, signedInCacheState } from './signed-in-cache';

/**
 * The signed-in session and person kept in memory (issue 16): a signed-in read asks the database
 * only for what it reads, and every change to a session, a person or a membership is heard at once,
 * whether this process made it or another connection did.
 */
const app = testApp();
// (That a signed-in tutorial read is then one statement: routes/public/public-page-cache.test.ts.)
let f: StudioFixture;
// Another connection: a change made by "another process" or by hand, which only the triggers tell of.
const other = new pg.Client({ connectionString: config.databaseUrl });

beforeAll(async () => {
  await other.connect();
  for (let i = 0; i < 100 && !signedInCacheState().listening; i++) await new Promise((r) => setTimeout(r, 50));
  expect(signedInCacheState().listening).toBe(true);
});
afterAll(() => other.end());
beforeEach(async () => {
  f = await makeStudio(app);
});

describe('the signed-in session and person, kept in memory', () => {
  it('a member removed through the API loses access with the next request, and a new role counts at once', async () => {
    const maker = await f.clientFor('maker');
    const owner = await f.clientFor('owner');
    const student = await f.clientFor('student');
    const url = `/api/tutorials/${f.tutorial.id}`;
    expect((await student.get(url)).status).toBe(403); // a draft
    expect((await maker.get(url)).status).toBe(200);
    expect((await owner.patch(`/api/studios/${f.studio.id}/members/${f.users.student.id}`, { role: 'coordinator' })).status).toBe(200);
    expect((await student.get(url)).status).toBe(200);
    expect((await owner.delete(`/api/studios/${f.studio.id}/members/${f.users.maker.id}`)).status).toBe(204);
    expect((await maker.get(url)).status).toBe(404);
  });

  it('a change made on another connection is heard: a role lowered, a person renamed, a session ended', async () => {
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}`;
    expect((await maker.get(url)).status).toBe(200);
    expect((await maker.get('/api/auth/me')).status).toBe(200);

    await other.query(`UPDATE memberships SET role = 'student' WHERE user_id = $1`, [f.users.maker.id]);
    await heardEverything();
    expect((await maker.get(url)).status).toBe(403);

    await other.query(`UPDATE users SET name = 'Renamed by hand' WHERE id = $1`, [f.users.maker.id]);
    await heardEverything();
    const me = await maker.get('/api/auth/me');
    expect(JSON.stringify(me.body)).toContain('Renamed by hand');

    const sessionsBefore = keptSessions.size;
    await other.query(`DELETE FROM "session" WHERE sess->>'userId' = $1`, [f.users.maker.id]);
    await heardEverything();
    expect(keptSessions.size).toBeLessThan(sessionsBefore);
    expect((await maker.get('/api/auth/me')).status).toBe(401);
  });

  it('a studio list sends one statement (the list): the studio comes with the signed-in person, and a renamed studio is heard', async () => {
    const maker = await f.clientFor('maker');
    const owner = await f.clientFor('owner');
    const url = `/api/studios/${f.studio.id}`;
    expect((await maker.get(`${url}/tutorials`)).status).toBe(200);
    await heardEverything(); // the sign-in's own notification, which forgets the session once more
    const sql = await statementsDuring(async () => expect((await maker.get(`${url}/tutorials`)).status).toBe(200));
    expect(sql, sql.join('\n')).toHaveLength(1);
    // Outsiders are answered without asking the database, with the same 404 as before.
    const outsider = await f.clientFor('outsider');
    expect((await outsider.get(url)).status).toBe(404);
    await heardEverything();
    expect(await statementsDuring(async () => expect((await outsider.get(url)).status).toBe(404))).toEqual([]);

    expect((await owner.patch(url, { name: 'Renamed through the app' })).status).toBe(200);
    expect((await maker.get(url)).body.name).toBe('Renamed through the app');
    await other.query(`UPDATE studios SET name = 'Renamed by hand' WHERE id = $1`, [f.studio.id]);
    await heardEverything();
    expect((await maker.get(url)).body.name).toBe('Renamed by hand');
  });

  it('a password reset signs the person out everywhere at once (sessions ended by one statement)', async () => {
    const maker = await f.clientFor('maker');
    expect((await maker.get('/api/auth/me')).status).toBe(200);
    const { endSessionsOf } = await import('./accounts');
    await endSessionsOf(f.users.maker.id);
    expect((await maker.get('/api/auth/me')).status).toBe(401);
  });
});

describe('NotifiedCache', () => {
  it('forgets every entry a test picks, however many, and keeps the rest', () => {
    const kept = new NotifiedCache<{ n: number }>();
    kept.setListening(true);
    for (let n = 0; n < 50; n++) kept.keep(`k${n}`, { n }, kept.mark());
    kept.forgetWhere((v) => v.n % 2 === 1);
    expect(kept.size).toBe(25);
    for (let n = 0; n < 50; n++) expect(kept.get(`k${n}`)?.n).toBe(n % 2 === 0 ? n : undefined);
  });
});
