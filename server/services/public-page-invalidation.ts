import type { Model, Transaction } from 'sequelize';
import { Article, Chapter, Material, PieceRow, Recording, sequelize, Still, Studio, Supply, Tutorial, User } from '../models';
import type { ChannelHandler } from '../lib/change-listener';
import { whenCommitted } from '../lib/when-committed';
import { dropLocalPublicPage, publicPage, setListening } from './public-pages';

/**
 * Keeps the public-page cache honest across app processes. A page is forgotten when anything it
 * shows changes: publishing and unpublishing (`refreshPublicPage`, called by the versions service),
 * and, through model hooks, a write to a tutorial's cut list, supplies, write-up, chapters, stills,
 * its title or its studio's name. Each app process LISTENs on one PostgreSQL channel; a change made
 * in any process (a worker's too) NOTIFYs it, so every process drops its copy. A process that loses
 * its listening connection forgets every page and listens again.
 */
const CHANNEL = 'cardwright_public_pages';
const ALL = '*';

/** Forgets a tutorial's public page in every process (null: every page), once the change is committed. */
export async function forgetPublicPage(tutorialId: string | null): Promise<void> {
  dropLocalPublicPage(tutorialId);
  await sequelize.query('SELECT pg_notify($1, $2)', { bind: [CHANNEL, tutorialId ?? ALL] });
}

/**
 * Publishing (or an approved update) refreshes the page: every process forgets its copy and this
 * one renders the new page at once, so the first reader after it does not wait for the render.
 */
export async function refreshPublicPage(tutorialId: string): Promise<void> {
  await forgetPublicPage(tutorialId);
  const t = await Tutorial.findByPk(tutorialId, { include: [{ model: Studio, as: 'studio', attributes: ['slug'] }] });
  if (t?.studio && t.state === 'published') {
    void publicPage(t.studio.slug, t.slug).catch((e: Error) => console.error('[public page]', e.message));
  }
}

type HookOptions = { transaction?: Transaction | null; where?: unknown; fields?: readonly PropertyKey[]; attributes?: unknown; model?: unknown };

/** Which tutorial a changed row belongs to: an id, null for "any" (studio, author) or undefined for "none". */
async function tutorialOf(model: unknown, row: Record<string, unknown>): Promise<string | null | undefined> {
  if (model === Tutorial) return typeof row.id === 'string' ? row.id : null;
  if (model === Studio) return null;
  if (typeof row.tutorialId === 'string') return row.tutorialId;
  if (typeof row.recordingId === 'string') {
    const rec = await Recording.findByPk(row.recordingId, { attributes: ['tutorialId'] });
    return rec?.tutorialId ?? undefined;
  }
  return null; // a row of a watched table whose tutorial cannot be told: forget every page
}

function afterCommit(options: HookOptions | undefined, fn: () => Promise<void>) {
  whenCommitted(options, () => void fn().catch((e: Error) => console.error('[public page]', e.message)));
}

const WATCHED = new Set<unknown>([Tutorial, Studio, PieceRow, Material, Supply, Article, Chapter, Still, Recording, User]);
// Rows whose changes never reach the page: a recording's progress and heartbeat, a password.
const quiet = (model: unknown, fields: readonly PropertyKey[] | undefined) => model === Recording || (model === User && !(fields ?? []).includes('name'));

let installed = false;

/** Installs the model hooks (once a process): app and worker processes both write what pages show. */
export function watchPublishedContent(): void {
  if (installed) return;
  installed = true;
  const onRow = (kind: 'write' | 'update') => (instance: Model, options: HookOptions) => {
    const model = instance.constructor;
    if (!WATCHED.has(model)) return;
    if (kind === 'update' && quiet(model, options?.fields)) return;
    if (model === User && kind === 'write') return; // a new account is on nobody's page yet
    afterCommit(options, async () => {
      const id = await tutorialOf(model, instance.get({ plain: true }) as Record<string, unknown>);
      if (id !== undefined) await forgetPublicPage(id);
    });
  };
  sequelize.addHook('afterCreate', 'publicPages', onRow('write'));
  sequelize.addHook('afterDestroy', 'publicPages', onRow('write'));
  sequelize.addHook('afterUpdate', 'publicPages', onRow('update'));
  sequelize.addHook('afterBulkCreate', 'publicPages', (instances: Model[], options: HookOptions) => {
    for (const i of instances) onRow('write')(i, options);
  });
  const onBulk = (kind: 'destroy' | 'update') => (options: HookOptions) => {
    const model = options.model;
    if (!WATCHED.has(model)) return;
    if (kind === 'update' && quiet(model, Object.keys((options.attributes ?? {}) as object))) return;
    afterCommit(options, async () => {
      const id = await tutorialOf(model, (options.where ?? {}) as Record<string, unknown>);
      if (id !== undefined) await forgetPublicPage(id);
    });
  };
  sequelize.addHook('afterBulkDestroy', 'publicPages', onBulk('destroy'));
  sequelize.addHook('afterBulkUpdate', 'publicPages', onBulk('update'));
}

/**
 * The public pages' channel for `listenForChanges` (lib/change-listener): another process's change
 * forgets the page here. Until this process listens, and after a dropped connection, it keeps no
 * page (a change may have been missed).
 */
export const publicPageChanges: Record<string, ChannelHandler> = {
  [CHANNEL]: { onNotify: (payload) => dropLocalPublicPage(payload === ALL || !payload ? null : payload), onListening: setListening },
};
