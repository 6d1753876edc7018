import { describe, expect, it } from 'vitest';
import { Membership, Tutorial, MonthlyTarget, Brief } from '@server/models';
import { dayIn, shiftMonth, monthOf } from '@shared/board/dates';
import type { BoardCardDto, BoardDto } from '@shared/schemas/board';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, makeUser, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();

/** A day `n` days from today (UTC), as YYYY-MM-DD. */
const inDays = (n: number) => dayIn(new Date(Date.now() + n * 86_400_000), 'UTC');
const slug = () => `b-${crypto.randomUUID().slice(0, 8)}`;

async function tutorial(f: StudioFixture, o: Partial<Tutorial> & { title: string }) {
  return Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, slug: slug(), ...o } as Tutorial);
}
const pickId = (j: { id?: string; comment?: { id: string } }) => j.id ?? j.comment!.id;
const cardsOf = (b: BoardDto, state: string) => b.columns.find((c) => c.state === state)!.cards;
const card = (b: BoardDto, id: string) => b.columns.flatMap((c) => c.cards).find((c) => c.id === id) as BoardCardDto;

describe('the studio board', () => {
  it('401 signed out, 403 for students, 404 for outsiders, 400 for a bad month or time zone', async () => {
    const f = await makeStudio(app);
    const url = `/api/studios/${f.studio.id}/board`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    expect((await (await f.clientFor('student')).get(url)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).get(url)).status).toBe(404);
    const c = await f.clientFor('coordinator');
    const bad = await c.get(`${url}?month=2027-1&timeZone=Mars/Olympus`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['month', 'timeZone']);
  });

  it('groups the tutorials by state in review order, soonest due first, with due dates in words', async () => {
    const f = await makeStudio(app);
    await f.tutorial.update({ dueDate: inDays(20) });
    const late = await tutorial(f, { title: 'Shaker card', dueDate: inDays(-2) });
    const soon = await tutorial(f, { title: 'Gatefold card', dueDate: inDays(3) });
    const today = await tutorial(f, { title: 'Tag trio', dueDate: inDays(0), state: 'in_review' });
    const undated = await tutorial(f, { title: 'Acorn box', state: 'in_review' });
    const shipped = await tutorial(f, { title: 'Pillow box', dueDate: inDays(-5), state: 'published', publishedAt: new Date() });
    const res = await (await f.clientFor('coordinator')).get(`/api/studios/${f.studio.id}/board`);
    expect(res.status).toBe(200);
    const b = res.body as BoardDto;
    expect(b.columns.map((c) => c.label)).toEqual(['draft', 'in review', 'needs changes', 'approved', 'published']);
    expect(cardsOf(b, 'draft').map((c) => c.title)).toEqual(['Shaker card', 'Gatefold card', 'Test tutorial']);
    expect(cardsOf(b, 'in_review').map((c) => c.title)).toEqual(['Tag trio', 'Acorn box']);
    expect(card(b, late.id).due).toEqual({ kind: 'overdue', days: 2, words: 'Overdue by 2 days' });
    expect(card(b, soon.id).due?.words).toBe('Due this week: in 3 days');
    expect(card(b, today.id).due?.words).toBe('Due today');
    expect(card(b, f.tutorial.id).due).toBeNull();
    expect(card(b, undated.id).due).toBeNull();
    // delivered: a published tutorial is not overdue
    expect(card(b, shipped.id).due).toBeNull();
    expect(card(b, late.id)).toMatchObject({ maker: { id: f.users.maker.id, name: 'Test maker' }, openComments: 0, briefId: null });
    expect(Date.parse(card(b, late.id).lastChange.at)).toBeGreaterThan(Date.now() - 60_000);
    expect(b.today).toBe(inDays(0));
  });

  it('last change counts the write-up, the cut list and the supplies, not only the tutorial row', async () => {
    const f = await makeStudio(app);
    await Tutorial.sequelize!.query(`UPDATE tutorials SET updated_at = '2026-01-01T00:00:00Z' WHERE id = :id`, { replacements: { id: f.tutorial.id } });
    const c = await f.clientFor('maker');
    const before = card((await c.get(`/api/studios/${f.studio.id}/board`)).body, f.tutorial.id).lastChange.at;
    expect(before).toBe('2026-01-01T00:00:00.000Z');
    await c.post(`/api/tutorials/${f.tutorial.id}/supplies`, { category: 'tool', name: 'Bone folder' });
    const after = card((await c.get(`/api/studios/${f.studio.id}/board`)).body, f.tutorial.id).lastChange.at;
    expect(Date.parse(after)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('cards count open comment threads and name the last review move and who made it', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const url = `/api/studios/${f.studio.id}/board`;
    const first = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Crop the first photo tighter' })).body;
    await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Which glue for the vellum?' });
    await (await f.clientFor('maker')).post(`/api/comments/${pickId(first)}/replies`, { body: 'Done' });
    let c = card((await coord.get(url)).body, f.tutorial.id);
    expect(c.openComments).toBe(2);
    expect(c.lastChange).toMatchObject({ by: null, what: null });
    await coord.patch(`/api/comments/${pickId(first)}`, { resolved: true });
    await (await f.clientFor('maker')).post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'submit' });
    c = card((await coord.get(url)).body, f.tutorial.id);
    expect(c.openComments).toBe(1);
    expect(c.lastChange).toMatchObject({ by: 'Test maker', what: 'moved to in review' });
  });

  it('each card offers only the moves the caller may make, and making one moves the card', async () => {
    const f = await makeStudio(app);
    const other = await makeUser('Other maker');
    await Membership.create({ studioId: f.studio.id, userId: other.id, role: 'maker' });
    const theirs = await tutorial(f, { title: 'Their card', authorId: other.id });
    const review = await tutorial(f, { title: 'In review', state: 'in_review' });
    const url = `/api/studios/${f.studio.id}/board`;
    const maker = await f.clientFor('maker');
    const coord = await f.clientFor('coordinator');
    let b = (await maker.get(url)).body as BoardDto;
    expect(card(b, f.tutorial.id).moves).toEqual(['submit']);
    expect(card(b, theirs.id).moves).toEqual([]);
    expect(card(b, review.id).moves).toEqual([]);
    b = (await coord.get(url)).body as BoardDto;
    expect(card(b, review.id).moves).toEqual(['approve', 'sendBack']);
    expect(card(b, theirs.id).moves).toEqual(['submit']);
    // the board's move is the review move: the same endpoint and rules
    expect((await maker.post(`/api/tutorials/${review.id}/state`, { action: 'approve' })).status).toBe(403);
    expect((await coord.post(`/api/tutorials/${review.id}/state`, { action: 'approve' })).status).toBe(200);
    b = (await coord.get(url)).body as BoardDto;
    expect(cardsOf(b, 'approved').map((c) => c.id)).toEqual([review.id]);
    expect(card(b, review.id).moves).toEqual(['sendBack', 'publish']);
  });

  it('filters by maker and by month; the calendar lists due, brief, published and scheduled dates of the month', async () => {
    const f = await makeStudio(app);
    const other = await makeUser('Other maker');
    await Membership.create({ studioId: f.studio.id, userId: other.id, role: 'maker' });
    await f.tutorial.update({ dueDate: '2027-03-09' });
    const feb = await tutorial(f, { title: 'February card', dueDate: '2027-02-10' });
    const theirs = await tutorial(f, { title: 'Their March box', authorId: other.id, dueDate: '2027-03-20' });
    // published at 23:30 UTC on 31 March: 1 April in Berlin
    const out = await tutorial(f, { title: 'Out in March', state: 'published', publishedAt: new Date('2027-03-31T23:30:00Z') });
    const sched = await tutorial(f, {
      title: 'Going out in March',
      state: 'approved',
      publishAt: new Date('2027-03-15T08:00:00Z'),
      publishTimeZone: 'Europe/Berlin',
    });
    await Brief.create({ studioId: f.studio.id, makerId: f.users.maker.id, title: 'Not started yet', dueDate: '2027-03-28' });
    const c = await f.clientFor('coordinator');
    const url = `/api/studios/${f.studio.id}/board`;
    const ids = (b: BoardDto) => b.columns.flatMap((col) => col.cards.map((x) => x.id)).sort();

    const march = (await c.get(`${url}?month=2027-03`)).body as BoardDto;
    expect(march.filtered).toBe(true);
    expect(ids(march)).toEqual([f.tutorial.id, theirs.id, out.id, sched.id].sort());
    expect(march.calendar.map((e) => [e.day, e.kind, e.title])).toEqual([
      ['2027-03-09', 'due', 'Test tutorial'],
      ['2027-03-15', 'scheduled', 'Going out in March'],
      ['2027-03-20', 'due', 'Their March box'],
      ['2027-03-28', 'brief', 'Not started yet'],
      ['2027-03-31', 'published', 'Out in March'],
    ]);
    const berlin = (await c.get(`${url}?month=2027-03&timeZone=Europe/Berlin`)).body as BoardDto;
    expect(ids(berlin)).not.toContain(out.id);
    expect(((await c.get(`${url}?month=2027-04&timeZone=Europe/Berlin`)).body as BoardDto).calendar).toEqual([
      { day: '2027-04-01', kind: 'published', title: 'Out in March', tutorialId: out.id, briefId: null, at: '2027-03-31T23:30:00.000Z' },
    ]);

    const mine = (await c.get(`${url}?makerId=${f.users.maker.id}`)).body as BoardDto;
    expect(ids(mine)).toEqual([f.tutorial.id, feb.id, out.id, sched.id].sort());
    expect(mine.makers.map((m) => m.name)).toEqual(['Test maker']);
    const both = (await c.get(`${url}?makerId=${other.id}&month=2027-02`)).body as BoardDto;
    expect(ids(both)).toEqual([]);
    // no month: every tutorial, and the calendar of the current month
    const all = (await c.get(url)).body as BoardDto;
    expect(all.filtered).toBe(false);
    expect(ids(all)).toHaveLength(5);
    expect(all.month).toBe(monthOf(inDays(0)));
  });

  it('counts each maker’s month against their monthly target', async () => {
    const f = await makeStudio(app);
    const month = monthOf(inDays(0));
    const next = shiftMonth(month, 1);
    await MonthlyTarget.create({ studioId: f.studio.id, userId: f.users.maker.id, perMonth: 2 });
    await tutorial(f, { title: 'Out this month', state: 'published', publishedAt: new Date(), dueDate: `${month}-01` });
    await tutorial(f, { title: 'Scheduled this month', state: 'approved', publishAt: new Date(`${month}-28T12:00:00Z`), publishTimeZone: 'UTC' });
    await tutorial(f, { title: 'Out next month', state: 'published', publishedAt: new Date(`${next}-02T12:00:00Z`) });
    await Brief.create({ studioId: f.studio.id, makerId: f.users.maker.id, title: 'Brief due this month', dueDate: `${month}-15` });
    const b = (await (await f.clientFor('maker')).get(`/api/studios/${f.studio.id}/board?month=${month}`)).body as BoardDto;
    expect(b.makers).toEqual([{ id: f.users.maker.id, name: 'Test maker', target: 2, published: 1, scheduled: 1, due: 2 }]);
    expect(b.abilities).toEqual({ createBrief: false, setTargets: false });
    const owner = (await (await f.clientFor('owner')).get(`/api/studios/${f.studio.id}/board?month=${month}`)).body as BoardDto;
    expect(owner.abilities).toEqual({ createBrief: true, setTargets: true });
  });
});
