import { execFile } from 'node:child_process';
import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import type { Response } from 'superagent';
import { beforeAll, describe, expect, it } from 'vitest';
import { Tutorial, TutorialVersion } from '@server/models';
import { probePdf } from '@server/services/publish/pdf-probe';
import type { CompareDto } from '@shared/schemas/version';
import { testApp } from '../../../tests/harness/app';
import type { TestClient } from '../../../tests/harness/client';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

/**
 * What is published stays as approved (DESIGN.md T4): after publishing, the maker's edits make an
 * update that readers do not see (public page, every export, the reader's view) until it is sent,
 * approved and published; the comparison says what was added, removed and changed.
 */
const app = testApp();
const run = promisify(execFile);

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (d: Buffer) => chunks.push(d));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

const doc = (intro: string, stepTitle: string) => ({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Round keepsake box' }] },
    { type: 'paragraph', content: [{ type: 'text', text: intro }] },
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Supplies' }] },
    { type: 'supplyList', attrs: { grouped: true } },
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Cut list' }] },
    { type: 'cutList', attrs: { units: 'both' } },
    { type: 'step', attrs: { atMs: 0, chapterId: null }, content: [{ type: 'stepTitle', content: [{ type: 'text', text: stepTitle }] }] },
  ],
});

const APPROVED = { intro: 'Wrap the lid in mulberry vellum.', step: 'Score the mulberry band', piece: 'Base circle', supply: 'Mulberry vellum' };
const EDITED = { intro: 'Wrap the lid in tangerine foil.', step: 'Score the tangerine band', piece: 'Bottom disc', supply: 'Tangerine foil' };

/** Every output readers can get, as text: the public page, its print view, every export and the reader's view. */
async function everythingReadersSee(c: TestClient, f: StudioFixture, query = ''): Promise<Record<string, string>> {
  const anonymousClient = await f.clientFor('anonymous');
  const t = await Tutorial.findByPk(f.tutorial.id);
  const api = `/api/tutorials/${f.tutorial.id}`;
  const q = (extra = '') => (query ? `?${query}${extra ? `&${extra}` : ''}` : extra ? `?${extra}` : '');
  const pdfText = async (url: string) => {
    const res = await c.get(url).buffer(true).parse(binary);
    expect(res.status, url).toBe(200);
    return (await probePdf(res.body as Buffer)).map((p) => p.text).join(' ');
  };
  const text = async (url: string) => {
    const res = await c.get(url);
    expect(res.status, url).toBe(200);
    return res.text;
  };
  const zip = await c.get(`${api}/export/zip${q()}`).buffer(true).parse(binary);
  expect(zip.status).toBe(200);
  const dir = await mkdtemp(join(tmpdir(), 'versions-'));
  await writeFile(join(dir, 'blog.zip'), zip.body as Buffer);
  const out: Record<string, string> = {
    blogPage: await text(`${api}/export/html${q()}`),
    blogJson: JSON.stringify((await c.get(`${api}/export/html${q('format=json')}`)).body),
    zip: (await run('unzip', ['-p', join(dir, 'blog.zip'), 'index.html'])).stdout,
    handout: await pdfText(`${api}/export/handout.pdf${q('paper=letter')}`),
    templatePdf: await pdfText(`${api}/export/template.pdf${q('paper=a4')}`),
    templateSvg: (
      (
        await c
          .get(`${api}/export/template.svg${q('paper=letter')}`)
          .buffer(true)
          .parse(binary)
      ).body as Buffer
    ).toString('utf8'),
    description: await text(`${api}/export/description.txt${q()}`),
    printView: await text(`/print/${f.tutorial.id}${q('paper=letter')}`),
  };
  // The Markdown export is for signed-in people (the studio and its students).
  if (c !== anonymousClient) out.markdown = await text(`${api}/article/markdown${q()}`);
  if (!query) {
    out.publicPage = await text(`/t/${f.studio.slug}/${t!.slug}`);
    out.publicPrint = await text(`/t/${f.studio.slug}/${t!.slug}/print`);
    out.reader = JSON.stringify((await c.get(`${api}/published`)).body);
  }
  return out;
}

