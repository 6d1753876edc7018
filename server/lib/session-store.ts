import session, { type SessionData } from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';

/** How often a session's row has its expiry pushed on; between two touches only the cookie is renewed. */
export const TOUCH_EVERY_MS = 60_000;
// A bound on the "last touched" memory: past it, the oldest half is forgotten (they are touched once more, no harm).
const MAX_REMEMBERED = 100_000;

/**
 * Sessions in PostgreSQL (connect-pg-simple) whose expiry is written at most once a minute per
 * session and process. express-session touches the store on every request of a rolling session,
 * and an UPDATE per API read cost more than the read itself; the 14-day expiry losing up to a
 * minute does not matter. Several app processes each touch on their own clock, still rarely.
 */
export function throttledPgStore(pool: pg.Pool): session.Store {
  const PgStore = connectPgSimple(session);
  const lastTouch = new Map<string, number>();
  class ThrottledPgStore extends PgStore {
    override touch(sid: string, sess: SessionData, fn?: (err?: unknown) => void) {
      const now = Date.now();
      const last = lastTouch.get(sid);
      if (last !== undefined && now - last < TOUCH_EVERY_MS) return fn?.();
      if (lastTouch.size >= MAX_REMEMBERED) for (const key of [...lastTouch.keys()].slice(0, MAX_REMEMBERED / 2)) lastTouch.delete(key);
      lastTouch.delete(sid); // re-inserted last, so the Map stays in touch order
      lastTouch.set(sid, now);
      super.touch(sid, sess, fn);
    }
    override set(sid: string, sess: SessionData, fn?: (err?: unknown) => void) {
      // A save writes the expiry too: it counts as a touch.
      lastTouch.set(sid, Date.now());
      super.set(sid, sess, fn);
    }
    override destroy(sid: string, fn?: (err?: unknown) => void) {
      lastTouch.delete(sid);
      super.destroy(sid, fn);
    }
  }
  return new ThrottledPgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 });
}
