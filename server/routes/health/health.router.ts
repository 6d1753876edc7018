import { Router } from 'express';
import { openRoute } from '../../lib/route';
import { databaseUp } from '../../services/health';

/** Liveness with the database state, for start scripts and load balancers. */
export function healthRouter() {
  const r = Router();
  r.get(
    '/',
    openRoute({}, async ({ res }) => {
      if (await databaseUp()) res.json({ status: 'ok', database: 'up' });
      else res.status(503).json({ status: 'degraded', database: 'down' });
    }),
  );
  return r;
}
