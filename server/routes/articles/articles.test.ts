import { describe, expect, it } from 'vitest';
import { Chapter, Cue, Recording, Revision, Still } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();
const para = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const doc = (...texts: string[]) => ({ type: 'doc', content: texts.map(para) });
const textOf = (d: { content?: { content?: { text?: string }[] }[] }) => JSON.stringify(d);

describe('article: version check (W3)', () => {
  it('401 signed out, 400 for a malformed doc, 403 for a student; a coordinator can edit', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(401);
    const maker = await f.clientFor('maker');
    expect((await maker.put(url, { doc: { type: 'doc', content: [{ type: 'nonsense' }] }, version: 0 })).status).toBe(400);
    expect((await maker.put(url, { version: 0 })).status).toBe(400);
    expect((await (await f.clientFor('student')).put(url, { doc: doc('x'), version: 0 })).status).toBe(403);
    expect((await (await f.clientFor('coordinator')).put(url, { doc: doc('Coordinator was here'), version: 0 })).status).toBe(200);
  });

  it('an empty write-up answers version 0; two writers on one version: the second gets 409 with the newer text, and nothing is lost', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const maker = await f.clientFor('maker');
    const coord = await f.clientFor('coordinator');
    const empty = await maker.get(url);
    expect(empty.body).toMatchObject({ version: 0, doc: { type: 'doc', content: [{ type: 'paragraph' }] } });
    const a = await maker.put(url, { doc: doc('Score the base at 2 1/8 in.'), version: 0 });
    expect(a.body.version).toBe(1);
    const b = await coord.put(url, { doc: doc('Coordinator edit from the same start'), version: 0 });
    expect(b.status).toBe(409);
    expect(b.body.version).toBe(1);
    expect(textOf(b.body.doc)).toContain('Score the base at 2 1/8 in.');
    // The coordinator merges by hand and saves on top of version 1.
    const merged = await coord.put(url, { doc: doc('Score the base at 2 1/8 in.', 'Coordinator edit from the same start'), version: 1 });
    expect(merged.body.version).toBe(2);
    const now = await maker.get(url);
    expect(textOf(now.body.doc)).toContain('Score the base');
    expect(textOf(now.body.doc)).toContain('Coordinator edit');
  });

  it('two saves racing on the same version: exactly one wins', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const [x, y] = await Promise.all([
      (await f.clientFor('maker')).put(url, { doc: doc('one'), version: 0 }),
      (await f.clientFor('owner')).put(url, { doc: doc('two'), version: 0 }),
    ]);
    expect([x.status, y.status].sort()).toEqual([200, 409]);
  });
});

describe('revisions', () => {
  it('keeps one revision per editing session, lists them with author, previews and restores as a new version', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const maker = await f.clientFor('maker');
    const coord = await f.clientFor('coordinator');
    await maker.put(url, { doc: doc('first words'), version: 0 });
    await maker.put(url, { doc: doc('first words, more'), version: 1 });
    await coord.put(url, { doc: doc('the coordinator rewrote it'), version: 2 });
    const list = await maker.get(`/api/tutorials/${f.tutorial.id}/revisions`);
    expect(list.body.revisions.map((r: { version: number; author: { name: string } }) => [r.version, r.author.name])).toEqual([
      [3, 'Test coordinator'],
      [2, 'Test maker'],
    ]);
    const older = list.body.revisions[1];
    const preview = await maker.get(`/api/revisions/${older.id}`);
    expect(textOf(preview.body.doc)).toContain('first words, more');
    expect((await (await f.clientFor('student')).post(`/api/revisions/${older.id}/restore`, { version: 3 })).status).toBe(403);
    expect((await maker.post(`/api/revisions/${older.id}/restore`, { version: 2 })).status).toBe(409);
    const restored = await maker.post(`/api/revisions/${older.id}/restore`, { version: 3 });
    expect(restored.body.version).toBe(4);
    expect(textOf((await maker.get(url)).body.doc)).toContain('first words, more');
    expect(await Revision.count({ where: { tutorialId: f.tutorial.id } })).toBe(3);
  });
});

