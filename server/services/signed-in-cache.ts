import { LRUCache } from 'lru-cache';
import type { InferAttributes, Model, Transaction } from 'sequelize';
import type { Role } from '@shared/schemas/roles';
import type { ChannelHandler } from '../lib/change-listener';
import { whenCommitted } from '../lib/when-committed';
import { Membership, sequelize, Studio, User } from '../models';

/**
 * Every signed-in request reads its session row and its person (with their roles) before it reads
 * what it asked for: two of a tutorial read's three queries (issue 16's profile). This process
 * keeps both for a few seconds (the person with their memberships and studios), and forgets one
 * the moment it changes anywhere:
 *  - database triggers (migration notify-signed-in-changes) NOTIFY `cardwright_signed_in` on
 *    commit of any change to a session, a person, a membership or a studio, from any process or
 *    script, and every app process drops its copy when the notification arrives (milliseconds);
 *  - a change made in this process drops the copy before the request that made it answers (the
 *    session store's writes, model hooks on User, Membership and Studio, `forgetSessionsOf`), so
 *    the next request here never reads it stale;
 *  - copies are kept only while this process listens (lib/change-listener): on connecting, and after
 *    a dropped connection, it forgets them all;
 *  - a read from the database that a change overtook is used once but not kept (a generation count);
 *  - nothing is kept longer than KEEP_MS, however quiet the channel: a bound, not the mechanism.
 * A removed member, a reset password or a sign-out elsewhere therefore takes effect on the next
 * request that arrives after the notification, as it did when every request read the database.
 */
export const CHANNEL = 'cardwright_signed_in';
export const KEEP_MS = 10_000;
const MAX_KEPT = 10_000;

export class NotifiedCache<V extends object> {
  private readonly lru = new LRUCache<string, V>({ max: MAX_KEPT, ttl: KEEP_MS });
  private generation = 0;
  private listening = false;

  get(key: string): V | undefined {
    return this.listening ? this.lru.get(key) : undefined;
  }
  /** Taken before a database read; `keep` stores the value only if nothing was forgotten since. */
  mark(): number {
    return this.generation;
  }
  keep(key: string, value: V, mark: number, ttl = KEEP_MS): void {
    if (this.listening && mark === this.generation && ttl > 0) this.lru.set(key, value, { ttl: Math.min(ttl, KEEP_MS) });
  }
  forget(key: string): void {
    this.generation++;
    this.lru.delete(key);
  }
  forgetWhere(test: (value: V) => boolean): void {
    this.generation++;
    // The keys first: deleting while the cache's own iterator runs could skip entries.
    const gone = [...this.lru.entries()].filter(([, value]) => test(value)).map(([key]) => key);
    for (const key of gone) this.lru.delete(key);
  }
  clear(): void {
    this.generation++;
    this.lru.clear();
  }
  setListening(on: boolean): void {
    this.listening = on;
    this.clear();
  }
  get size(): number {
    return this.lru.size;
  }
}

/** A session as stored (its JSON, parsed afresh for each request: express-session changes the object it gets). */
type KeptSession = { json: string; userId: string | undefined };

export const keptSessions = new NotifiedCache<KeptSession>();
/** A person's row with their memberships, as `findSignedInUser` reads it (built into fresh model instances each time). */
export type SignedInRow = InferAttributes<User> & { memberships: { id: string; studioId: string; role: Role; studio: Record<string, unknown> }[] };
export const keptPeople = new NotifiedCache<SignedInRow>();

/** Forgets every kept session of a person (their sessions were ended in the database). */
export function forgetSessionsOf(userId: string): void {
  keptSessions.forgetWhere((s) => s.userId === userId);
}

/** Forgets the kept rows of a studio's members (they carry the studio). */
function forgetMembersOf(studioId: string): void {
  keptPeople.forgetWhere((p) => p.memberships.some((m) => m.studioId === studioId));
}

/** Forgets everything this process keeps of signed-in people (tests that change rows behind the app's back). */
export function forgetSignedIn(): void {
  keptSessions.clear();
  keptPeople.clear();
}

const heard = new Map<string, () => void>();
let listening = false;

/**
 * Resolves once this process has heard every change committed before the call (a marker sent down
 * the channel arrives after them: PostgreSQL delivers notifications in commit order). For tests
 * that change rows with plain SQL and then ask the app.
 */
export async function heardEverything(): Promise<void> {
  if (!listening) return; // nothing is kept
  const marker = crypto.randomUUID();
  const arrived = new Promise<void>((resolve, reject) => {
    const late = setTimeout(() => reject(new Error('no notification arrived on the signed-in channel within 5 s')), 5000);
    heard.set(marker, () => (clearTimeout(late), resolve()));
  });
  await sequelize.query('SELECT pg_notify($1, $2)', { bind: [CHANNEL, `heard:${marker}`] });
  await arrived;
}

/** Whether copies are kept now, and how many (for tests and the profile). */
export const signedInCacheState = () => ({ listening, sessions: keptSessions.size, people: keptPeople.size });

/** The channel for `listenForChanges`: payload `s:<sid>`, `u:<user id>`, a test's marker, or anything else for "all". */
export const signedInChanges: Record<string, ChannelHandler> = {
  [CHANNEL]: {
    onNotify: (payload) => {
      if (payload.startsWith('heard:')) {
        heard.get(payload.slice(6))?.();
        heard.delete(payload.slice(6));
      } else if (payload.startsWith('s:')) keptSessions.forget(payload.slice(2));
      else if (payload.startsWith('u:')) keptPeople.forget(payload.slice(2));
      else if (payload.startsWith('st:')) forgetMembersOf(payload.slice(3));
      else forgetSignedIn();
    },
    onListening: (on) => {
      listening = on;
      keptSessions.setListening(on);
      keptPeople.setListening(on);
    },
  },
};

type HookOptions = { transaction?: Transaction | null; model?: unknown };

let installed = false;

/**
 * Model hooks: a person, membership or studio changed through Sequelize in this process is
 * forgotten before the change's request answers.
 */
export function watchSignedInRows(): void {
  if (installed) return;
  installed = true;
  const personOf = (instance: Model): string | undefined => {
    if (instance instanceof User) return instance.id;
    if (instance instanceof Membership) return instance.userId;
    return undefined;
  };
  const onRow = (instance: Model, options: HookOptions) => {
    if (instance instanceof Studio) return whenCommitted(options, () => forgetMembersOf(instance.id));
    const id = personOf(instance);
    if (id) whenCommitted(options, () => keptPeople.forget(id));
  };
  // An update or delete by a `where` cannot tell whose rows changed: forget everyone.
  const onBulk = (options: HookOptions) => {
    if (options.model === User || options.model === Membership || options.model === Studio) whenCommitted(options, () => keptPeople.clear());
  };
  sequelize.addHook('afterCreate', 'signedIn', onRow);
  sequelize.addHook('afterUpdate', 'signedIn', onRow);
  sequelize.addHook('afterDestroy', 'signedIn', onRow);
  sequelize.addHook('afterBulkCreate', 'signedIn', (instances: Model[], options: HookOptions) => {
    for (const i of instances) onRow(i, options);
  });
  sequelize.addHook('afterBulkUpdate', 'signedIn', onBulk);
  sequelize.addHook('afterBulkDestroy', 'signedIn', onBulk);
}