/** A studio with a written, cut and supplied tutorial, sent, approved and published. */
async function publishedTutorial(): Promise<StudioFixture> {
  const f = await makeStudio(app);
  const maker = await f.clientFor('maker');
  const coordinator = await f.clientFor('coordinator');
  const id = f.tutorial.id;
  expect((await maker.put(`/api/tutorials/${id}/article`, { version: 0, doc: doc(APPROVED.intro, APPROVED.step) })).status).toBe(200);
  expect((await maker.post(`/api/tutorials/${id}/pieces`, { name: APPROVED.piece, shape: 'circle', width: '6 in' })).status).toBe(201);
  expect((await maker.post(`/api/tutorials/${id}/pieces`, { name: 'Wall strip', width: '19 in', height: '3 in' })).status).toBe(201);
  expect((await maker.post(`/api/tutorials/${id}/supplies`, { category: 'paper', name: APPROVED.supply, quantity: '1 sheet' })).status).toBe(201);
  expect((await maker.post(`/api/tutorials/${id}/state`, { action: 'submit' })).status).toBe(200);
  expect((await coordinator.post(`/api/tutorials/${id}/state`, { action: 'approve' })).status).toBe(200);
  const pub = await coordinator.post(`/api/tutorials/${id}/state`, { action: 'publish' });
  expect(pub.status).toBe(200);
  expect(pub.body).toMatchObject({ state: 'published', updateState: null, pendingUpdate: false });
  return f;
}

/** The maker's edits after publishing: the write-up, a piece renamed, a supply added. */
async function editAfterPublishing(f: StudioFixture, text = EDITED) {
  const maker = await f.clientFor('maker');
  const id = f.tutorial.id;
  const { version } = (await maker.get(`/api/tutorials/${id}/article`)).body as { version: number };
  expect((await maker.put(`/api/tutorials/${id}/article`, { version, doc: doc(text.intro, text.step) })).status).toBe(200);
  const pieces = (await maker.get(`/api/tutorials/${id}/pieces`)).body as { pieces: { id: string; name: string }[] };
  const base = pieces.pieces.find((p) => p.name === APPROVED.piece);
  if (base) expect((await maker.patch(`/api/pieces/${base.id}`, { name: text.piece })).status).toBe(200);
  expect((await maker.post(`/api/tutorials/${id}/supplies`, { category: 'embellishment', name: text.supply })).status).toBe(201);
}

/** The outputs that carry the write-up's words (the templates carry only the pieces' names). */
const withoutTemplates = ({ templatePdf: _p, templateSvg: _s, ...rest }: Record<string, string>) => rest;

const expectShows = (outputs: Record<string, string>, shown: string[], hidden: string[]) => {
  for (const [name, body] of Object.entries(outputs)) {
    for (const s of shown) expect(body, `${name} shows “${s}”`).toContain(s);
    for (const s of hidden) expect(body, `${name} hides “${s}”`).not.toContain(s);
  }
};

