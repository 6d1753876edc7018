import { describe, expect, it } from 'vitest';
import { Brief, Tutorial } from '@server/models';
import { mailTo, mailsTo } from '../../../tests/harness/mail';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, makeUser } from '../../../tests/harness/factories';
import { Membership } from '@server/models';

const app = testApp();

// Scenario of our own: a shop's coordinator asks a maker for an easel card with the new floral papers.
const brief = (makerId: string) => ({
  title: 'Easel card with the spring florals',
  makerId,
  dueDate: '2027-01-20',
  features: 'Spring Florals 6x6 paper pad\nKraft cardstock, 80 lb\n',
  notes: 'Show the fold up close.',
});

describe('briefs', () => {
  it('401 signed out; 400 names each bad field; 403 for makers and students; 404 for outsiders', async () => {
    const f = await makeStudio(app);
    const url = `/api/studios/${f.studio.id}/briefs`;
    expect((await (await f.clientFor('anonymous')).post(url, brief(f.users.maker.id))).status).toBe(401);
    const coord = await f.clientFor('coordinator');
    const bad = await coord.post(url, { title: ' ', makerId: 'someone', dueDate: '20/01/2027' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['dueDate', 'makerId', 'title']);
    // a student cannot be given a brief, nor can someone outside the studio
    for (const makerId of [f.users.student.id, f.outsider.id]) {
      const r = await coord.post(url, brief(makerId));
      expect(r.status).toBe(400);
      expect(r.body.issues[0].path).toBe('makerId');
    }
    expect((await (await f.clientFor('maker')).post(url, brief(f.users.maker.id))).status).toBe(403);
    expect((await (await f.clientFor('student')).post(url, brief(f.users.maker.id))).status).toBe(403);
    expect((await (await f.clientFor('outsider')).post(url, brief(f.users.maker.id))).status).toBe(404);
    expect(await Brief.count({ where: { studioId: f.studio.id } })).toBe(0);
  });

  it('a coordinator hands out a brief; the maker gets an e-mail with a link to it and sees it in their list', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const res = await coord.post(`/api/studios/${f.studio.id}/briefs`, brief(f.users.maker.id));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      title: 'Easel card with the spring florals',
      maker: { id: f.users.maker.id, name: 'Test maker' },
      createdBy: { id: f.users.coordinator.id },
      dueDate: '2027-01-20',
      features: ['Spring Florals 6x6 paper pad', 'Kraft cardstock, 80 lb'],
      notes: 'Show the fold up close.',
      tutorial: null,
      abilities: { update: true, delete: true, startTutorial: true },
    });
    const mail = await mailTo(f.users.maker.email, /New brief/);
    expect(mail.subject).toBe('New brief: “Easel card with the spring florals”, due 2027-01-20');
    expect(mail.text).toContain('Test coordinator has a brief for you in Test studio');
    expect(mail.text).toContain('Wednesday, 20 January 2027');
    expect(mail.text).toContain('Spring Florals 6x6 paper pad; Kraft cardstock, 80 lb');
    expect(mail.text).toContain(`/studios/${f.studio.id}/briefs#brief-${res.body.id}`);
    expect(mail.html).toContain(`/studios/${f.studio.id}/briefs#brief-${res.body.id}`);
    // nobody else hears about it
    expect(await mailsTo(f.users.coordinator.email)).toHaveLength(0);

    const mine = await (await f.clientFor('maker')).get(`/api/studios/${f.studio.id}/briefs`);
    expect(mine.status).toBe(200);
    expect(mine.body.briefs.map((b: { id: string }) => b.id)).toEqual([res.body.id]);
    expect(mine.body.briefs[0].abilities).toEqual({ update: false, delete: false, startTutorial: true });
    expect(mine.body.abilities).toEqual({ createBrief: false, setTargets: false });
    expect(mine.body.makers).toEqual([]);
    const all = await coord.get(`/api/studios/${f.studio.id}/briefs`);
    expect(all.body.makers.map((m: { name: string }) => m.name)).toEqual(['Test maker', 'Test coordinator', 'Test owner']);
  });

  it('a maker who turned brief e-mails off for the studio gets none; other kinds still come', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    expect((await maker.put(`/api/studios/${f.studio.id}/mail-settings`, { assignments: false })).status).toBe(200);
    const coord = await f.clientFor('coordinator');
    expect((await coord.post(`/api/studios/${f.studio.id}/briefs`, brief(f.users.maker.id))).status).toBe(201);
    await coord.post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'submit' });
    await coord.post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'approve' });
    await mailTo(f.users.maker.email, /approved/);
    expect((await mailsTo(f.users.maker.email)).map((m) => m.subject)).not.toContainEqual(expect.stringMatching(/New brief/));
  });

  it('another maker neither lists nor reads a brief that is not theirs; a student may not list briefs', async () => {
    const f = await makeStudio(app);
    const other = await makeUser('Second maker');
    await Membership.create({ studioId: f.studio.id, userId: other.id, role: 'maker' });
    const res = await (await f.clientFor('owner')).post(`/api/studios/${f.studio.id}/briefs`, brief(other.id));
    const maker = await f.clientFor('maker');
    expect((await maker.get(`/api/studios/${f.studio.id}/briefs`)).body.briefs).toEqual([]);
    expect((await maker.get(`/api/briefs/${res.body.id}`)).status).toBe(403);
    expect((await maker.post(`/api/briefs/${res.body.id}/tutorial`)).status).toBe(403);
    expect((await (await f.clientFor('student')).get(`/api/studios/${f.studio.id}/briefs`)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).get(`/api/briefs/${res.body.id}`)).status).toBe(404);
  });

  it('filters by maker, month and whether the tutorial is started', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const url = `/api/studios/${f.studio.id}/briefs`;
    const jan = (await coord.post(url, brief(f.users.maker.id))).body;
    const feb = (await coord.post(url, { ...brief(f.users.maker.id), title: 'Pocket tag', dueDate: '2027-02-03' })).body;
    await coord.post(url, { ...brief(f.users.owner.id), title: 'Owner’s box', dueDate: '2027-01-25' });
    const titles = async (q: string) => (await coord.get(`${url}?${q}`)).body.briefs.map((b: { title: string }) => b.title);
    expect(await titles('month=2027-01')).toEqual(['Easel card with the spring florals', 'Owner’s box']);
    expect(await titles(`makerId=${f.users.maker.id}`)).toEqual(['Easel card with the spring florals', 'Pocket tag']);
    expect((await coord.get(`${url}?month=2027-13`)).status).toBe(400);
    await (await f.clientFor('maker')).post(`/api/briefs/${feb.id}/tutorial`);
    expect(await titles(`status=started`)).toEqual(['Pocket tag']);
    expect(await titles(`status=open&makerId=${f.users.maker.id}`)).toEqual([jan.title]);
  });

  it('the maker starts the tutorial from the brief: it links to the brief and takes its title and due date; once only', async () => {
    const f = await makeStudio(app);
    const b = (await (await f.clientFor('coordinator')).post(`/api/studios/${f.studio.id}/briefs`, brief(f.users.maker.id))).body;
    const maker = await f.clientFor('maker');
    const res = await maker.post(`/api/briefs/${b.id}/tutorial`);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ title: b.title, dueDate: '2027-01-20', briefId: b.id, authorId: f.users.maker.id, state: 'draft' });
    expect((await maker.post(`/api/briefs/${b.id}/tutorial`)).status).toBe(409);
    const read = await maker.get(`/api/briefs/${b.id}`);
    expect(read.body.tutorial).toEqual({ id: res.body.id, title: b.title, state: 'draft' });
    expect(read.body.abilities.startTutorial).toBe(false);
    const fromTutorial = await maker.get(`/api/tutorials/${res.body.id}/brief`);
    expect(fromTutorial.body.brief).toMatchObject({ id: b.id, features: b.features });
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/brief`)).body).toEqual({ brief: null });
    // deleting the tutorial opens the brief again
    await Tutorial.destroy({ where: { id: res.body.id } });
    expect((await maker.get(`/api/briefs/${b.id}`)).body.tutorial).toBeNull();
  });

  it('a coordinator starting it on the maker’s behalf keeps the maker as its author', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const b = (await coord.post(`/api/studios/${f.studio.id}/briefs`, brief(f.users.maker.id))).body;
    const res = await coord.post(`/api/briefs/${b.id}/tutorial`);
    expect(res.status).toBe(201);
    expect(res.body.authorId).toBe(f.users.maker.id);
  });

  it('changing a brief: a new maker gets an e-mail; a started brief keeps its maker; its tutorial follows a new due date', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const b = (await coord.post(`/api/studios/${f.studio.id}/briefs`, brief(f.users.maker.id))).body;
    expect((await (await f.clientFor('maker')).patch(`/api/briefs/${b.id}`, { title: 'Mine now' })).status).toBe(403);
    expect((await coord.patch(`/api/briefs/${b.id}`, {})).status).toBe(400);
    const moved = await coord.patch(`/api/briefs/${b.id}`, { makerId: f.users.owner.id });
    expect(moved.body.maker.id).toBe(f.users.owner.id);
    expect((await mailTo(f.users.owner.email, /New brief/)).text).toContain('Hello Test owner');
    await coord.patch(`/api/briefs/${b.id}`, { makerId: f.users.maker.id });
    const t = (await (await f.clientFor('maker')).post(`/api/briefs/${b.id}/tutorial`)).body;
    expect((await coord.patch(`/api/briefs/${b.id}`, { makerId: f.users.owner.id })).status).toBe(409);
    expect((await coord.patch(`/api/briefs/${b.id}`, { dueDate: '2027-01-27', features: ['Vellum'] })).body).toMatchObject({
      dueDate: '2027-01-27',
      features: ['Vellum'],
    });
    expect((await Tutorial.findByPk(t.id))!.dueDate).toBe('2027-01-27');
    // withdrawing the brief leaves the tutorial in place
    expect((await (await f.clientFor('maker')).delete(`/api/briefs/${b.id}`)).status).toBe(403);
    expect((await coord.delete(`/api/briefs/${b.id}`)).status).toBe(204);
    expect((await Tutorial.findByPk(t.id))!.briefId).toBeNull();
  });
});

describe('monthly targets', () => {
  it('coordinators and owners set a target per maker; makers read them; bad numbers are refused in words', async () => {
    const f = await makeStudio(app);
    const url = (u: string) => `/api/studios/${f.studio.id}/targets/${u}`;
    expect((await (await f.clientFor('anonymous')).put(url(f.users.maker.id), { perMonth: 2 })).status).toBe(401);
    const coord = await f.clientFor('coordinator');
    for (const perMonth of [0, 2.5, 101, '2']) {
      const r = await coord.put(url(f.users.maker.id), { perMonth });
      expect(r.status).toBe(400);
      expect(r.body.issues[0].path).toBe('perMonth');
    }
    expect((await (await f.clientFor('maker')).put(url(f.users.maker.id), { perMonth: 5 })).status).toBe(403);
    expect((await (await f.clientFor('outsider')).put(url(f.users.maker.id), { perMonth: 5 })).status).toBe(404);
    expect((await coord.put(url(f.users.student.id), { perMonth: 2 })).status).toBe(404);
    expect((await coord.put(url(f.users.maker.id), { perMonth: 2 })).body).toEqual({ userId: f.users.maker.id, name: 'Test maker', perMonth: 2 });
    expect((await (await f.clientFor('owner')).put(url(f.users.maker.id), { perMonth: 3 })).body.perMonth).toBe(3);
    const list = await (await f.clientFor('maker')).get(`/api/studios/${f.studio.id}/targets`);
    expect(list.body.abilities).toEqual({ setTargets: false });
    expect(list.body.targets.find((t: { userId: string }) => t.userId === f.users.maker.id).perMonth).toBe(3);
    expect((await coord.put(url(f.users.maker.id), { perMonth: null })).body.perMonth).toBeNull();
    expect((await coord.get(`/api/studios/${f.studio.id}/targets`)).body.targets.every((t: { perMonth: null }) => t.perMonth === null)).toBe(true);
    expect((await (await f.clientFor('student')).get(`/api/studios/${f.studio.id}/targets`)).status).toBe(403);
  });
});