async function withFootage(f: StudioFixture) {
  const rec = await Recording.create({
    tutorialId: f.tutorial.id,
    originalName: 'x.mp4',
    mime: 'video/mp4',
    sizeBytes: 1,
    sourceKey: 'recordings/x/source.mp4',
    durationMs: 60_000,
    status: 'ready',
  });
  await Cue.bulkCreate([
    { recordingId: rec.id, position: 0, startMs: 0, endMs: 5000, text: 'um hi everyone so today we we are making a treat box', identifier: null },
    {
      recordingId: rec.id,
      position: 1,
      startMs: 20000,
      endMs: 26000,
      text: 'okay so first cut the base four and a quarter by five and a half',
      identifier: null,
    },
    { recordingId: rec.id, position: 2, startMs: 40000, endMs: 46000, text: 'now score it at two and an eighth you know', identifier: null },
  ]);
  await Chapter.bulkCreate([
    { recordingId: rec.id, title: 'Introduction', startMs: 0 },
    { recordingId: rec.id, title: 'Cut the base', startMs: 20000 },
    { recordingId: rec.id, title: 'Score', startMs: 40000 },
  ]);
  const still = await Still.create({
    recordingId: rec.id,
    atMs: 22000,
    requestedMs: 22000,
    mode: 'exact',
    fileKey: 'recordings/x/stills/s.jpg',
    width: 640,
    height: 360,
    sharpness: null,
    caption: 'The base',
    alt: 'A kraft base panel',
  });
  return { rec, still };
}

describe('first draft (W2)', () => {
  it('409 with a clear message before there is footage', async () => {
    const f = await makeStudio(app);
    const res = await (await f.clientFor('maker')).post(`/api/tutorials/${f.tutorial.id}/draft`);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/Footage/);
  });
  it('a step per chapter with the chapter’s still; applying over a write-up keeps the old one as a revision', async () => {
    const f = await makeStudio(app);
    const { still } = await withFootage(f);
    const maker = await f.clientFor('maker');
    await maker.put(`/api/tutorials/${f.tutorial.id}/article`, { doc: doc('my own notes'), version: 0 });
    const preview = await maker.post(`/api/tutorials/${f.tutorial.id}/draft`);
    expect(preview.body.replaces).toBe(true);
    const steps = (preview.body.doc.content as { type: string }[]).filter((n) => n.type === 'step');
    // The introduction only greeted and said what we make: that goes to the intro, not a step.
    expect(steps).toHaveLength(2);
    const json = JSON.stringify(preview.body.doc);
    expect(json).toContain('Today we are making a treat box.');
    expect(json).not.toMatch(/hi everyone/i);
    expect(json).toContain(still.id);
    expect(json).toContain('4 1/4 x 5 1/2 in');
    expect(json).not.toMatch(/\bum\b|okay so|you know/);
    const applied = await maker.post(`/api/tutorials/${f.tutorial.id}/draft/apply`, { version: 1 });
    expect(applied.body.version).toBe(2);
    const revs = (await maker.get(`/api/tutorials/${f.tutorial.id}/revisions`)).body.revisions;
    expect(revs.map((r: { note: string }) => r.note)).toEqual(['First draft from the footage', '']);
    expect(textOf((await maker.get(`/api/revisions/${revs[1].id}`)).body.doc)).toContain('my own notes');
  });
});

describe('XSS through the API (OWASP XSS Filter Evasion Cheat Sheet)', () => {
  it('refuses javascript: links and unknown nodes in a saved document', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/article`;
    const maker = await f.clientFor('maker');
    for (const href of ['javascript:alert(1)', ' JaVaScRiPt:alert(1)', 'java\tscript:alert(1)', 'data:text/html,<script>alert(1)</script>']) {
      const evil = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'click', marks: [{ type: 'link', attrs: { href } }] }] }] };
      expect((await maker.put(url, { doc: evil, version: 0 })).status, href).toBe(400);
    }
    const script = { type: 'doc', content: [{ type: 'script', attrs: { src: 'x' } }] };
    expect((await maker.put(url, { doc: script, version: 0 })).status).toBe(400);
    const img = { type: 'doc', content: [{ type: 'still', attrs: { src: 'javascript:alert(1)', alt: 'x', caption: '' } }] };
    expect((await maker.put(url, { doc: img, version: 0 })).status).toBe(400);
  });
  it('Markdown import drops raw HTML script and event handlers', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const md = '# Card\n\n<script>alert(1)</script>\n\n<img src=x onerror=alert(1)>\n\n[click](javascript:alert(1))\n\nScore at 2 in.';
    const res = await maker.post(`/api/tutorials/${f.tutorial.id}/article/markdown`, { markdown: md, version: 0 });
    expect(res.status).toBe(200);
    const json = JSON.stringify(res.body.doc);
    // Raw HTML is dropped; a javascript: link stays as harmless text, never as a link.
    expect(json).not.toMatch(/<script|onerror/i);
    expect(json).not.toMatch(/"href":"\s*javascript:/i);
    expect(json).toContain('Score at 2 in.');
    const out = await maker.get(`/api/tutorials/${f.tutorial.id}/article/markdown`);
    expect(out.headers['content-type']).toMatch(/text\/markdown/);
    expect(out.text).toContain('Score at 2 in.');
  });
});
