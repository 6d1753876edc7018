import { describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { Cue, Material, Recording, Tutorial } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();

/** A recording with a transcript of our own: a tag with a mat and a scored wrap band. */
async function withTalk(f: StudioFixture, lines: string[]) {
  const rec = await Recording.create({
    tutorialId: f.tutorial.id,
    originalName: 'talk.mp4',
    mime: 'video/mp4',
    sizeBytes: 1,
    sourceKey: `recordings/${randomUUID()}/source.mp4`,
  });
  await Cue.bulkCreate(lines.map((text, i) => ({ recordingId: rec.id, position: i, startMs: i * 5000, endMs: i * 5000 + 5000, text, identifier: null })));
  return rec;
}

const TALK = [
  'Hi all, today a gift tag with a wrap band.',
  'First cut the tag front from the teal cardstock, three by five inches.',
  'Then the wrap band, a strip eleven by one inch, and score it at a quarter inch along the long side.',
  'Now a patterned mat two and three quarters by four and three quarters.',
  'Cut a circle one and a half inches across for the sentiment.',
];

type Mention = {
  key: string;
  kind: string;
  text: string;
  proposal: { name: string } | null;
  uses: { as: string; pieceName: string }[];
  scoreOf: string | null;
};

describe('pieces from mentions', () => {
  it('401 signed out, 400 for an unknown key or a bare length, 403 for a student, 404 for an outsider', async () => {
    const f = await makeStudio(app);
    await withTalk(f, ['Score it at one inch.']);
    const url = `/api/tutorials/${f.tutorial.id}/mentions/pieces`;
    expect((await (await f.clientFor('anonymous')).post(url, {})).status).toBe(401);
    const maker = await f.clientFor('maker');
    expect((await maker.post(url, { keys: [] })).status).toBe(400);
    const unknown = await maker.post(url, { keys: ['0:nothing said'] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.issues[0].path).toBe('keys.0');
    const key = (await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body.mentions[0].key;
    const score = await maker.post(url, { keys: [key] });
    expect(score.status).toBe(400);
    expect(score.body.error).toMatch(/not a whole piece/);
    expect((await (await f.clientFor('student')).post(url, {})).status).toBe(403);
    expect((await (await f.clientFor('outsider')).post(url, {})).status).toBe(404);
  });

  it('"Make a piece" names it from the noun said, takes the material said and the score list said next to it', async () => {
    const f = await makeStudio(app);
    await withTalk(f, TALK);
    const maker = await f.clientFor('maker');
    const list = (await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body;
    expect(list.toGoThrough).toBe(5);
    const band = list.mentions.find((m: Mention) => m.text.startsWith('eleven'));
    const res = await maker.post(`/api/tutorials/${f.tutorial.id}/mentions/pieces`, { keys: [band.key] });
    expect(res.status).toBe(201);
    const [piece] = res.body.pieces;
    expect(piece).toMatchObject({ name: 'Wrap band strip', quantity: 1, shape: 'rect', mentionKey: band.key });
    expect([piece.width.display, piece.height.display]).toEqual(['11 in', '1 in']);
    // "along the long side": the line runs beside the 11 in side, measured across the 1 in side.
    expect(piece.scoreLines.map((s: { axis: string; at: { display: string } }) => `${s.axis} ${s.at.display}`)).toEqual(['height 1/4 in']);

    const after = (await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body;
    const used = after.mentions.filter((m: Mention) => m.uses.length > 0).map((m: Mention) => [m.kind, m.uses[0]!.as, m.uses[0]!.pieceName]);
    expect(used).toEqual([
      ['size', 'piece', 'Wrap band strip'],
      ['score', 'score', 'Wrap band strip'],
    ]);
    // the size and its score list are both gone through
    expect(after.toGoThrough).toBe(3);
  });

  it('a used mention makes no second piece unless asked (409 names where it went), then "again" makes one', async () => {
    const f = await makeStudio(app);
    await withTalk(f, TALK);
    const maker = await f.clientFor('maker');
    const tag = (await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body.mentions.find((m: Mention) => m.text.startsWith('three by'));
    const url = `/api/tutorials/${f.tutorial.id}/mentions/pieces`;
    expect((await maker.post(url, { keys: [tag.key] })).body.pieces[0]).toMatchObject({ name: 'Tag front', material: 'teal cardstock' });
    const twice = await maker.post(url, { keys: [tag.key] });
    expect(twice.status).toBe(409);
    expect(twice.body).toMatchObject({ code: 'used', key: tag.key });
    expect(twice.body.error).toContain('“Tag front”');
    expect((await maker.post(url, { keys: [tag.key], again: true })).status).toBe(201);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces).toHaveLength(2);
  });

  it('"Make pieces from all" makes every unused size mention once, and a second run makes nothing', async () => {
    const f = await makeStudio(app);
    await withTalk(f, TALK);
    await Material.create({ tutorialId: f.tutorial.id, name: 'teal cardstock', sheetWidth: '17/2 in', sheetHeight: '11 in' });
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/mentions/pieces`;
    const first = await maker.post(url, {});
    expect(first.status).toBe(201);
    expect(first.body.pieces.map((p: { name: string; material: string; quantity: number }) => [p.name, p.material])).toEqual([
      ['Tag front', 'teal cardstock'],
      ['Wrap band strip', 'teal cardstock'],
      ['Mat', 'patterned paper'],
      ['Sentiment circle', 'teal cardstock'],
    ]);
    const again = await maker.post(url, {});
    expect(again.status).toBe(200);
    expect(again.body.pieces).toEqual([]);
    expect(again.body.skipped).toHaveLength(4);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body.toGoThrough).toBe(0);
  });

  it("matches a material said to the studio's earlier one and copies its stock sheet", async () => {
    const f = await makeStudio(app);
    const earlier = await Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, title: 'Earlier', slug: `e-${randomUUID().slice(0, 8)}` });
    await Material.create({ tutorialId: earlier.id, name: 'Teal smooth cardstock', sheetWidth: '17/2 in', sheetHeight: '11 in', rotate: false });
    await withTalk(f, TALK.slice(0, 2));
    const maker = await f.clientFor('maker');
    const res = await maker.post(`/api/tutorials/${f.tutorial.id}/mentions/pieces`, {});
    expect(res.body.pieces[0].material).toBe('Teal smooth cardstock');
    const mats = (await maker.get(`/api/tutorials/${f.tutorial.id}/materials`)).body.materials;
    expect(mats.map((m: { name: string; sheetWidth: { display: string }; rotate: boolean }) => [m.name, m.sheetWidth.display, m.rotate])).toEqual([
      ['Teal smooth cardstock', '8 1/2 in', false],
    ]);
  });

  it('score lines from a mention go onto a chosen piece once; "again" adds them a second time', async () => {
    const f = await makeStudio(app);
    await withTalk(f, ['Cut a panel four by six.', 'A minute later.', 'Okay.', 'Still talking.', 'Nearly there.', 'Score every half inch.']);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/mentions`;
    const list = (await maker.get(url)).body.mentions as Mention[];
    const made = (await maker.post(`${url}/pieces`, { keys: [list[0]!.key] })).body.pieces[0];
    // 25 s later: not "said next to" the size, so not taken into it
    expect(made.scoreLines).toEqual([]);
    const res = await maker.post(`${url}/score-lines`, { key: list[1]!.key, pieceId: made.id, axis: 'width' });
    expect(res.status).toBe(200);
    // every 1/2 in across 4 in: 1/2, 1, ... 3 1/2 in (7 lines, strictly inside)
    expect(res.body.scoreLines).toHaveLength(7);
    expect((await maker.post(`${url}/score-lines`, { key: list[1]!.key, pieceId: made.id, axis: 'width' })).status).toBe(409);
    expect((await maker.post(`${url}/score-lines`, { key: list[1]!.key, pieceId: made.id, axis: 'width', again: true })).status).toBe(200);
    const bad = await maker.post(`${url}/score-lines`, { key: list[1]!.key, pieceId: randomUUID(), axis: 'width' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe('pieceId');
  });
});
