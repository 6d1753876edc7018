import type pg from 'pg';
import type { SessionData } from 'express-session';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NotifiedCache } from '../services/signed-in-cache';
import { throttledPgStore, TOUCH_EVERY_MS } from './session-store';

/** A pool that records the SQL it is given and answers a SELECT with `stored` (no rows when null). */
function fakePool(stored: { current: object | null } = { current: null }, during?: () => void) {
  const sql: string[] = [];
  const pool = {
    async query(text: string) {
      sql.push(text);
      during?.();
      return { rows: text.startsWith('SELECT') && stored.current ? [{ sess: JSON.parse(JSON.stringify(stored.current)) }] : [] };
    },
  };
  return { pool: pool as unknown as pg.Pool, sql };
}

function keeper(listening = true) {
  const kept = new NotifiedCache<{ json: string; userId: string | undefined }>();
  kept.setListening(listening);
  return kept;
}

const sess = {
  cookie: { maxAge: 14 * 86_400_000, originalMaxAge: 14 * 86_400_000, expires: new Date(Date.now() + 14 * 86_400_000) },
} as unknown as SessionData;
const touch = (store: ReturnType<typeof throttledPgStore>, sid: string) => new Promise<void>((resolve) => store.touch!(sid, sess, () => resolve()));
const updates = (sql: string[]) => sql.filter((q) => q.startsWith('UPDATE')).length;

afterEach(() => vi.useRealTimers());

describe('session store touch (issue 16)', () => {
  it('writes the expiry at most once a minute per session', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    const { pool, sql } = fakePool();
    const store = throttledPgStore(pool, keeper());
    await touch(store, 'a');
    await touch(store, 'a');
    await touch(store, 'b');
    expect(updates(sql)).toBe(2);
    vi.setSystemTime(Date.now() + TOUCH_EVERY_MS - 1000);
    await touch(store, 'a');
    expect(updates(sql)).toBe(2);
    vi.setSystemTime(Date.now() + 2000);
    await touch(store, 'a');
    expect(updates(sql)).toBe(3);
  });
});

const get = (store: ReturnType<typeof throttledPgStore>, sid: string) =>
  new Promise<SessionData | null | undefined>((resolve, reject) => store.get(sid, (err, s) => (err ? reject(err) : resolve(s))));
const selects = (sql: string[]) => sql.filter((q) => q.startsWith('SELECT')).length;
const signedIn = (expires: Date) => ({
  userId: 'u1',
  signedInAt: 1,
  cookie: { originalMaxAge: 1000, expires: expires.toISOString(), httpOnly: true, path: '/' },
});

describe('session store reads through the keeper (issue 16)', () => {
  const later = new Date(Date.now() + 14 * 86_400_000);

  it('reads a session once, then hands out a fresh copy each time without asking the database', async () => {
    const { pool, sql } = fakePool({ current: signedIn(later) });
    const store = throttledPgStore(pool, keeper());
    const first = await get(store, 'a');
    const second = await get(store, 'a');
    expect(selects(sql)).toBe(1);
    expect(second).toEqual(first);
    expect(second).not.toBe(first); // express-session changes the object it is given
    expect(second?.userId).toBe('u1');
  });

  it('a save or an end of the session forgets it before answering', async () => {
    const stored = { current: signedIn(later) as object | null };
    const { pool, sql } = fakePool(stored);
    const store = throttledPgStore(pool, keeper());
    await get(store, 'a');
    await new Promise<void>((done) => store.set('a', { ...signedIn(later), userId: 'u2' } as unknown as SessionData, () => done()));
    stored.current = { ...signedIn(later), userId: 'u2' };
    expect((await get(store, 'a'))?.userId).toBe('u2');
    expect(selects(sql)).toBe(2);
    await new Promise<void>((done) => store.destroy('a', () => done()));
    stored.current = null;
    expect(await get(store, 'a')).toBeFalsy();
  });

  it('keeps nothing while the process does not hear of changes, nor a session past its cookie, nor a read a change overtook', async () => {
    const deaf = fakePool({ current: signedIn(later) });
    const notListening = throttledPgStore(deaf.pool, keeper(false));
    await get(notListening, 'a');
    await get(notListening, 'a');
    expect(selects(deaf.sql)).toBe(2);

    const old = fakePool({ current: signedIn(new Date(Date.now() - 1000)) });
    const expired = throttledPgStore(old.pool, keeper());
    await get(expired, 'a');
    await get(expired, 'a');
    expect(selects(old.sql)).toBe(2);

    const kept = keeper();
    const raced = fakePool({ current: signedIn(later) }, () => kept.forget('other'));
    const overtaken = throttledPgStore(raced.pool, kept);
    await get(overtaken, 'a');
    expect(kept.get('a')).toBeUndefined();
    expect(selects(raced.sql)).toBe(1);
  });
});
