import { describe, expect, it } from 'vitest';
import { Article, Membership, Recording, Still } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, makeUser, TEST_PASSWORD, type StudioFixture } from '../../../tests/harness/factories';
import { TestClient } from '../../../tests/harness/client';
import { mailsTo, mailTo } from '../../../tests/harness/mail';

const app = testApp();

type Json = { type: string; attrs?: Record<string, unknown>; content?: Json[]; text?: string };
const text = (t: string): Json => ({ type: 'text', text: t });
const para = (t: string): Json => ({ type: 'paragraph', content: [text(t)] });
const step = (title: string, body: string, id?: string): Json => ({
  type: 'step',
  attrs: id ? { id } : {},
  content: [{ type: 'stepTitle', content: [text(title)] }, para(body)],
});
const doc = (...content: Json[]): Json => ({ type: 'doc', content });

/** Saves a write-up as the maker and answers the saved steps' ids, in order. */
async function saveWriteUp(f: StudioFixture, d: Json, version: number) {
  const c = await f.clientFor('maker');
  const res = await c.put(`/api/tutorials/${f.tutorial.id}/article`, { version, doc: d });
  expect(res.status).toBe(200);
  const saved = (await Article.findByPk(f.tutorial.id))!;
  return { version: res.body.version as number, ids: (saved.doc.content ?? []).filter((n) => n.type === 'step').map((n) => n.attrs!.id as string) };
}

const TWO_STEPS = doc(
  step('Cut the base', 'Cut the base circle from kraft cardstock.'),
  step('Score the wall', 'Score the wall strip at 1/2 in along one long edge.'),
);

