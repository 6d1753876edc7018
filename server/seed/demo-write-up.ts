import type { JSONContent } from '@tiptap/core';
import { Article, Supply, type Tutorial, type User } from '../models';
import { draftFor, saveArticle } from '../services/write-up';
import { DEMO_SUPPLIES as SUPPLIES } from './demo-pieces';

const para = (text: string): JSONContent => ({ type: 'paragraph', content: [{ type: 'text', text }] });

/** The maker's light edit of the draft: an intro in their own words, a tip and a caution. */
function lightlyEdited(draft: JSONContent): JSONContent {
  const content = [...(draft.content ?? [])];
  content[1] = para(
    'A round box with a wrapped wall and a lid that slips over it: a good first project for a circle cutter, and it holds a small gift or a stack of tags.',
  );
  const steps = content.filter((n) => n.type === 'step');
  const wrap = steps.find((s) => JSON.stringify(s).includes('Wrap and glue'));
  wrap?.content?.push({ type: 'tip', content: [para('Glue one strip at a time and let it set before adding the second; the overlap then sits flat.')] });
  const cut = steps.find((s) => JSON.stringify(s).includes('Score and notch'));
  cut?.content?.push({
    type: 'caution',
    content: [para('Snip the notches with the blade moving away from your fingers, and close the craft knife between cuts.')],
  });
  return { ...draft, content };
}

/** Supplies, and a write-up made from the draft and lightly edited, as a maker would. Runs once. */
export async function seedDemoWriteUp(tutorial: Tutorial, maker: User): Promise<void> {
  if (!(await Supply.findOne({ where: { tutorialId: tutorial.id }, attributes: ['id'] }))) {
    await Supply.bulkCreate(SUPPLIES.map((s, i) => ({ ...s, tutorialId: tutorial.id, position: i })));
  }
  if (await Article.findByPk(tutorial.id, { attributes: ['tutorialId'] })) return;
  const draft = await draftFor(tutorial);
  const first = await saveArticle({ tutorial, user: maker, doc: draft, version: 0, note: 'First draft from the footage', newRevision: true });
  await saveArticle({ tutorial, user: maker, doc: lightlyEdited(draft), version: first.version, newRevision: true });
}
