import type { Response } from 'superagent';
import { describe, expect, it, beforeAll } from 'vitest';
import { PieceRow, Tutorial } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';

const app = testApp();
let f: StudioFixture;

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (d: Buffer) => chunks.push(d));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  f = await makeStudio(app);
  await PieceRow.create({ tutorialId: f.tutorial.id, name: 'Base circle', shape: 'circle', width: '6 in', height: '6 in', position: 0 });
  await PieceRow.create({
    tutorialId: f.tutorial.id,
    name: 'Card base',
    width: '17/2 in',
    height: '11/2 in',
    position: 1,
    scoreLines: [{ axis: 'width', at: '17/4 in' }],
  });
  await (
    await f.clientFor('maker')
  ).put(`/api/tutorials/${f.tutorial.id}/article`, {
    version: 0,
    doc: {
      type: 'doc',
      content: [
        { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Test tutorial' }] },
        { type: 'step', attrs: { atMs: 0, chapterId: null }, content: [{ type: 'stepTitle', content: [{ type: 'text', text: 'Fold the base' }] }] },
      ],
    },
  });
});

describe('exports of a draft (P1-P4)', () => {
  it('are private: 404 signed out and for another studio, 200 for the studio’s coordinator', async () => {
    const url = `/api/tutorials/${f.tutorial.id}/export/description.txt`;
    expect((await (await f.clientFor('anonymous')).get(url)).status).toBe(404);
    expect((await (await f.clientFor('outsider')).get(url)).status).toBe(404);
    expect((await (await f.clientFor('student')).get(url)).status).toBe(403);
    expect((await (await f.clientFor('coordinator')).get(url)).status).toBe(200);
  });
  it('400 for an unknown paper size', async () => {
    expect((await (await f.clientFor('maker')).get(`/api/tutorials/${f.tutorial.id}/export/handout.pdf?paper=b5`)).status).toBe(400);
  });
  it('handout and template PDFs come in Letter and A4 page sizes (PDF reference: 1 pt = 1/72 in; Letter 612 x 792, A4 595.28 x 841.89)', async () => {
    const c = await f.clientFor('maker');
    for (const [paper, size] of [
      ['letter', '612 792'],
      ['a4', '595.28 841.89'],
    ] as const) {
      for (const kind of ['handout', 'template']) {
        const res = await c.get(`/api/tutorials/${f.tutorial.id}/export/${kind}.pdf?paper=${paper}`).buffer(true).parse(binary);
        expect(res.status).toBe(200);
        expect(res.headers['content-type']).toBe('application/pdf');
        const text = (res.body as Buffer).toString('latin1');
        expect(text.startsWith('%PDF-')).toBe(true);
        const box = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(text)!;
        expect(`${Number(box[1])} ${Number(box[2])}`).toBe(size);
      }
    }
  });
  it('the template SVG carries physical units matching its viewBox', async () => {
    const res = await (await f.clientFor('maker')).get(`/api/tutorials/${f.tutorial.id}/export/template.svg?paper=letter`).buffer(true).parse(binary);
    const svg = (res.body as Buffer).toString('utf8');
    expect(svg).toMatch(/<svg[^>]*width="8\.5in"[^>]*height="11in"/);
    expect(svg).toMatch(/viewBox="0 0 8\.5 11"/);
    expect(res.headers['x-page-count']).toBeTruthy();
  });
  it('template.json says how many SVG pages the template takes, the same count the SVG export carries', async () => {
    const c = await f.clientFor('maker');
    const info = await c.get(`/api/tutorials/${f.tutorial.id}/export/template.json?paper=letter`);
    expect(info.status).toBe(200);
    const svg = await c.get(`/api/tutorials/${f.tutorial.id}/export/template.svg?paper=letter`).buffer(true).parse(binary);
    expect(info.body).toEqual({ kind: 'ready', pageCount: Number(svg.headers['x-page-count']) });
    const empty = await Tutorial.create({
      studioId: f.studio.id,
      authorId: f.users.maker.id,
      title: 'Empty',
      slug: `empty-${crypto.randomUUID().slice(0, 8)}`,
    });
    const none = await c.get(`/api/tutorials/${empty.id}/export/template.json?paper=a4`);
    expect(none.status).toBe(200);
    expect(none.body).toEqual({ kind: 'empty', message: expect.stringMatching(/cut list is empty/) });
  });
  it('the zip holds index.html; the description starts its chapters at 0:00', async () => {
    const c = await f.clientFor('maker');
    const zip = await c.get(`/api/tutorials/${f.tutorial.id}/export/zip`).buffer(true).parse(binary);
    expect(zip.status).toBe(200);
    expect((zip.body as Buffer).subarray(0, 2).toString()).toBe('PK');
    expect((zip.body as Buffer).toString('latin1')).toContain('index.html');
    const html = await c.get(`/api/tutorials/${f.tutorial.id}/export/html?format=json`);
    expect(html.body.html).toContain('<article');
    expect(html.body.text).toContain('Fold the base');
  });
});

describe('once published (P5)', () => {
  it('the public page offers every page of the SVG template', async () => {
    const g = await makeStudio(app);
    // 7 x 9 in panels: one nearly fills a Letter page inside 1/2 in margins (7.5 x 10 in), so no two share a page.
    for (const [i, name] of ['Front panel', 'Back panel', 'Inner panel'].entries())
      await PieceRow.create({ tutorialId: g.tutorial.id, name, width: '7 in', height: '9 in', position: i });
    await Tutorial.update({ state: 'published' }, { where: { id: g.tutorial.id } });
    const anon = await g.clientFor('anonymous');
    const page = await anon.get(`/t/${g.studio.slug}/${g.tutorial.slug}`);
    const { pageCount } = (await anon.get(`/api/tutorials/${g.tutorial.id}/export/template.json?paper=letter`)).body as { pageCount: number };
    expect(pageCount).toBeGreaterThanOrEqual(3);
    for (let n = 1; n <= pageCount; n++) {
      expect(page.text).toContain(`template.svg?paper=letter&amp;page=${n}">Cutting template SVG, page ${n} of ${pageCount}</a>`);
      expect((await anon.get(`/api/tutorials/${g.tutorial.id}/export/template.svg?paper=letter&page=${n}`)).status).toBe(200);
    }
    expect(page.text).not.toContain(`page=${pageCount + 1}`);
  });

  it('exports and the public page open to anyone; unpublishing closes them again', async () => {
    await Tutorial.update({ state: 'published' }, { where: { id: f.tutorial.id } });
    const anon = await f.clientFor('anonymous');
    expect((await anon.get(`/api/tutorials/${f.tutorial.id}/export/html`)).status).toBe(200);
    const page = await anon.get(`/t/${f.studio.slug}/${f.tutorial.slug}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Fold the base');
    expect(page.text).toContain('handout.pdf?paper=a4');
    expect((await anon.get(`/t/${f.studio.slug}/${f.tutorial.slug}/print?paper=a4`)).text).toContain('size: A4');
    await Tutorial.update({ state: 'approved' }, { where: { id: f.tutorial.id } });
    expect((await anon.get(`/t/${f.studio.slug}/${f.tutorial.slug}`)).status).toBe(404);
    const missing = await anon.get(`/t/${f.studio.slug}/no-such-tutorial`);
    // The not-found page fits a phone as the public page does.
    expect(missing.text).toContain('<meta name="viewport" content="width=device-width, initial-scale=1">');
    expect((await anon.get(`/api/tutorials/${f.tutorial.id}/export/html`)).status).toBe(404);
  });
});