describe('POST /api/tutorials/:id/comments', () => {
  it('401 when signed out', async () => {
    const f = await makeStudio(app);
    expect((await (await f.clientFor('anonymous')).post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Hi' })).status).toBe(401);
  });

  it('400 for an empty body or an anchor of no known kind, naming the field', async () => {
    const f = await makeStudio(app);
    const c = await f.clientFor('coordinator');
    const empty = await c.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.issues[0].path).toBe('body');
    const odd = await c.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Here', anchor: { chapter: 'x' } });
    expect(odd.status).toBe(400);
    expect(odd.body.issues[0].path).toBe('anchor');
    // Both a step and a piece: one place only.
    const both = await c.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Here', anchor: { stepId: 'sabc', pieceId: crypto.randomUUID() } });
    expect(both.status).toBe(400);
  });

  it('400 for a step, piece or still that is not in this tutorial, or a quote not in the step', async () => {
    const f = await makeStudio(app);
    const { ids } = await saveWriteUp(f, TWO_STEPS, 0);
    const c = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/comments`;
    const noStep = await c.post(url, { body: 'x', anchor: { stepId: 'snotthere' } });
    expect([noStep.status, noStep.body.issues[0].path]).toEqual([400, 'anchor.stepId']);
    const noPiece = await c.post(url, { body: 'x', anchor: { pieceId: crypto.randomUUID() } });
    expect([noPiece.status, noPiece.body.issues[0].path]).toEqual([400, 'anchor.pieceId']);
    const noStill = await c.post(url, { body: 'x', anchor: { stillId: crypto.randomUUID() } });
    expect([noStill.status, noStill.body.issues[0].path]).toEqual([400, 'anchor.stillId']);
    const badQuote = await c.post(url, { body: 'x', anchor: { stepId: ids[0], quote: 'along one long edge' } });
    expect([badQuote.status, badQuote.body.issues[0].path]).toEqual([400, 'anchor.quote']);
  });

  it('403 for a student and for a maker of another tutorial (who still reads them); 404 for another studio', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/comments`;
    expect((await (await f.clientFor('student')).post(url, { body: 'Hi' })).status).toBe(403);
    expect((await (await f.clientFor('student')).get(url)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).post(url, { body: 'Hi' })).status).toBe(404);
    const other = await makeUser('Second maker');
    await Membership.create({ userId: other.id, studioId: f.studio.id, role: 'maker' });
    const c = new TestClient(app);
    await c.signIn(other.email, TEST_PASSWORD);
    expect((await c.post(url, { body: 'Hi' })).status).toBe(403);
    await (await f.clientFor('coordinator')).post(url, { body: 'Looks good' });
    const read = await c.get(url);
    expect(read.status).toBe(200);
    expect(read.body.comments[0].body).toBe('Looks good');
    expect(read.body.abilities.comment).toBe(false);
    expect(read.body.comments[0].abilities).toEqual({ edit: false, resolve: false, reply: false });
  });

  it('201 with the comment on the whole tutorial, on a step, a passage, a piece and a still', async () => {
    const f = await makeStudio(app);
    const { ids } = await saveWriteUp(f, TWO_STEPS, 0);
    const maker = await f.clientFor('maker');
    const piece = (await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Wall strip', width: '1 1/2', height: '10 9/16' })).body;
    const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: 'box.mp4', mime: 'video/mp4', sizeBytes: 10, sourceKey: 'x/box.mp4' });
    const still = await Still.create({
      recordingId: rec.id,
      atMs: 65_000,
      requestedMs: 65_000,
      mode: 'exact',
      fileKey: 'x/s.jpg',
      width: 640,
      height: 360,
      caption: 'Lid on',
    });
    const c = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/comments`;
    const whole = await c.post(url, { body: 'Lovely colours' });
    expect(whole.status).toBe(201);
    expect(whole.body).toMatchObject({ body: 'Lovely colours', anchor: null, orphaned: false, resolved: false, author: { name: 'Test coordinator' } });
    expect(whole.body.id).toMatch(/^[0-9a-f-]{36}$/);
    const onStep = await c.post(url, { body: 'Say which way the grain runs', anchor: { stepId: ids[1] } });
    expect(onStep.body.anchor).toEqual({ kind: 'step', stepId: ids[1], label: 'Step 2: Score the wall', status: 'present' });
    // A selection spanning a line break reads as the words with one space.
    const passage = await c.post(url, { body: 'Which cardstock weight?', anchor: { stepId: ids[0], quote: 'kraft  cardstock' } });
    expect(passage.status).toBe(201);
    expect(passage.body.anchor).toMatchObject({ kind: 'passage', quote: 'kraft  cardstock', status: 'present' });
    const onPiece = await c.post(url, { body: 'Check this length', anchor: { pieceId: piece.id } });
    expect(onPiece.body.anchor).toMatchObject({ kind: 'piece', label: 'Piece: Wall strip', status: 'present' });
    const onStill = await c.post(url, { body: 'A bit dark', anchor: { stillId: still.id } });
    expect(onStill.body.anchor).toMatchObject({ kind: 'still', label: 'Still at 1:05: Lid on', status: 'present' });
    const list = await maker.get(url);
    expect(list.body.comments.map((x: { body: string }) => x.body)).toEqual([
      'Lovely colours',
      'Say which way the grain runs',
      'Which cardstock weight?',
      'Check this length',
      'A bit dark',
    ]);
    expect(list.body.counts).toEqual({ open: 5, resolved: 0 });
  });
});

describe('a comment and the write-up it points at', () => {
  it('never bumps the write-up’s version: a save based on the version before the comment still succeeds (no 409)', async () => {
    const f = await makeStudio(app);
    const { version, ids } = await saveWriteUp(f, TWO_STEPS, 0);
    const coord = await f.clientFor('coordinator');
    // The maker has the editor open at `version`; the coordinator comments meanwhile.
    const made = await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Grain?', anchor: { stepId: ids[1] } });
    expect(made.status).toBe(201);
    await coord.post(`/api/comments/${made.body.id}/replies`, { body: 'Along the length' });
    await coord.patch(`/api/comments/${made.body.id}`, { resolved: true });
    expect((await Article.findByPk(f.tutorial.id))!.version).toBe(version);
    const edited = doc(step('Cut the base', 'Cut the base circle.', ids[0]), step('Score the wall', 'Score at 1/2 in, grain along the length.', ids[1]));
    const res = await (await f.clientFor('maker')).put(`/api/tutorials/${f.tutorial.id}/article`, { version, doc: edited });
    expect(res.status).toBe(200);
  });

  it('follows its step through edits and moves, and stays, marked, when the step is deleted', async () => {
    const f = await makeStudio(app);
    const first = await saveWriteUp(f, TWO_STEPS, 0);
    const ids = first.ids;
    let version = first.version;
    const coord = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/comments`;
    const c = (await coord.post(url, { body: 'Grain?', anchor: { stepId: ids[1] } })).body;
    const q = (await coord.post(url, { body: 'Which weight?', anchor: { stepId: ids[0], quote: 'kraft cardstock' } })).body;
    // The steps swap places and the second one's words change.
    ({ version } = await saveWriteUp(
      f,
      doc(step('Score the wall', 'Score at 1/2 in.', ids[1]), step('Cut the base', 'Cut the base circle from white cardstock.', ids[0])),
      version,
    ));
    let list = (await coord.get(url)).body.comments;
    expect(list.find((x: { id: string }) => x.id === c.id).anchor).toMatchObject({ label: 'Step 1: Score the wall', status: 'present' });
    expect(list.find((x: { id: string }) => x.id === q.id).anchor).toMatchObject({ status: 'changed' });
    // A client that sends no ids (the API, an older editor) keeps them by the steps' titles.
    const bare = await saveWriteUp(f, doc(step('Score the wall', 'Score at 1/2 in.'), step('Cut the base', 'Cut it.')), version);
    expect(bare.ids).toEqual([ids[1], ids[0]]);
    version = bare.version;
    // The step is deleted: the comment stays, marked as orphaned, with the name it had.
    await saveWriteUp(f, doc(step('Cut the base', 'Cut it.', ids[0])), version);
    list = (await coord.get(url)).body.comments;
    const gone = list.find((x: { id: string }) => x.id === c.id);
    expect(gone.orphaned).toBe(true);
    expect(gone.anchor).toMatchObject({ kind: 'step', status: 'missing', label: 'Step 2: Score the wall' });
    expect(list.find((x: { id: string }) => x.id === q.id).orphaned).toBe(false);
  });

  it('a copied step gets a fresh id, so two steps never share one', async () => {
    const f = await makeStudio(app);
    const { ids } = await saveWriteUp(f, doc(step('A', 'one', 'sdup'), step('B', 'two', 'sdup')), 0);
    expect(ids[0]).toBe('sdup');
    expect(ids[1]).not.toBe('sdup');
  });
});