describe('a published tutorial keeps what was approved', () => {
  let f: StudioFixture;
  beforeAll(async () => {
    f = await publishedTutorial();
  });

  it('edits after publishing make a pending update; readers still get the approved version everywhere', async () => {
    await editAfterPublishing(f);
    const maker = await f.clientFor('maker');
    const t = await maker.get(`/api/tutorials/${f.tutorial.id}`);
    expect(t.body).toMatchObject({ state: 'published', updateState: 'draft', pendingUpdate: true });

    const outputs = await everythingReadersSee(maker, f);
    // Every reader's output, read by the maker (so the Markdown export is there too): the intro is in the page, the exports and the description; the step title and piece name in the article and handout.
    expectShows(withoutTemplates(outputs), [APPROVED.intro], [EDITED.intro]);
    for (const name of ['publicPage', 'blogPage', 'zip', 'markdown', 'handout', 'reader', 'printView', 'publicPrint'])
      expectShows({ [name]: outputs[name]! }, [APPROVED.step, APPROVED.piece, APPROVED.supply], [EDITED.step, EDITED.piece, EDITED.supply]);
    // The template labels its pieces; the description lists the supplies.
    expectShows({ templateSvg: outputs.templateSvg!, templatePdf: outputs.templatePdf! }, [APPROVED.piece], [EDITED.piece]);
    expectShows({ description: outputs.description! }, [APPROVED.supply], [EDITED.supply]);

    // The student (a reader) gets the same, and the workspace's draft is closed to them.
    const student = await f.clientFor('student');
    const asStudent = await everythingReadersSee(student, f);
    expectShows({ reader: asStudent.reader!, handout: asStudent.handout! }, [APPROVED.intro], [EDITED.intro]);
    expect((await student.get(`/api/tutorials/${f.tutorial.id}/article`)).status).toBe(403);
    expect((await student.get(`/api/tutorials/${f.tutorial.id}/pieces`)).status).toBe(403);
    expect((await student.get(`/api/tutorials/${f.tutorial.id}/supplies`)).status).toBe(403);
  });

  it('the people working on it can preview the update in every export with ?version=draft; nobody else can', async () => {
    const maker = await f.clientFor('maker');
    const draft = await everythingReadersSee(maker, f, 'version=draft');
    expectShows(
      { blogPage: draft.blogPage!, markdown: draft.markdown!, handout: draft.handout!, printView: draft.printView! },
      [EDITED.intro, EDITED.piece],
      [APPROVED.intro],
    );
    for (const who of ['student', 'anonymous'] as const) {
      const c = await f.clientFor(who);
      expect((await c.get(`/api/tutorials/${f.tutorial.id}/export/html?version=draft`)).status).toBe(403);
    }
    expect((await maker.get(`/api/tutorials/${f.tutorial.id}/export/html?version=latest`)).status).toBe(400);
  });

  it('compares the published version with the draft: added, removed and changed, side by side', async () => {
    const maker = await f.clientFor('maker');
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/compare?from=published&to=draft`);
    expect(res.status).toBe(200);
    const c = res.body as CompareDto;
    expect(c.identical).toBe(false);
    expect(c.from).toMatchObject({ kind: 'published', label: 'What readers see now' });
    expect(c.to).toMatchObject({ kind: 'draft', id: null });
    // The intro and the step title each changed in place, word by word.
    expect(c.writeUp.changed.map((r) => [r.before, r.after])).toEqual([
      [APPROVED.intro, EDITED.intro],
      [APPROVED.step, EDITED.step],
    ]);
    expect(c.writeUp.changed[0]!.beforeParts).toContainEqual({ text: 'mulberry vellum', removed: true });
    expect(c.writeUp.changed[0]!.afterParts).toContainEqual({ text: 'tangerine foil', added: true });
    expect(c.writeUp.added).toEqual([]);
    expect(c.writeUp.removed).toEqual([]);
    // The piece was renamed (one changed row, with the field), the wall strip did not change.
    expect(c.cutList.changed).toHaveLength(1);
    expect(c.cutList.changed[0]!.changes).toEqual([{ field: 'name', label: 'Name', before: APPROVED.piece, after: EDITED.piece }]);
    expect(c.cutList.unchanged).toBe(1);
    expect(c.cutList.added).toEqual([]);
    expect(c.supplies.added.map((r) => r.name)).toEqual([EDITED.supply]);
    expect(c.supplies.removed).toEqual([]);
    expect(c.supplies.unchanged).toBe(1);
  });

  it('the update goes through review; readers see it only once it is published', async () => {
    const maker = await f.clientFor('maker');
    const coordinator = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/state`;
    // A maker may not approve or publish their own update.
    expect((await maker.post(url, { action: 'approve' })).status).toBe(409);
    const sent = await maker.post(url, { action: 'submit', note: 'Switched the lid paper' });
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({ state: 'published', updateState: 'in_review', pendingUpdate: true });
    expect((await maker.post(url, { action: 'approve' })).status).toBe(403);
    expect((await coordinator.post(url, { action: 'approve' })).body).toMatchObject({ state: 'published', updateState: 'approved' });
    const anon = await f.clientFor('anonymous');
    expectShows({ page: (await everythingReadersSee(anon, f)).publicPage! }, [APPROVED.intro], [EDITED.intro]);
    const published = await coordinator.post(url, { action: 'publish' });
    expect(published.body).toMatchObject({ state: 'published', updateState: null, pendingUpdate: false });
    const outputs = await everythingReadersSee(await f.clientFor('student'), f);
    expectShows(withoutTemplates(outputs), [EDITED.intro], [APPROVED.intro]);
    for (const name of ['publicPage', 'blogPage', 'zip', 'markdown', 'handout', 'reader', 'printView'])
      expectShows({ [name]: outputs[name]! }, [EDITED.step, EDITED.piece, EDITED.supply], [APPROVED.step, APPROVED.piece]);
    expectShows({ templateSvg: outputs.templateSvg! }, [EDITED.piece], [APPROVED.piece]);
    // The history tells the update's moves from the tutorial's own.
    const history = (await maker.get(`/api/tutorials/${f.tutorial.id}/history`)).body as {
      history: { action: string; from: string; to: string; update: boolean }[];
    };
    expect(history.history.map((h) => [h.action, h.from, h.to, h.update])).toEqual([
      ['publish', 'approved', 'published', true],
      ['approve', 'in_review', 'approved', true],
      ['submit', 'draft', 'in_review', true],
      ['publish', 'approved', 'published', false],
      ['approve', 'in_review', 'approved', false],
      ['submit', 'draft', 'in_review', false],
    ]);
    // Nothing left to send: the draft is what readers see.
    expect((await maker.post(url, { action: 'submit' })).status).toBe(409);
    const same = (await maker.get(`/api/tutorials/${f.tutorial.id}/compare`)).body as CompareDto;
    expect(same.identical).toBe(true);
  });
});

