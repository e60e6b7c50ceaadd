import { Router } from 'express';
import { FAMILIES } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';

export function familiesRouter(): Router {
  const router = Router();
  router.get('/', authorize('read', 'Part'), (_req, res) => {
    res.json({ items: Object.values(FAMILIES) });
  });
  return router;
}