describe('replies, resolve and edit', () => {
  it('replies join the thread; a reply to a reply joins the same thread; 404 for an unknown comment', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const maker = await f.clientFor('maker');
    const root = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Lid too tight?' })).body;
    expect((await (await f.clientFor('anonymous')).post(`/api/comments/${root.id}/replies`, { body: 'x' })).status).toBe(401);
    expect((await maker.post(`/api/comments/${root.id}/replies`, { body: '' })).status).toBe(400);
    expect((await (await f.clientFor('student')).post(`/api/comments/${root.id}/replies`, { body: 'x' })).status).toBe(403);
    expect((await (await f.clientFor('outsider')).post(`/api/comments/${root.id}/replies`, { body: 'x' })).status).toBe(404);
    expect((await maker.post(`/api/comments/${crypto.randomUUID()}/replies`, { body: 'x' })).status).toBe(404);
    const r1 = await maker.post(`/api/comments/${root.id}/replies`, { body: 'I added 1/16 in' });
    expect(r1.status).toBe(201);
    expect(r1.body).toMatchObject({ parentId: root.id, body: 'I added 1/16 in', author: { name: 'Test maker' } });
    const r2 = await coord.post(`/api/comments/${r1.body.id}/replies`, { body: 'Thanks' });
    expect(r2.body.parentId).toBe(root.id);
    const list = (await maker.get(`/api/tutorials/${f.tutorial.id}/comments`)).body;
    expect(list.comments).toHaveLength(1);
    expect(list.comments[0].replies.map((r: { body: string }) => r.body)).toEqual(['I added 1/16 in', 'Thanks']);
  });

  it('resolve and reopen a thread (who and when kept); a reply is resolved with its thread', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const maker = await f.clientFor('maker');
    const root = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Lid too tight?' })).body;
    const reply = (await maker.post(`/api/comments/${root.id}/replies`, { body: 'Fixed' })).body;
    expect((await maker.patch(`/api/comments/${root.id}`, { resolved: 'yes' })).status).toBe(400);
    expect((await maker.patch(`/api/comments/${root.id}`, {})).status).toBe(400);
    expect((await (await f.clientFor('student')).patch(`/api/comments/${root.id}`, { resolved: true })).status).toBe(403);
    expect((await maker.patch(`/api/comments/${reply.id}`, { resolved: true })).status).toBe(400);
    const done = await maker.patch(`/api/comments/${root.id}`, { resolved: true });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ resolved: true, resolvedBy: { name: 'Test maker' } });
    expect(done.body.replies).toHaveLength(1);
    expect((await coord.get(`/api/tutorials/${f.tutorial.id}/comments`)).body.counts).toEqual({ open: 0, resolved: 1 });
    const again = await coord.patch(`/api/comments/${root.id}`, { resolved: false });
    expect(again.body).toMatchObject({ resolved: false, resolvedBy: null, resolvedAt: null });
  });

  it('only the author changes a comment’s words', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const root = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Lid too tigth?' })).body;
    expect(root.abilities).toEqual({ edit: true, resolve: true, reply: true });
    expect((await (await f.clientFor('maker')).patch(`/api/comments/${root.id}`, { body: 'Mine now' })).status).toBe(403);
    expect((await (await f.clientFor('owner')).patch(`/api/comments/${root.id}`, { body: 'Mine now' })).status).toBe(403);
    const fixed = await coord.patch(`/api/comments/${root.id}`, { body: 'Lid too tight?' });
    expect(fixed.status).toBe(200);
    expect(fixed.body.body).toBe('Lid too tight?');
    expect(fixed.body.editedAt).not.toBeNull();
  });
});

