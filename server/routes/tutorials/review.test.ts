import { describe, expect, it } from 'vitest';
import { Chapter, Recording, StateChange, Studio, Supply } from '@server/models';
import { testApp } from '../../../tests/harness/app';
import { makeStudio } from '../../../tests/harness/factories';
import { mailsTo, mailTo } from '../../../tests/harness/mail';

const app = testApp();

describe('review moves and their history', () => {
  it('every move is recorded with who, when, from, to and the note, and listed newest first', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const coord = await f.clientFor('coordinator');
    const url = `/api/tutorials/${f.tutorial.id}/state`;
    expect((await maker.post(url, { action: 'submit', note: 'First go at the round box' })).status).toBe(200);
    expect((await coord.post(url, { action: 'sendBack', note: 'A few things to fix' })).status).toBe(200);
    expect((await maker.post(url, { action: 'submit', note: 'Fixed' })).status).toBe(200);
    expect((await coord.post(url, { action: 'approve' })).status).toBe(200);
    // A refused move leaves no trace.
    expect((await maker.post(url, { action: 'publish' })).status).toBe(403);
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/history`);
    expect(res.status).toBe(200);
    const h = res.body.history;
    expect(h.map((x: { action: string; from: string; to: string; by: { name: string }; note: string }) => [x.action, x.from, x.to, x.by.name, x.note])).toEqual(
      [
        ['approve', 'in_review', 'approved', 'Test coordinator', ''],
        ['submit', 'needs_changes', 'in_review', 'Test maker', 'Fixed'],
        ['sendBack', 'in_review', 'needs_changes', 'Test coordinator', 'A few things to fix'],
        ['submit', 'draft', 'in_review', 'Test maker', 'First go at the round box'],
      ],
    );
    expect(Date.parse(h[0].at)).toBeGreaterThanOrEqual(Date.parse(h[3].at));
    expect(await StateChange.count({ where: { tutorialId: f.tutorial.id } })).toBe(4);
  });

  it('a send-back keeps and mails the open comments, with a link to the Publish section', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const coord = await f.clientFor('coordinator');
    await maker.post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'submit' });
    const open = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'The lid photo is blurry' })).body;
    const done = (await coord.post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Typo in the intro' })).body;
    await coord.patch(`/api/comments/${done.id}`, { resolved: true });
    expect((await coord.post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'sendBack', note: 'Nearly there' })).status).toBe(200);
    const [last] = (await maker.get(`/api/tutorials/${f.tutorial.id}/history`)).body.history;
    expect(last.openComments).toEqual([{ id: open.id, body: 'The lid photo is blurry', where: 'The whole tutorial', author: 'Test coordinator' }]);
    const mail = await mailTo(f.users.maker.email, /“Test tutorial” was sent back/);
    expect(mail.text).toContain('Their note: Nearly there');
    expect(mail.text).toContain('Open comments (1):');
    expect(mail.text).toContain('1. The whole tutorial: The lid photo is blurry (Test coordinator)');
    expect(mail.text).not.toContain('Typo in the intro');
    expect(mail.text).toContain(`/tutorials/${f.tutorial.id}/publish`);
    expect(mail.html).toContain(`/tutorials/${f.tutorial.id}/publish`);
  });

  it('the mail reads as sentences: the move in words, one full stop after a studio name that ends with one', async () => {
    const f = await makeStudio(app);
    await Studio.update({ name: 'Paper & Co.' }, { where: { id: f.studio.id } });
    await (await f.clientFor('maker')).post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'submit' });
    await (await f.clientFor('coordinator')).post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'sendBack' });
    const mail = await mailTo(f.users.maker.email, /“Test tutorial” was sent back$/);
    expect(mail.text).toContain('from in review to needs changes in Paper & Co.\n');
    expect(mail.text).not.toContain('Co..');
    expect(mail.subject).not.toMatch(/ is needs /);
  });

  it('sending for review mails the coordinators and owners, not the maker; opting out of review mail stops only that', async () => {
    const f = await makeStudio(app);
    const coord = await f.clientFor('coordinator');
    await coord.put(`/api/studios/${f.studio.id}/mail-settings`, { stateMoves: false });
    await (await f.clientFor('maker')).post(`/api/tutorials/${f.tutorial.id}/state`, { action: 'submit', note: 'Ready' });
    const toOwner = await mailTo(f.users.owner.email, /“Test tutorial” was sent for review/);
    expect(toOwner.text).toContain('Test maker moved “Test tutorial” from draft to in review');
    expect(toOwner.text).toContain('Their note: Ready');
    expect(await mailsTo(f.users.maker.email)).toHaveLength(0);
    // The owner's mail arrived, so the coordinator's would have too.
    expect(await mailsTo(f.users.coordinator.email)).toHaveLength(0);
    await (await f.clientFor('maker')).post(`/api/tutorials/${f.tutorial.id}/comments`, { body: 'Question about the lid' });
    await mailTo(f.users.coordinator.email, /New comment/);
  });
});

describe('GET /api/tutorials/:id/checklist', () => {
  it('reports each item from the tutorial’s sections', async () => {
    const f = await makeStudio(app);
    const maker = await f.clientFor('maker');
    const step = (title: string, still?: { alt: string }) => ({
      type: 'step',
      content: [
        { type: 'stepTitle', content: [{ type: 'text', text: title }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'Words.' }] },
        ...(still ? [{ type: 'still', attrs: { src: '/media/x.jpg', alt: still.alt, caption: '' } }] : []),
      ],
    });
    await maker.put(`/api/tutorials/${f.tutorial.id}/article`, {
      version: 0,
      doc: { type: 'doc', content: [step('Cut', { alt: 'Base circle' }), step('Score'), step('Glue', { alt: '' })] },
    });
    await Supply.create({ tutorialId: f.tutorial.id, category: 'paper', name: 'Floral pad', url: 'https://shop.example/floral', sponsored: true });
    await maker.patch(`/api/tutorials/${f.tutorial.id}`, { dueDate: '2020-01-20' });
    await maker.post(`/api/tutorials/${f.tutorial.id}/pieces`, { name: 'Base', width: '4 1/4', height: '5 1/2' });
    const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: 'a.mp4', mime: 'video/mp4', sizeBytes: 1, sourceKey: 'a' });
    await Chapter.create({ recordingId: rec.id, startMs: 4000, title: 'Intro' });
    const res = await maker.get(`/api/tutorials/${f.tutorial.id}/checklist`);
    expect(res.status).toBe(200);
    const by = Object.fromEntries(res.body.items.map((i: { key: string; ok: boolean | null; detail: string }) => [i.key, [i.ok, i.detail]]));
    expect(by.stepPhotos).toEqual([false, 'Step 2 has no photo; Step 3 has a photo without alt text']);
    expect(by.disclosure).toEqual([true, '1 sponsored link; the disclosure is shown']);
    expect(by.cutList).toEqual([true, 'The piece passes its checks']);
    expect(by.chapters).toEqual([false, 'The first chapter does not start at 0:00']);
    expect(by.dueDate[0]).toBe(false);
    expect(res.body.total).toBe(5);
  });
});
