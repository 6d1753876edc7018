import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Chapter, Cue, Recording, Supply, Tutorial } from '@server/models';
import { processRecording } from '@server/jobs/process-recording';
import { stopQueue } from '@server/jobs';
import { colourSteps, tempDir } from '@server/services/media/test-clips';
import type { AssemblyDto } from '@shared/schemas/assembly';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();
afterAll(() => stopQueue());

// A gift tag with a wrap band, said over a minute (our own scenario).
const TALK: [number, string][] = [
  [0, "Hi everyone, today we're making a gift tag with a wrap band."],
  [4000, "You'll need teal cardstock, a tacky glue and some jute twine."],
  [10_000, 'First cut the tag front from the teal cardstock, three by five inches.'],
  [22_000, 'Next the wrap band, a strip eleven by one inch, and score it at a quarter inch along the long side.'],
  [36_000, 'Now glue the band around the tag and hold it with clips while it dries.'],
  [50_000, 'Finally tie the jute twine through the hole. Thanks for watching!'],
];

/** A recording just uploaded: still being read (no duration yet), with its transcript attached. */
async function uploadedWithTalk(f: StudioFixture) {
  const rec = await Recording.create({
    tutorialId: f.tutorial.id,
    originalName: 'tag.mp4',
    mime: 'video/mp4',
    sizeBytes: 1,
    sourceKey: `recordings/${randomUUID()}/source.mp4`,
  });
  await Cue.bulkCreate(
    TALK.map(([at, text], i) => ({ recordingId: rec.id, position: i, startMs: at, endMs: (TALK[i + 1]?.[0] ?? 60_000) - 1, text, identifier: null })),
  );
  return rec;
}

const summaries = (a: AssemblyDto, kind: string) => a.proposals.filter((p) => p.kind === kind).map((p) => p.summary);

