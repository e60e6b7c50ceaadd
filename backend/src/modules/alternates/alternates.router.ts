import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { AlternatesQuerySchema, IdParamsSchema, PositionRequirementsSchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { findAlternates, rankPosition } from './alternates.service';

/**
 * Mounted at /api, ahead of the parts router: `/parts/:id/alternates` sits under a part without touching the
 * parts module, and `/alternates/rank` ranks against a position's requirements.
 */
export function alternatesRouter(db: DataSource): Router {
  const router = Router();

  router.get(
    '/parts/:id/alternates',
    authorize('read', 'Part'),
    ...validate({ params: IdParamsSchema, query: AlternatesQuerySchema }, async ({ params, query }, _req, res) => {
      res.json(await findAlternates(db, params.id, query));
    }),
  );

  // A POST because the requirements are a document, not a filter; nothing is stored.
  router.post(
    '/alternates/rank',
    authorize('read', 'Part'),
    ...validate({ body: PositionRequirementsSchema }, async ({ body }, _req, res) => {
      res.json(await rankPosition(db, body));
    }),
  );

  return router;
}