describe('what is published is what was approved', () => {
  it('a piece whose size in the published version cannot be used stays out of everything readers see', async () => {
    const f = await publishedTutorial();
    const t = (await Tutorial.findByPk(f.tutorial.id))!;
    // A version kept before lengths were bounded, or edited by hand, may hold a size that does not read.
    const live = (await TutorialVersion.findByPk(t.liveVersionId!))!;
    const pieces = live.content.pieces.map((p) => (p.name === APPROVED.piece ? { ...p, width: 'twelve-ish' } : p));
    await live.update({ content: { ...live.content, pieces } });
    const outputs = await everythingReadersSee(await f.clientFor('anonymous'), f);
    const drawn = { templatePdf: outputs.templatePdf, templateSvg: outputs.templateSvg, blogJson: outputs.blogJson, handout: outputs.handout };
    expectShows(drawn, ['Wall strip'], [APPROVED.piece, 'twelve-ish']);
  });

  it('edits made after the approval wait for the next update', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const coordinator = await f.clientFor('coordinator');
    const id = f.tutorial.id;
    const url = `/api/tutorials/${id}/state`;
    await maker.put(`/api/tutorials/${id}/article`, { version: 0, doc: doc(APPROVED.intro, APPROVED.step) });
    await maker.post(url, { action: 'submit' });
    await coordinator.post(url, { action: 'approve' });
    // Written between the approval and the publication: not approved, so not published.
    await maker.put(`/api/tutorials/${id}/article`, { version: 1, doc: doc(EDITED.intro, EDITED.step) });
    const pub = await coordinator.post(url, { action: 'publish' });
    expect(pub.body).toMatchObject({ state: 'published', updateState: 'draft', pendingUpdate: true });
    const t = (await Tutorial.findByPk(id))!;
    const page = await (await f.clientFor('anonymous')).get(`/t/${f.studio.slug}/${t.slug}`);
    expect(page.text).toContain(APPROVED.intro);
    expect(page.text).not.toContain(EDITED.intro);
  });

  it('a sent-back update is compared with what was sent back; unpublishing still takes the page down', async () => {
    const f = await publishedTutorial();
    const maker = await f.clientFor('maker');
    const coordinator = await f.clientFor('coordinator');
    const id = f.tutorial.id;
    const url = `/api/tutorials/${id}/state`;
    await editAfterPublishing(f);
    await maker.post(url, { action: 'submit' });
    const back = await coordinator.post(url, { action: 'sendBack', note: 'Keep the vellum, it is what the shop sells' });
    expect(back.body).toMatchObject({ state: 'published', updateState: 'needs_changes' });
    // Before any change since: nothing differs from what was sent back.
    expect(((await maker.get(`/api/tutorials/${id}/compare?from=sent_back`)).body as CompareDto).identical).toBe(true);
    const { version } = (await maker.get(`/api/tutorials/${id}/article`)).body as { version: number };
    await maker.put(`/api/tutorials/${id}/article`, { version, doc: doc('Wrap the lid in mulberry vellum, as the shop sells it.', EDITED.step) });
    const since = (await maker.get(`/api/tutorials/${id}/compare?from=sent_back`)).body as CompareDto;
    expect(since.from.kind).toBe('sent_back');
    expect(since.writeUp.changed.map((r) => [r.before, r.after])).toEqual([[EDITED.intro, 'Wrap the lid in mulberry vellum, as the shop sells it.']]);
    expect(since.cutList.changed).toEqual([]);
    expect(since.supplies.added).toEqual([]);
    // The versions kept: published, approved, sent back; the live one marked.
    const versions = (await maker.get(`/api/tutorials/${id}/versions`)).body as {
      versions: { kind: string; live: boolean; note: string }[];
      updateState: string;
    };
    expect(versions.updateState).toBe('needs_changes');
    expect(versions.versions.map((v) => v.kind)).toEqual(['sent_back', 'published', 'approved']);
    expect(versions.versions.find((v) => v.kind === 'sent_back')!.note).toBe('Keep the vellum, it is what the shop sells');
    expect(versions.versions.filter((v) => v.live).map((v) => v.kind)).toEqual(['published']);

    const t = (await Tutorial.findByPk(id))!;
    const anon = await f.clientFor('anonymous');
    const unpub = await coordinator.post(url, { action: 'unpublish' });
    expect(unpub.body).toMatchObject({ state: 'approved', updateState: null, pendingUpdate: false });
    expect((await anon.get(`/t/${f.studio.slug}/${t.slug}`)).status).toBe(404);
    expect((await anon.get(`/api/tutorials/${id}/published`)).status).toBe(404);
    // Publishing again puts back the version readers had, not the edits that were sent back.
    await coordinator.post(url, { action: 'publish' });
    const page = await anon.get(`/t/${f.studio.slug}/${t.slug}`);
    expect(page.text).toContain(APPROVED.intro);
    expect((await Tutorial.findByPk(id))!.updateState).toBe('draft');
  });

  it('every kind of edit readers would see starts an update; reading does not', async () => {
    const f = await publishedTutorial();
    const maker = await f.clientFor('maker');
    const id = f.tutorial.id;
    const reset = () => Tutorial.update({ updateState: null }, { where: { id } });
    const state = async () => (await Tutorial.findByPk(id))!.updateState;
    const pieces = (await maker.get(`/api/tutorials/${id}/pieces`)).body as { pieces: { id: string }[] };
    const supplies = (await maker.get(`/api/tutorials/${id}/supplies`)).body as { supplies: { id: string }[] };
    const edits: [string, () => Promise<{ status: number }>][] = [
      ['rename the tutorial', () => maker.patch(`/api/tutorials/${id}`, { title: 'Round keepsake box, revised' })],
      ['set the video address', () => maker.patch(`/api/tutorials/${id}`, { videoUrl: 'https://video.example/box' })],
      ['change the ruler', () => maker.patch(`/api/tutorials/${id}`, { precision: 32 })],
      ['add a piece', () => maker.post(`/api/tutorials/${id}/pieces`, { name: 'Lid', shape: 'circle', width: '6 1/8 in' })],
      ['resize a piece', () => maker.patch(`/api/pieces/${pieces.pieces[0]!.id}`, { width: '6 1/4 in' })],
      ['delete a piece', () => maker.delete(`/api/pieces/${pieces.pieces[1]!.id}`)],
      ['add a material', () => maker.post(`/api/tutorials/${id}/materials`, { name: 'Kraft cardstock', sheetWidth: '12 in', sheetHeight: '12 in' })],
      ['add a supply', () => maker.post(`/api/tutorials/${id}/supplies`, { category: 'tool', name: 'Bone folder' })],
      ['edit a supply', () => maker.patch(`/api/supplies/${supplies.supplies[0]!.id}`, { quantity: '2 sheets' })],
      ['delete a supply', () => maker.delete(`/api/supplies/${supplies.supplies[0]!.id}`)],
      ['write the disclosure', () => maker.put(`/api/tutorials/${id}/disclosure`, { disclosure: 'Links to the shop are sponsored.' })],
    ];
    for (const [what, edit] of edits) {
      await reset();
      const res = await edit();
      expect(res.status, what).toBeLessThan(300);
      expect(await state(), what).toBe('draft');
    }
    await reset();
    await maker.get(`/api/tutorials/${id}/compare`);
    await maker.get(`/api/tutorials/${id}/export/html?version=draft`);
    expect(await state()).toBeNull();
  });
});

