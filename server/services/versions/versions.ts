import type { Transaction } from 'sequelize';
import { reviewState, stateLabel, type Transition, type TutorialState } from '@shared/schemas/tutorial';
import { sequelize, Tutorial, TutorialVersion, type User } from '../../models';
import type { VersionContent, VersionKind } from '../../models/tutorial-version';
import { ConflictError, NotFoundError } from '../../lib/errors';
import { refreshPublicPage } from '../public-page-invalidation';
import { draftContent, sameContent, withOwnStills } from './content';

/**
 * Versions of a tutorial (DESIGN.md T4): approving keeps what was approved, publishing makes the
 * approved version the one readers see, sending back keeps what was sent back (to compare with
 * later). Edits after publishing are an update (`updateState`) that goes through the same moves.
 */

/** Keeps a version; the ones readers may see get their own copies of the stills. */
async function keepVersion(o: { tutorial: Tutorial; kind: VersionKind; content: VersionContent; by: User | null; note?: string; transaction?: Transaction }) {
  const content = o.kind === 'sent_back' ? o.content : await withOwnStills(o.tutorial.id, o.content);
  return TutorialVersion.create(
    { tutorialId: o.tutorial.id, kind: o.kind, content, createdById: o.by?.id ?? null, note: o.note?.trim() ?? '' },
    { transaction: o.transaction },
  );
}

/**
 * The content readers see of a published tutorial. One published before versions were kept gets
 * its version now, from its draft (which is what readers saw until then); the row lock keeps two
 * first readers from making two.
 */
export async function liveContent(tutorial: Tutorial): Promise<VersionContent> {
  if (tutorial.liveVersionId) {
    const v = await TutorialVersion.findByPk(tutorial.liveVersionId, { attributes: ['content'] });
    if (v) return v.content;
  }
  return sequelize.transaction(async (transaction) => {
    const row = await Tutorial.findByPk(tutorial.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new NotFoundError('Tutorial');
    const kept = row.liveVersionId ? await TutorialVersion.findByPk(row.liveVersionId, { transaction }) : null;
    const v = kept ?? (await keepVersion({ tutorial: row, kind: 'published', content: await draftContent(row, transaction), by: null, transaction }));
    if (!kept) await row.update({ liveVersionId: v.id }, { transaction });
    tutorial.set('liveVersionId', v.id, { raw: true });
    return v.content;
  });
}

/** Whether the draft differs from what readers see (false for a tutorial that is not published). */
export async function hasUnpublishedChanges(tutorial: Tutorial): Promise<boolean> {
  if (tutorial.state !== 'published') return false;
  const [live, draft] = await Promise.all([liveContent(tutorial), draftContent(tutorial)]);
  return !sameContent(live, draft);
}

/**
 * Publishes a tutorial, or the update of a published one: the approved version becomes what
 * readers see (the draft as it is now, for a tutorial approved before versions were kept). Edits
 * made since the approval are not published: they stay as an update in draft. The one function
 * every publish goes through (the Publish button, a scheduled publish); the caller has checked
 * that the person may publish, this checks the state.
 */
export async function publishTutorial(o: { tutorial: Tutorial; by: User | null; note?: string }): Promise<Tutorial> {
  const { tutorial } = o;
  await sequelize.transaction(async (transaction) => {
    await tutorial.reload({ transaction, lock: transaction.LOCK.UPDATE });
    if (reviewState(tutorial) !== 'approved')
      throw new ConflictError(`Only an approved tutorial or update can be published; this one is ${moveSubject(tutorial)}`);
    const approved = tutorial.approvedVersionId ? await TutorialVersion.findByPk(tutorial.approvedVersionId, { transaction }) : null;
    const content = approved?.content ?? (await draftContent(tutorial, transaction));
    const live = await keepVersion({ tutorial, kind: 'published', content, by: o.by, note: o.note, transaction });
    const rest = sameContent(await draftContent(tutorial, transaction), live.content) ? null : 'draft';
    await tutorial.update({ state: 'published', liveVersionId: live.id, approvedVersionId: null, updateState: rest, publishedAt: new Date() }, { transaction });
  });
  // Every app process forgets its cached page; this one renders the new version at once.
  await refreshPublicPage(tutorial.id);
  return tutorial;
}

/** "in review", or "an update in review" for a published tutorial's update: the subject of a move's messages. */
function moveSubject(t: Tutorial): string {
  return t.state === 'published' && t.updateState ? `an update ${stateLabel(t.updateState)}` : stateLabel(t.state);
}

/** The 409 of a move the state does not allow, in words that say why. */
export function refusedMove(t: Tutorial, action: Transition, label: string): ConflictError {
  if (t.state === 'published' && !t.updateState && action === 'submit') {
    return new ConflictError('Nothing has changed since it was published: edit the write-up, cut list or supplies first, then send the update for review');
  }
  const s = reviewState(t);
  const what = t.state === 'published' && t.updateState ? `Its update is ${stateLabel(s)}` : `A tutorial that is ${stateLabel(s)}`;
  return new ConflictError(`${what}: it cannot be moved with “${label}”`);
}

/**
 * Carries out a review move whose state and permission were checked: on the tutorial itself
 * before it is published, on its update after. Approving and sending back keep a version.
 */
export async function applyMove(o: { tutorial: Tutorial; action: Transition; to: TutorialState; by: User; note?: string }): Promise<void> {
  const { tutorial: t, action, by } = o;
  const isUpdate = t.state === 'published' && action !== 'unpublish';
  const setState = (to: TutorialState) => (isUpdate ? { updateState: to as Exclude<TutorialState, 'published'> } : { state: to });
  switch (action) {
    case 'submit': {
      if (isUpdate && !(await hasUnpublishedChanges(t))) {
        // Edits undone by hand: there is no update after all.
        await t.update({ updateState: null });
        throw refusedMove(t, 'submit', '');
      }
      await t.update(setState('in_review'));
      return;
    }
    case 'approve': {
      const v = await keepVersion({ tutorial: t, kind: 'approved', content: await draftContent(t), by, note: o.note });
      await t.update({ ...setState('approved'), approvedVersionId: v.id });
      return;
    }
    case 'sendBack': {
      await keepVersion({ tutorial: t, kind: 'sent_back', content: await draftContent(t), by, note: o.note });
      await t.update({ ...setState('needs_changes'), approvedVersionId: null });
      return;
    }
    case 'publish':
      await publishTutorial({ tutorial: t, by, note: o.note });
      return;
    case 'unpublish': {
      // What readers saw stays approved, so publishing again puts the same version back; edits
      // made since stay in the workspace.
      await liveContent(t);
      await t.update({ state: 'approved', approvedVersionId: t.liveVersionId, liveVersionId: null, updateState: null });
      await refreshPublicPage(t.id);
      return;
    }
  }
}

/** A tutorial's kept versions, newest first, without their contents. */
export function listVersions(tutorial: Tutorial): Promise<TutorialVersion[]> {
  return TutorialVersion.findAll({
    where: { tutorialId: tutorial.id },
    attributes: { exclude: ['content'] },
    include: [{ association: 'createdBy', attributes: ['id', 'name'] }],
    order: [['createdAt', 'DESC']],
    limit: 100,
  });
}
