import { describe, expect, it } from 'vitest';
import type { JSONContent } from '@tiptap/core';
import { Chapter, Membership, PieceRow, Recording, Still, Studio, Tutorial } from '@server/models';
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
      return [await Membership.count({ where: { studioId: studio!.id } }), ids.length, await PieceRow.count({ where: { tutorialId: ids } }), await Recording.count({ where: { tutorialId: ids } })];
    };
    const before = await counts();
    await seedDemo();
    expect(await counts()).toEqual(before);

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
  }, 180_000);
});
