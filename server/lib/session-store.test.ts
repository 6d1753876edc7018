import type pg from 'pg';
import type { SessionData } from 'express-session';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { throttledPgStore, TOUCH_EVERY_MS } from './session-store';

/** A pool that records the SQL it is given and answers with no rows. */
function fakePool() {
  const sql: string[] = [];
  const pool = {
    async query(text: string) {
      sql.push(text);
      return { rows: [] };
    },
  };
  return { pool: pool as unknown as pg.Pool, sql };
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
    const store = throttledPgStore(pool);
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
