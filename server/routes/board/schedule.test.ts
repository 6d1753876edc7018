import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { Membership, sequelize, StateChange, Tutorial } from '@server/models';
import { runScheduledPublish, formatPublishTime } from '@server/services/schedule';
import { QUEUES } from '@server/jobs/queue';
import { mailTo, mailsTo } from '../../../tests/harness/mail';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();

const inHours = (h: number) => new Date(Date.now() + h * 3_600_000);

async function approved(f: StudioFixture) {
  await f.tutorial.update({ state: 'approved' });
  return f.tutorial;
}

/** The queue's row for a job (pg-boss keeps them in its own schema). */
async function job(id: string) {
  const [row] = await sequelize.query<{ state: string; start_after: Date; data: { tutorialId: string; at: string } }>(
    `SELECT state, start_after, data FROM pgboss.job WHERE name = :name AND id = :id`,
    { replacements: { name: QUEUES.publishTutorial, id }, type: QueryTypes.SELECT },
  );
  return row;
}

describe('scheduled publishing', () => {
  it('401, 400 for a bad or past time or zone, 403 for makers and students, 404 for outsiders, 409 unless approved', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/schedule`;
    const body = { at: inHours(48).toISOString(), timeZone: 'America/Chicago' };
    expect((await (await f.clientFor('anonymous')).put(url, body)).status).toBe(401);
    const coord = await f.clientFor('coordinator');
    expect((await coord.put(url, body)).status).toBe(409);
    await approved(f);
    const bad = await coord.put(url, { at: 'next Tuesday', timeZone: 'Nowhere/Special' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['at', 'timeZone']);
    const past = await coord.put(url, { ...body, at: inHours(-1).toISOString() });
    expect(past.status).toBe(400);
    expect(past.body.issues).toEqual([{ path: 'at', message: 'Pick a time in the future' }]);
    expect((await coord.put(url, { ...body, at: inHours(24 * 400).toISOString() })).body.issues[0].message).toBe('Pick a time within a year');
    expect((await (await f.clientFor('maker')).put(url, body)).status).toBe(403);
    expect((await (await f.clientFor('student')).put(url, body)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).put(url, body)).status).toBe(404);
    expect((await Tutorial.findByPk(f.tutorial.id))!.publishAt).toBeNull();
  });

  it('a coordinator schedules an approved tutorial: the time and its zone are kept and a queue job waits for it', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const at = new Date(Math.ceil(inHours(30).getTime() / 60_000) * 60_000);
    // the instant written with an offset of -06:00, as a browser west of Greenwich may send it (ISO 8601)
    const withOffset = `${new Date(at.getTime() - 6 * 3_600_000).toISOString().slice(0, 19)}-06:00`;
    const res = await (await f.clientFor('coordinator')).put(`/api/tutorials/${f.tutorial.id}/schedule`, { at: withOffset, timeZone: 'America/Chicago' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ state: 'approved', publishAt: at.toISOString(), publishTimeZone: 'America/Chicago' });
    const t = (await Tutorial.findByPk(f.tutorial.id))!;
    expect(t.publishScheduledById).toBe(f.users.coordinator.id);
    const j = await job(t.publishJobId!);
    expect(j).toMatchObject({ state: 'created', data: { tutorialId: t.id, at: at.toISOString() } });
    expect(j!.start_after.getTime()).toBe(at.getTime());
  });

  it('rescheduling replaces the job; cancelling withdraws it; a send-back ends the schedule', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const coord = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/schedule`;
    await coord.put(url, { at: inHours(5).toISOString(), timeZone: 'UTC' });
    const first = (await Tutorial.findByPk(f.tutorial.id))!.publishJobId!;
    const later = inHours(9);
    expect((await coord.put(url, { at: later.toISOString(), timeZone: 'Asia/Tokyo' })).body).toMatchObject({
      publishAt: later.toISOString(),
      publishTimeZone: 'Asia/Tokyo',
    });
    const second = (await Tutorial.findByPk(f.tutorial.id))!.publishJobId!;
    expect(second).not.toBe(first);
    expect((await job(first))!.state).toBe('cancelled');
    expect((await job(second))!.state).toBe('created');

    expect((await (await f.clientFor('maker')).delete(url)).status).toBe(403);
    const cancelled = await coord.delete(url);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body).toMatchObject({ publishAt: null, publishTimeZone: null, state: 'approved' });
    expect((await job(second))!.state).toBe('cancelled');

    await coord.put(url, { at: inHours(5).toISOString(), timeZone: 'UTC' });
    const back = await coord.post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'sendBack', note: 'One more photo of the lid' });
    expect(back.body).toMatchObject({ state: 'needs_changes', publishAt: null });
  });

  it('the job publishes as the person who scheduled it and e-mails the maker and them, once', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const at = new Date('2027-01-20T08:00:00Z');
    await f.tutorial.update({ publishAt: at, publishTimeZone: 'Europe/Berlin', publishScheduledById: f.users.coordinator.id });
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() })).toBe('published');
    const t = (await Tutorial.findByPk(f.tutorial.id))!;
    expect(t.state).toBe('published');
    expect(t.publishedAt).not.toBeNull();
    expect(t.publishAt).toBeNull();
    // 08:00 UTC is 09:00 in Berlin in January (CET, UTC+1: IANA tz database)
    expect(formatPublishTime(at, 'Europe/Berlin')).toBe('Wednesday, 20 January 2027, 09:00 (Europe/Berlin)');
    for (const u of [f.users.maker, f.users.coordinator]) {
      const m = await mailTo(u.email, /is published/);
      expect(m.subject).toBe('“Test tutorial” is published');
      expect(m.text).toContain('went out as scheduled for Wednesday, 20 January 2027, 09:00 (Europe/Berlin)');
      expect(m.text).toContain(`/tutorials/${t.id}/publish`);
      expect(m.text).toContain(`/t/${f.studio.slug}/${t.slug}`);
    }
    // a second run (a retried job) does nothing and sends nothing
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() })).toBe('skipped');
    expect(await mailsTo(f.users.maker.email)).toHaveLength(1);
    expect(await mailsTo(f.users.owner.email)).toHaveLength(0);
  });

  it('the maker who turned scheduled-publish e-mails off gets none; the scheduler still does', async () => {
    const f = await makeStudio(app);
    await approved(f);
    await (await f.clientFor('maker')).put(`/api/studios/${f.studio.id}/mail-settings`, { scheduledPublish: false });
    const at = inHours(-0.01);
    await f.tutorial.update({ publishAt: at, publishTimeZone: 'UTC', publishScheduledById: f.users.coordinator.id });
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() })).toBe('published');
    await mailTo(f.users.coordinator.email, /is published/);
    expect(await mailsTo(f.users.maker.email)).toHaveLength(0);
  });

  it('the move is kept in the tutorial’s history as made by the scheduler, with a note saying so', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const at = new Date('2027-05-04T16:30:00Z');
    await f.tutorial.update({ publishAt: at, publishTimeZone: 'America/New_York', publishScheduledById: f.users.owner.id });
    await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() });
    const [move] = await StateChange.findAll({ where: { tutorialId: f.tutorial.id }, order: [['createdAt', 'DESC']] });
    // 16:30 UTC is 12:30 in New York in May (EDT, UTC-4: IANA tz database)
    expect(move).toMatchObject({
      byId: f.users.owner.id,
      fromState: 'approved',
      toState: 'published',
      note: 'Published as scheduled for Tuesday, 4 May 2027, 12:30 (America/New_York)',
    });
  });

  it('a job for a time that no longer stands, or a tutorial no longer approved, does nothing', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const at = inHours(2);
    await f.tutorial.update({ publishAt: at, publishTimeZone: 'UTC', publishScheduledById: f.users.coordinator.id });
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: inHours(1).toISOString() })).toBe('skipped');
    await f.tutorial.update({ state: 'needs_changes' });
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() })).toBe('skipped');
    expect((await Tutorial.findByPk(f.tutorial.id))!.state).toBe('needs_changes');
  });

  it('if the person who scheduled it may no longer publish, it stays approved and they and the maker are told', async () => {
    const f = await makeStudio(app);
    await approved(f);
    const at = inHours(-0.01);
    await f.tutorial.update({ publishAt: at, publishTimeZone: 'UTC', publishScheduledById: f.users.coordinator.id });
    await Membership.update({ role: 'maker' }, { where: { studioId: f.studio.id, userId: f.users.coordinator.id } });
    expect(await runScheduledPublish({ tutorialId: f.tutorial.id, at: at.toISOString() })).toBe('refused');
    expect((await Tutorial.findByPk(f.tutorial.id))!.state).toBe('approved');
    expect((await mailTo(f.users.maker.email, /did not go out/)).text).toContain('may no longer publish');
    expect((await mailTo(f.users.coordinator.email, /did not go out/)).subject).toBe('“Test tutorial” did not go out as scheduled');
  });
});
