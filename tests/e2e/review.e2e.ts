import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { checkPage, describeViolations, watchConsole } from './a11y';
import { shot, signIn, useBrowser, call } from './browser';

const browser = useBrowser();
const PASSWORD = 'cardwright-demo';

const step = (title: string, text: string) => ({
  type: 'step',
  content: [
    { type: 'stepTitle', content: [{ type: 'text', text: title }] },
    { type: 'paragraph', content: [{ type: 'text', text }] },
  ],
});

/** The review state the tutorial's header badge and Status panel show. */
const statusSays = (page: Page, words: string) => page.getByRole('region', { name: 'Status' }).getByText(words, { exact: false }).first().isVisible();

// Scenario of our own: a maker's tag-pocket card goes through review with the demo coordinator.
describe('review in the browser, two people at once', () => {
  it('maker sends for review; coordinator comments on a step and sends back; maker replies, resolves and resends; coordinator approves', async () => {
    const makerCtx = await browser.context();
    const coordCtx = await browser.context();
    const maker = await makerCtx.newPage();
    const coord = await coordCtx.newPage();
    const noise = [watchConsole(maker), watchConsole(coord)];
    await signIn(maker, 'maker@example.com', PASSWORD);
    await signIn(coord, 'coordinator@example.com', PASSWORD);

    // The maker's tutorial with a two-step write-up (the write-up's own UI is tested elsewhere).
    const me = await call<{ studios: { id: string; name: string }[] }>(maker, 'GET', '/api/auth/me');
    const studioId = me.body.studios.find((s) => s.name === 'Juniper Lane Paper Co.')!.id;
    const made = await call<{ id: string }>(maker, 'POST', '/api/tutorials', { studioId, title: 'Tag pocket card' });
    const id = made.body.id;
    const doc = {
      type: 'doc',
      content: [
        step('Cut the pocket', 'Cut the pocket from floral patterned paper, 4 1/4 by 3 in.'),
        step('Score the flaps', 'Score the side flaps at 1/2 in and fold them in.'),
      ],
    };
    expect((await call(maker, 'PUT', `/api/tutorials/${id}/article`, { version: 0, doc })).status).toBe(200);

    // 1. The maker sends it for review with a short note.
    await maker.goto(`/tutorials/${id}/publish`);
    await maker.getByRole('button', { name: 'Send for review' }).click();
    const submitForm = maker.getByRole('form', { name: 'Send for review' });
    await submitForm.getByLabel('A short note for the coordinator').fill('First go; the pocket uses the new floral pad.');
    await submitForm.getByRole('button', { name: 'Send for review' }).click();
    await expect.poll(() => statusSays(maker, 'in review')).toBe(true);
    await expect.poll(() => maker.getByRole('region', { name: 'History' }).getByText('First go; the pocket uses the new floral pad.').isVisible()).toBe(true);

    // 2. The coordinator comments on step 2 from the step's own button, mentioning the maker.
    await coord.goto(`/tutorials/${id}/write-up`);
    await coord.locator('.ProseMirror').waitFor();
    await coord.getByRole('button', { name: 'Comment on step 2' }).click();
    const form = coord.getByRole('form', { name: 'New comment' });
    await expect.poll(() => form.getByLabel('About').inputValue()).toMatch(/^step:/);
    const box = form.getByLabel('Comment');
    await box.pressSequentially('Which way does the grain run? @Min');
    await coord.getByRole('option', { name: 'Mina Okafor' }).waitFor();
    await box.press('Enter');
    await expect.poll(() => box.inputValue()).toBe('Which way does the grain run? @Mina Okafor ');
    await form.getByRole('button', { name: 'Comment' }).click();
    const thread = coord.getByRole('article', { name: /Comment by Cass Whitlow on Step 2: Score the flaps/ });
    await thread.waitFor();
    // Its label shows the step it is about in the write-up.
    await thread.getByRole('button', { name: 'Step 2: Score the flaps' }).click();
    await expect.poll(() => coord.locator('[data-step-id].comment-target').getAttribute('aria-label')).toBe('Step 2: Score the flaps');

    // And on a passage: words selected in step 1.
    await coord.locator('[data-step-id]').first().getByText('floral patterned paper', { exact: false }).dblclick();
    await form.getByRole('button', { name: /Comment on the selected words in step 1/ }).click();
    await form.getByLabel('Comment').fill('Name the paper pad here.');
    await form.getByRole('button', { name: 'Comment' }).click();
    await coord.getByRole('article', { name: /on Step 1: Cut the pocket, “/ }).waitFor();

    // Axe-clean and fitting a phone, with comments beside (and below) the write-up.
    const checks = [await checkPage(coord, 'review-write-up-comments')];
    await coord.setViewportSize({ width: 390, height: 844 });
    checks.push(await checkPage(coord, 'review-write-up-comments'));
    await coord.setViewportSize({ width: 1360, height: 860 });

    // 3. The coordinator sends it back; the note lists the open comments.
    await coord.goto(`/tutorials/${id}/publish`);
    await coord.getByRole('button', { name: 'Send back' }).click();
    const back = coord.getByRole('form', { name: 'Send back' });
    await expect.poll(() => back.getByText('2 open comments go with the note:').isVisible()).toBe(true);
    await back.getByLabel('Note for the maker').fill('Nearly there: see the two comments.');
    await back.getByRole('button', { name: 'Send back to the maker' }).click();
    await expect.poll(() => statusSays(coord, 'needs changes')).toBe(true);
    checks.push(await checkPage(coord, 'review-publish-sent-back'));

    // The maker got the send-back by e-mail with the open comments and a link to the Publish section.
    const mail = await call<{ messages: { id: string; subject: string }[] }>(maker, 'GET', '/api/outbox');
    const sentBack = mail.body.messages.find((m) => m.subject === '“Tag pocket card” was sent back')!;
    expect(sentBack).toBeTruthy();
    const full = (await call<{ message: { text: string } }>(maker, 'GET', `/api/outbox/${sentBack.id}`)).body.message;
    expect(full.text).toContain('Their note: Nearly there: see the two comments.');
    expect(full.text).toContain('Open comments (2):');
    expect(full.text).toContain(`/tutorials/${id}/publish`);
    expect(mail.body.messages.some((m) => m.subject === 'Cass Whitlow mentioned you on “Tag pocket card”')).toBe(true);

    // 4. The maker replies to the step comment and resolves it, then resolves the other and resends.
    await maker.goto(`/tutorials/${id}/write-up`);
    const onStep = maker.getByRole('article', { name: /on Step 2: Score the flaps/ });
    await onStep.getByRole('button', { name: 'Reply' }).click();
    await onStep.getByLabel('Your reply').fill('Along the length; I added it to the step.');
    await onStep.getByRole('button', { name: 'Reply' }).click();
    await onStep.getByText('Along the length; I added it to the step.').waitFor();
    await onStep.getByRole('button', { name: 'Resolve' }).click();
    await expect.poll(() => onStep.count()).toBe(0);
    const toggle = maker.getByLabel('Show resolved (1)');
    await toggle.check();
    await maker.getByRole('article', { name: /on Step 2: Score the flaps \(resolved\)/ }).waitFor();
    await maker
      .getByRole('article', { name: /on Step 1: Cut the pocket/ })
      .getByRole('button', { name: 'Resolve' })
      .click();
    await expect.poll(() => maker.getByText('2 resolved', { exact: false }).first().isVisible()).toBe(true);
    await shot(maker, 'review-maker-resolved');
    await maker.goto(`/tutorials/${id}/publish`);
    await maker.getByRole('button', { name: 'Send for review' }).click();
    const again = maker.getByRole('form', { name: 'Send for review' });
    await again.getByLabel('A short note for the coordinator').fill('Grain noted in step 2.');
    await again.getByRole('button', { name: 'Send for review' }).click();
    await expect.poll(() => statusSays(maker, 'in review')).toBe(true);

    // 5. The coordinator sees the checklist and the history, and approves with a note.
    await coord.goto(`/tutorials/${id}/publish`);
    await coord.getByRole('region', { name: 'Review checklist' }).getByText('Every step has a photo with alt text').waitFor();
    const history = coord.getByRole('region', { name: 'History' });
    await history.getByText('Grain noted in step 2.').waitFor();
    await coord.getByRole('button', { name: 'Approve' }).click();
    const approve = coord.getByRole('form', { name: 'Approve' });
    await approve.getByLabel('Note for the maker (optional)').fill('Lovely. Publishing on the 20th.');
    await approve.getByRole('button', { name: 'Approve' }).click();
    await expect.poll(() => statusSays(coord, 'approved')).toBe(true);
    await expect.poll(() => history.getByText('Lovely. Publishing on the 20th.').isVisible()).toBe(true);
    expect(
      await history
        .getByRole('listitem')
        .filter({ hasText: /sent it for review|sent it back|approved it/ })
        .count(),
    ).toBe(4);
    checks.push(await checkPage(coord, 'review-publish-approved'));

    const problems = [
      ...checks.flatMap((c) => (c.violations.length ? [describeViolations(c.name, c.violations)] : [])),
      ...checks.filter((c) => c.overflowPx > 0).map((c) => `${c.name} is ${c.overflowPx} px wider than the window`),
      ...noise.flatMap((n) => n.take()),
    ];
    expect(problems.join('\n')).toBe('');
    await call(maker, 'DELETE', `/api/tutorials/${id}`);
    await makerCtx.close();
    await coordCtx.close();
  }, 180_000);
});