describe('who may see versions', () => {
  it('401 signed out, 403 for a student, 404 for another studio, 200 for the maker; the reader’s view is for published tutorials', async () => {
    const f = await makeStudio(app);
    const id = f.tutorial.id;
    for (const path of ['versions', 'compare?from=sent_back']) {
      expect((await (await f.clientFor('anonymous')).get(`/api/tutorials/${id}/${path}`)).status).toBe(401);
      expect((await (await f.clientFor('student')).get(`/api/tutorials/${id}/${path}`)).status).toBe(403);
      expect((await (await f.clientFor('outsider')).get(`/api/tutorials/${id}/${path}`)).status).toBe(404);
    }
    expect((await (await f.clientFor('maker')).get(`/api/tutorials/${id}/compare?from=nonsense`)).status).toBe(400);
    // Nothing published or sent back yet: the version asked for is not there.
    const none = await (await f.clientFor('maker')).get(`/api/tutorials/${id}/compare`);
    expect(none.status).toBe(404);
    expect(none.body.error).toMatch(/not published/);
    expect((await (await f.clientFor('maker')).get(`/api/tutorials/${id}/compare?from=sent_back`)).body.error).toMatch(/not been sent back/);
    expect((await (await f.clientFor('maker')).get(`/api/tutorials/${id}/versions`)).body).toEqual({ versions: [], updateState: null, pendingUpdate: false });
    expect((await (await f.clientFor('maker')).get(`/api/tutorials/${id}/published`)).status).toBe(404);
    expect((await (await f.clientFor('student')).get(`/api/tutorials/${id}/published`)).status).toBe(403);
  });
});
