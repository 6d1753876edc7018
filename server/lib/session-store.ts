import session, { type SessionData } from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';

/** Where the store keeps sessions between requests (services/signed-in-cache's `keptSessions`). */
export type SessionKeeper = {
  get(sid: string): { json: string; userId: string | undefined } | undefined;
  mark(): number;
  keep(sid: string, value: { json: string; userId: string | undefined }, mark: number, ttl: number): void;
  forget(sid: string): void;
};

/** How often a session's row has its expiry pushed on; between two touches only the cookie is renewed. */
export const TOUCH_EVERY_MS = 60_000;
// A bound on the "last touched" memory: past it, the oldest half is forgotten (they are touched once more, no harm).
const MAX_REMEMBERED = 100_000;

/**
 * Sessions in PostgreSQL (connect-pg-simple), read through `kept` and whose expiry is written at
 * most once a minute per session and process. express-session touches the store on every request
 * of a rolling session, and an UPDATE per API read cost more than the read itself; the 14-day
 * expiry losing up to a minute does not matter. Several app processes each touch on their own clock, still rarely.
 * A session read from the table is kept (never past its cookie's expiry) and handed out as a
 * fresh object each time; this store's own writes forget it before they answer, and the keeper
 * hears of other processes' writes (see services/signed-in-cache.ts).
 */
export function throttledPgStore(pool: pg.Pool, kept: SessionKeeper): session.Store {
  const PgStore = connectPgSimple(session);
  const lastTouch = new Map<string, number>();
  class ThrottledPgStore extends PgStore {
    override get(sid: string, fn: (err: unknown, sess?: SessionData | null) => void) {
      const hit = kept.get(sid);
      if (hit) return fn(null, JSON.parse(hit.json) as SessionData);
      const mark = kept.mark();
      super.get(sid, (err: unknown, sess?: SessionData | null) => {
        if (!err && sess) {
          const expires = sess.cookie?.expires ? new Date(sess.cookie.expires).getTime() : Number.NaN;
          if (Number.isFinite(expires)) kept.keep(sid, { json: JSON.stringify(sess), userId: sess.userId }, mark, expires - Date.now());
        }
        fn(err, sess);
      });
    }
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
      // Forgotten before the write (a read in flight is not kept) and after it (a read that began
      // in between saw the old row).
      kept.forget(sid);
      super.set(sid, sess, (err?: unknown) => {
        kept.forget(sid);
        fn?.(err);
      });
    }
    override destroy(sid: string, fn?: (err?: unknown) => void) {
      lastTouch.delete(sid);
      kept.forget(sid);
      super.destroy(sid, (err?: unknown) => {
        kept.forget(sid);
        fn?.(err);
      });
    }
  }
  return new ThrottledPgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 });
}
