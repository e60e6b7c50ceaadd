import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { authorize } from '../../middleware/authenticate';
import { listAuditEvents } from './audit-events.service';

export function auditEventsRouter(db: DataSource): Router {
  const router = Router();
  router.get('/', authorize('read', 'AuditEvent'), async (_req, res) => {
    res.json({ items: await listAuditEvents(db) });
  });
  return router;
}