describe('mentions and e-mail', () => {
  it('a new comment mails the maker with a link to it; the person commenting gets none', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const made = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'The lid needs a photo' })).body;
    const mail = await mailTo(f.users.maker.email, /New comment on “Test tutorial”/);
    expect(mail.text).toContain('The lid needs a photo');
    expect(mail.text).toContain(`/tutorials/${f.tutorial.id}/write-up?comment=${made.id}`);
    expect(mail.html).toContain(`/tutorials/${f.tutorial.id}/write-up?comment=${made.id}`);
    expect(await mailsTo(f.users.coordinator.email)).toHaveLength(0);
  });

  it('a reply mails the thread; a mention (picked or typed) mails the person mentioned', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    const maker = await f.clientFor('maker');
    const root = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Grain?' })).body;
    const reply = await maker.post(`/api/comments/${root.id}/replies`, { body: 'Along the length. @Test owner, fine for the shop?' });
    expect(reply.body.mentions).toEqual([{ id: f.users.owner.id, name: 'Test owner' }]);
    const toCoord = await mailTo(f.users.coordinator.email, /Test maker replied on “Test tutorial”/);
    expect(toCoord.text).toContain(`/tutorials/${f.tutorial.id}/write-up?comment=${root.id}`);
    const toOwner = await mailTo(f.users.owner.email, /Test maker mentioned you/);
    expect(toOwner.text).toContain('fine for the shop?');
    // Picked by id; a student cannot be mentioned (they cannot read comments).
    const picked = await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Please look', mentions: [f.users.owner.id] });
    expect(picked.body.mentions).toEqual([{ id: f.users.owner.id, name: 'Test owner' }]);
    const student = await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Please look', mentions: [f.users.student.id] });
    expect([student.status, student.body.issues[0].path]).toEqual([400, 'mentions']);
  });

  it('turning off comment mail stops comment mail only: mentions still arrive', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    expect((await maker.put(`/api/studios/${f.studio.id}/mail-settings`, { comments: false })).status).toBe(200);
    const coord = await f.clientFor('coordinator');
    await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Plain comment' });
    await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: '@Test maker see the lid' });
    await mailTo(f.users.maker.email, /mentioned you/);
    const all = await mailsTo(f.users.maker.email);
    expect(all.map((m) => m.subject)).toEqual(['Test coordinator mentioned you on “Test tutorial”']);
  });
});
