import { Router } from 'express';
import { sequelize } from '../../models';

/** Liveness with the database state, for start scripts and load balancers. */
export function healthRouter() {
  const r = Router();
  r.get('/', async (_req, res) => {
    try {
      await sequelize.query('SELECT 1');
      res.json({ status: 'ok', database: 'up' });
    } catch {
      res.status(503).json({ status: 'degraded', database: 'down' });
    }
  });
  return r;
}