describe('assemble the tutorial', () => {
  it('401 signed out, 409 in words without a transcript, 403 for a student, 404 for an outsider, 400 for an unknown proposal', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/assembly`;
    expect((await (await f.clientFor('anonymous')).post(url, {})).status).toBe(401);
    const maker = await f.clientFor('maker');
    const none = await maker.post(url, {});
    expect(none.status).toBe(409);
    expect(none.body.error).toMatch(/Upload the recording/);
    expect((await (await f.clientFor('student')).post(url, {})).status).toBe(403);
    expect((await (await f.clientFor('outsider')).post(url, {})).status).toBe(404);
    expect((await maker.post(`${url}/accept`, { ids: [randomUUID()] })).status).toBe(400);
    expect((await maker.post(`${url}/undo`, {})).status).toBe(400);
  });

  it('proposes the whole package while the video is still being read; accepting all makes all but the stills and the draft that waits for them', async () => {
    const f = await makeStudio(app);
    await uploadedWithTalk(f);
    const earlier = await Tutorial.create({ studioId: f.studio.id, authorId: f.users.maker.id, title: 'Earlier', slug: `e-${randomUUID().slice(0, 8)}` });
    await Supply.create({
      tutorialId: earlier.id,
      category: 'adhesive',
      name: 'Tacky glue (precision tip)',
      url: 'https://shop.example/tacky',
      sponsored: true,
      discountCode: 'PAPER10',
    });
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/assembly`;
    const run = await maker.post(url, {});
    expect(run.status).toBe(201);
    const a = run.body as AssemblyDto;
    expect(a.processing).toBe(true);
    expect(summaries(a, 'chapter')).toEqual([
      'Chapter “Introduction” at 0:00',
      'Chapter “Cut the tag front” at 0:10',
      'Chapter “The wrap band” at 0:22',
      'Chapter “Glue the band around the tag” at 0:36',
      'Chapter “Tie the jute twine through the hole” at 0:50',
    ]);
    expect(summaries(a, 'still')).toHaveLength(5);
    expect(a.proposals.filter((p) => p.kind === 'still').every((p) => p.waiting?.startsWith('Waits for the video'))).toBe(true);
    expect(summaries(a, 'piece')).toEqual([
      'Piece “Tag front”, teal cardstock: 3 in × 5 in',
      'Piece “Wrap band strip”, material to pick: 11 in × 1 in, score at 1/4 in',
    ]);
    expect(summaries(a, 'supply')).toEqual([
      'Cardstock: Teal cardstock',
      'Adhesive: Tacky glue (precision tip) (as listed before, with its link)',
      'Embellishment: Jute twine',
      'Tool: Clips',
    ]);
    expect(summaries(a, 'draft')).toEqual(['First draft of the write-up: 5 steps, a still in each']);

    const all = (await maker.post(`${url}/accept`, {})).body as AssemblyDto;
    expect(all.counts).toEqual({ proposed: 6, accepted: 11, dropped: 0 });
    expect(all.notes.join(' ')).toMatch(/5 stills wait for the video/);
    expect(all.notes.join(' ')).toMatch(/first draft waits for its stills/);
    const chapters = await Chapter.findAll({ where: { recordingId: a.recordingId! } });
    expect(chapters).toHaveLength(5);
    const pieces = (await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces;
    expect(pieces.map((p: { name: string; scoreLines: unknown[] }) => [p.name, p.scoreLines.length])).toEqual([
      ['Tag front', 0],
      ['Wrap band strip', 1],
    ]);
    const supplies = (await maker.get(`/api/tutorials/${f.tutorial.id}/supplies`)).body.supplies;
    expect(supplies.find((s: { name: string }) => s.name.startsWith('Tacky'))).toMatchObject({
      url: 'https://shop.example/tacky',
      sponsored: true,
      discountCode: 'PAPER10',
    });

    // Run again: nothing is proposed or made twice.
    const again = await maker.post(url, {});
    expect(again.status).toBe(200);
    expect(again.body.proposals).toHaveLength(a.proposals.length);
    expect(await Chapter.count({ where: { recordingId: a.recordingId! } })).toBe(5);

    // The draft accepted on its own, before the stills: the write-up gets one step per chapter.
    const draft = all.proposals.find((p) => p.kind === 'draft')!;
    expect((await maker.post(`${url}/accept`, { ids: [draft.id] })).status).toBe(200);
    const doc = (await maker.get(`/api/tutorials/${f.tutorial.id}/article`)).body.doc;
    expect(doc.content.filter((n: { type: string }) => n.type === 'step')).toHaveLength(5);
  });

  it('two "Accept all" at once (a double click, two tabs) make each thing once', async () => {
    const f = await makeStudio(app);
    await uploadedWithTalk(f);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/assembly`;
    const a = (await maker.post(url, {})).body as AssemblyDto;
    const [one, two] = await Promise.all([maker.post(`${url}/accept`, {}), maker.post(`${url}/accept`, {})]);
    expect([one.status, two.status]).toEqual([200, 200]);
    expect(await Chapter.count({ where: { recordingId: a.recordingId! } })).toBe(5);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces).toHaveLength(2);
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/supplies`)).body.supplies).toHaveLength(4);
    const after = (await maker.get(url)).body as AssemblyDto;
    expect(after.counts).toEqual({ proposed: 6, accepted: 11, dropped: 0 });
  });

  it('undo takes out what accepting made and proposes it again; a dropped proposal stays dropped on a new run', async () => {
    const f = await makeStudio(app);
    await uploadedWithTalk(f);
    const maker = await f.clientFor('maker');
    const url = `/api/tutorials/${f.tutorial.id}/assembly`;
    const a = (await maker.post(url, {})).body as AssemblyDto;
    const [tag, band] = a.proposals.filter((p) => p.kind === 'piece');
    const twine = a.proposals.find((p) => p.summary.includes('Jute twine'))!;
    await maker.post(`${url}/accept`, { ids: [tag!.id, band!.id] });
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces).toHaveLength(2);
    // the band's mention shows where it went
    const mentions = (await maker.get(`/api/tutorials/${f.tutorial.id}/mentions`)).body;
    expect(mentions.toGoThrough).toBe(0);
    const undone = (await maker.post(`${url}/undo`, { ids: [band!.id] })).body as AssemblyDto;
    expect(undone.proposals.find((p) => p.id === band!.id)!.state).toBe('proposed');
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/pieces`)).body.pieces.map((p: { name: string }) => p.name)).toEqual(['Tag front']);
    await maker.post(`${url}/drop`, { ids: [twine.id] });
    const rerun = (await maker.post(url, {})).body as AssemblyDto;
    expect(rerun.proposals.find((p) => p.id === twine.id)!.state).toBe('dropped');
    expect(rerun.proposals.filter((p) => p.summary.includes('Jute twine'))).toHaveLength(1);
  });
});

describe('stills and the draft once the video is read', () => {
  let dir: string;
  let clip: string;
  beforeAll(async () => {
    dir = await tempDir();
    clip = await colourSteps(dir);
  });

  it('a still inside each chapter (never before its start), and the draft places them', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const up = await maker.upload(`/api/tutorials/${f.tutorial.id}/recordings`, 'file', clip, 'steps.mp4');
    await processRecording(up.body.id);
    await Cue.bulkCreate([
      { recordingId: up.body.id, position: 0, startMs: 0, endMs: 2000, text: 'Hello, a quick colour test.', identifier: null },
      { recordingId: up.body.id, position: 1, startMs: 2000, endMs: 5000, text: 'Now we fold the blue card.', identifier: null },
    ]);
    // chapters marked by hand: the assembly proposes none again, only a still in each
    await Chapter.bulkCreate([
      { recordingId: up.body.id, title: 'Colours', startMs: 0 },
      { recordingId: up.body.id, title: 'Fold the blue card', startMs: 2000 },
    ]);
    const url = `/api/tutorials/${f.tutorial.id}/assembly`;
    const a = (await maker.post(url, {})).body as AssemblyDto;
    expect(a.processing).toBe(false);
    expect(summaries(a, 'chapter')).toEqual([]);
    expect(summaries(a, 'still')).toEqual(['The sharpest still inside “Colours”', 'The sharpest still inside “Fold the blue card”']);
    const done = (await maker.post(`${url}/accept`, {})).body as AssemblyDto;
    expect(done.counts.proposed).toBe(0);
    const stills = (await maker.get(`/api/recordings/${up.body.id}/stills`)).body.stills as { atMs: number; alt: string }[];
    expect(stills.map((s) => s.atMs < 2000)).toEqual([true, false]);
    expect(stills[1]!.atMs).toBeLessThan(5000);
    expect(stills[1]!.alt).toBe('Fold the blue card');
    const doc = (await maker.get(`/api/tutorials/${f.tutorial.id}/article`)).body.doc;
    const steps = doc.content.filter((n: { type: string }) => n.type === 'step');
    expect(steps.map((s: { content: { type: string }[] }) => s.content.some((n) => n.type === 'still'))).toEqual([true, true]);
    // undo the draft: the write-up is empty again
    const draft = done.proposals.find((p) => p.kind === 'draft')!;
    await maker.post(`${url}/undo`, { ids: [draft.id] });
    const after = (await maker.get(`/api/tutorials/${f.tutorial.id}/article`)).body.doc;
    expect(after.content.some((n: { type: string }) => n.type === 'step')).toBe(false);
  });
});
