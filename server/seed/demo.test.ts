import { describe, expect, it } from 'vitest';
import type { JSONContent } from '@tiptap/core';
import { Chapter, Comment, CraftClass, Membership, PieceRow, Recording, StateChange, Still, Studio, Tutorial } from '@server/models';
import { draftFor } from '@server/services/write-up';
import { DEMO_STUDIO, seedDemo } from './index';
import '../../tests/harness/app';

describe('the demo seed', () => {
  it('is idempotent, and a draft of the demo tutorial has one step per chapter with the right stills (W2)', async () => {
    await seedDemo();
    const studio = await Studio.findOne({ where: { slug: DEMO_STUDIO.slug } });
    // Only the demo studio's rows: other test files write to the same database at the same time.
    const counts = async () => {
      const ids = (await Tutorial.findAll({ where: { studioId: studio!.id }, attributes: ['id'] })).map((t) => t.id);
      return [
        await Membership.count({ where: { studioId: studio!.id } }),
        ids.length,
        await PieceRow.count({ where: { tutorialId: ids } }),
        await Recording.count({ where: { tutorialId: ids } }),
        await CraftClass.count({ where: { tutorialId: ids } }),
        await StateChange.count({ where: { tutorialId: ids } }),
        await Comment.count({ where: { tutorialId: ids } }),
      ];
    };
    const before = await counts();
    await seedDemo();
    expect(await counts()).toEqual(before);

    // a review trail: the published box went draft → in review → approved → published; the card waits in review with one open comment
    const bySlug = async (slug: string) => (await Tutorial.findOne({ where: { studioId: studio!.id, slug } }))!;
    const boxMoves = await StateChange.findAll({ where: { tutorialId: (await bySlug('round-keepsake-box')).id }, order: [['createdAt', 'ASC']] });
    expect(boxMoves.map((m) => [m.fromState, m.toState])).toEqual([
      ['draft', 'in_review'],
      ['in_review', 'approved'],
      ['approved', 'published'],
    ]);
    // what the box holds is what readers see: a published version, no update pending
    const box = await bySlug('round-keepsake-box');
    expect(box.liveVersionId).not.toBeNull();
    expect(box.updateState).toBeNull();
    const card = await bySlug('gatefold-birthday-card');
    expect((await StateChange.findAll({ where: { tutorialId: card.id } })).map((m) => m.toState)).toEqual([card.state]);
    expect(await Comment.count({ where: { tutorialId: card.id, resolvedAt: null } })).toBe(1);

    // one class of the published tutorial, in the future, so the Classes page and registration have something to show
    const demoClass = await CraftClass.findOne({ where: { studioId: studio!.id } });
    expect(demoClass!.startsAt.getTime()).toBeGreaterThan(Date.now());
    expect(demoClass!.timeZone).toBe('America/Chicago');

    const tutorial = await Tutorial.findOne({ where: { studioId: studio!.id, slug: 'round-keepsake-box' } });
    const rec = await Recording.findOne({ where: { tutorialId: tutorial!.id } });
    expect(rec!.status).toBe('ready');
    const chapters = await Chapter.findAll({ where: { recordingId: rec!.id }, order: [['startMs', 'ASC']] });
    const stills = await Still.findAll({ where: { recordingId: rec!.id }, order: [['atMs', 'ASC']] });
    const draft = await draftFor(tutorial!);
    const steps = (draft.content ?? []).filter((n) => n.type === 'step');
    expect(steps).toHaveLength(chapters.length);
    steps.forEach((step, i) => {
      const from = chapters[i].startMs;
      const to = chapters[i + 1]?.startMs ?? Infinity;
      const expected = stills.find((s) => s.atMs >= from && s.atMs < to);
      const placed = (step.content ?? []).find((n: JSONContent) => n.type === 'still');
      expect(step.attrs?.atMs).toBe(from);
      expect(placed?.attrs?.stillId ?? null).toBe(expected?.id ?? null);
    });
  }, 420_000); // it encodes the demo video with ffmpeg: slow on a busy machine
});
