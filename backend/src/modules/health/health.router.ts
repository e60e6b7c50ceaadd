import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Health } from '@understudy/shared-types';

/** Open to all, mounted before sessions so it answers even when the session store cannot. */
export function healthRouter(db: DataSource): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const ok = await Promise.race([
      db.query('SELECT 1').then(() => true, () => false),
      new Promise<boolean>((resolve) => setTimeout(() => resolve(false), 3_000).unref()),
    ]);
    const body: Health = ok ? { status: 'ok', db: 'ok' } : { status: 'error', db: 'unreachable' };
    res.status(ok ? 200 : 503).json(body);
  });
  return router;
}
